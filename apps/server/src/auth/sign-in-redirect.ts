import { SameSitePath } from '@cairn/schema';

/** Where to send someone after sign-in: the kept path when it is one on this site, else the home page. */
export function afterSignInPath(kept: unknown): string {
  const parsed = SameSitePath.safeParse(kept);
  return parsed.success ? parsed.data : '/';
}
