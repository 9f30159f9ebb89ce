import { z } from 'zod';

/** A member's role: viewers read, researchers also compute and share, admins also manage people and keys. */
export const Role = z.enum(['admin', 'researcher', 'viewer']);
export type Role = z.infer<typeof Role>;

/** What an API key may do, on top of (never beyond) what its owner's role allows. */
export const ApiScope = z.enum(['runs:read', 'runs:write', 'atlas:read']);
export type ApiScope = z.infer<typeof ApiScope>;

/** Who may see a run: its owner (and admins), anyone holding its share link, or everyone signed in. */
export const Visibility = z.enum(['private', 'link', 'public']);
export type Visibility = z.infer<typeof Visibility>;

export const RunStatus = z.enum(['queued', 'running', 'done', 'failed', 'cancelled']);
export type RunStatus = z.infer<typeof RunStatus>;
