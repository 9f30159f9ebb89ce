import { randomBytes } from 'node:crypto';

/** A share token: 192 random bits, URL-safe (32 characters); whoever holds it may read the run. */
export const newShareToken = () => randomBytes(24).toString('base64url');
