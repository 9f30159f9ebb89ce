import type { ApiScope } from '@cairn/schema';
import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/** A secret that authenticates scripts as its owner; only a hash of it is kept, shown by its prefix. */
@Entity({ name: 'api_keys' })
export class ApiKey {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Index()
  @Column({ name: 'user_id', type: 'uuid' })
  userId!: string;

  @Column({ type: 'text' })
  name!: string;

  /** The first characters of the secret (`cairn_` and a few more), enough to recognise it in a list. */
  @Column({ type: 'text', unique: true })
  prefix!: string;

  /** SHA-256 of the whole secret, hex. */
  @Column({ name: 'secret_hash', type: 'text', unique: true })
  secretHash!: string;

  @Column({ type: 'text', array: true })
  scopes!: ApiScope[];

  @Column({ name: 'created_by', type: 'uuid', nullable: true })
  createdBy!: string | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt!: Date;

  @Column({ name: 'last_used_at', type: 'timestamptz', nullable: true })
  lastUsedAt!: Date | null;

  @Column({ name: 'revoked_at', type: 'timestamptz', nullable: true })
  revokedAt!: Date | null;
}
