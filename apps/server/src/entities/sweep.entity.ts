import type { SolveMethod, Visibility } from '@cairn/schema';
import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/** A batch of runs over a range of sizes of one family. */
@Entity({ name: 'sweeps' })
export class Sweep {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Index()
  @Column({ name: 'owner_id', type: 'uuid' })
  ownerId!: string;

  @Column({ type: 'text' })
  name!: string;

  /** grid, cylinder or torus: families with rows and columns. */
  @Column({ type: 'text' })
  family!: string;

  @Column({ name: 'rows_from', type: 'integer' })
  rowsFrom!: number;

  @Column({ name: 'rows_to', type: 'integer' })
  rowsTo!: number;

  @Column({ name: 'cols_from', type: 'integer' })
  colsFrom!: number;

  @Column({ name: 'cols_to', type: 'integer' })
  colsTo!: number;

  @Column({ type: 'text' })
  method!: SolveMethod;

  @Column({ name: 'time_limit_seconds', type: 'integer', nullable: true })
  timeLimitSeconds!: number | null;

  @Column({ type: 'text', default: 'private' })
  visibility!: Visibility;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt!: Date;
}
