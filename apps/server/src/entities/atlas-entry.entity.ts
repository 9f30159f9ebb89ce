import { Column, Entity, Index, PrimaryColumn, UpdateDateColumn } from 'typeorm';

/** The best Cairn knows of one graph: each side with its argument and the run that proved it. */
@Entity({ name: 'atlas_entries' })
export class AtlasEntry {
  @PrimaryColumn({ name: 'graph_key', type: 'text' })
  graphKey!: string;

  @Index()
  @Column({ type: 'text' })
  family!: string;

  /** The family's sizes (rows, cols, n, t, ...) as the spec gives them, for filtering. */
  @Column({ type: 'jsonb' })
  sizes!: Record<string, number>;

  @Column({ name: 'vertex_count', type: 'integer' })
  vertexCount!: number;

  @Column({ name: 'edge_count', type: 'integer' })
  edgeCount!: number;

  @Column({ type: 'integer' })
  lower!: number;

  @Column({ type: 'integer' })
  upper!: number;

  /** True once lower = upper; an exact entry is never weakened. */
  @Column({ type: 'boolean', default: false })
  exact!: boolean;

  @Column({ name: 'lower_provenance', type: 'jsonb' })
  lowerProvenance!: Record<string, unknown>;

  @Column({ name: 'upper_provenance', type: 'jsonb' })
  upperProvenance!: Record<string, unknown>;

  @Column({ name: 'lower_run_id', type: 'uuid', nullable: true })
  lowerRunId!: string | null;

  @Column({ name: 'upper_run_id', type: 'uuid', nullable: true })
  upperRunId!: string | null;

  @UpdateDateColumn({ name: 'updated_at', type: 'timestamptz' })
  updatedAt!: Date;
}
