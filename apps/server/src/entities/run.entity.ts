import type { RunStatus, SolveMethod, Visibility } from '@cairn/schema';
import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';

/** One computation on one graph, with its result, owner and provenance. */
@Entity({ name: 'runs' })
export class Run {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Index()
  @Column({ name: 'owner_id', type: 'uuid' })
  ownerId!: string;

  /** The graph spec in its JSON form (an upload is `{ family: 'upload', graphId }`). */
  @Column({ type: 'jsonb' })
  spec!: Record<string, unknown>;

  @Column({ name: 'graph_id', type: 'uuid', nullable: true })
  graphId!: string | null;

  /** The atlas key of the graph (same graph, same key). */
  @Index()
  @Column({ name: 'graph_key', type: 'text' })
  graphKey!: string;

  /** The family, for filtering lists (grid, mask, upload, ...). */
  @Index()
  @Column({ type: 'text' })
  family!: string;

  @Column({ type: 'text' })
  method!: SolveMethod;

  @Column({ name: 'time_limit_seconds', type: 'integer', nullable: true })
  timeLimitSeconds!: number | null;

  /** Identifies an identical request (owner, graph, method, limits), so a repeat returns the stored run. */
  @Index()
  @Column({ name: 'request_hash', type: 'text' })
  requestHash!: string;

  @Index()
  @Column({ type: 'text', default: 'queued' })
  status!: RunStatus;

  /** The newest progress report of the search (nodes, bounds, elapsed). */
  @Column({ type: 'jsonb', nullable: true })
  progress!: Record<string, unknown> | null;

  /** The engine's SolveResult, stored only after the server re-verified its certificate. */
  @Column({ type: 'jsonb', nullable: true })
  result!: Record<string, unknown> | null;

  @Column({ type: 'integer', nullable: true })
  lower!: number | null;

  @Column({ type: 'integer', nullable: true })
  upper!: number | null;

  @Column({ name: 'rank_number', type: 'integer', nullable: true })
  rankNumber!: number | null;

  @Column({ type: 'jsonb', nullable: true })
  provenance!: Record<string, unknown> | null;

  /** The certificate ranking (labels per vertex). */
  @Column({ type: 'jsonb', nullable: true })
  certificate!: number[] | null;

  @Column({ type: 'jsonb', nullable: true })
  witness!: Record<string, unknown> | null;

  @Column({ type: 'jsonb', nullable: true })
  stats!: Record<string, unknown> | null;

  /** Why a run failed: `{ code, message }`. */
  @Column({ type: 'jsonb', nullable: true })
  error!: { code: string; message: string } | null;

  @Column({ type: 'text', default: 'private' })
  visibility!: Visibility;

  @Column({ name: 'share_token', type: 'text', nullable: true, unique: true })
  shareToken!: string | null;

  @Index()
  @Column({ name: 'sweep_id', type: 'uuid', nullable: true })
  sweepId!: string | null;

  /** Which worker process ran it last, and how many times it was started. */
  @Column({ type: 'text', nullable: true })
  worker!: string | null;

  @Column({ type: 'integer', default: 0 })
  attempts!: number;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt!: Date;

  @Column({ name: 'started_at', type: 'timestamptz', nullable: true })
  startedAt!: Date | null;

  @Column({ name: 'finished_at', type: 'timestamptz', nullable: true })
  finishedAt!: Date | null;

  @UpdateDateColumn({ name: 'updated_at', type: 'timestamptz' })
  updatedAt!: Date;
}
