import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';

export const USER_ROLES = ['admin', 'researcher', 'viewer'] as const;
export type UserRole = (typeof USER_ROLES)[number];

/** A person who signs in through GitHub (or the local fake provider). */
@Entity({ name: 'users' })
export class User {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Column({ name: 'github_id', type: 'bigint', unique: true })
  githubId!: string;

  @Column({ type: 'text' })
  login!: string;

  @Column({ name: 'display_name', type: 'text', nullable: true })
  displayName!: string | null;

  @Column({ type: 'text', nullable: true })
  email!: string | null;

  @Column({ type: 'enum', enum: USER_ROLES, enumName: 'user_role', default: 'viewer' })
  role!: UserRole;

  /** Whether a "run finished" e-mail goes out for this member's long runs. */
  @Column({ name: 'notify_on_finish', type: 'boolean', default: true })
  notifyOnFinish!: boolean;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt!: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'timestamptz' })
  updatedAt!: Date;
}
