import { fileURLToPath } from 'node:url';

/** The built web app beside this package in the workspace (apps/web/dist), unless configured. */
export function defaultWebDist(): string {
  return fileURLToPath(new URL('../../web/dist', import.meta.url));
}
