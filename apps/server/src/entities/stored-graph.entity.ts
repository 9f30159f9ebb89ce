import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/** An uploaded graph file, kept whole and addressed by the SHA-256 of its content. */
@Entity({ name: 'graphs' })
@Index(['ownerId', 'sha256'], { unique: true })
export class StoredGraph {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Column({ name: 'owner_id', type: 'uuid' })
  ownerId!: string;

  @Column({ type: 'text' })
  name!: string;

  /** The engine's reader that parsed it: edge-list, dimacs, matrix-market, json, mask. */
  @Column({ type: 'text' })
  format!: string;

  @Index()
  @Column({ type: 'text' })
  sha256!: string;

  @Column({ name: 'vertex_count', type: 'integer' })
  vertexCount!: number;

  @Column({ name: 'edge_count', type: 'integer' })
  edgeCount!: number;

  @Column({ name: 'size_bytes', type: 'integer' })
  sizeBytes!: number;

  @Column({ type: 'bytea' })
  content!: Buffer;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt!: Date;
}
