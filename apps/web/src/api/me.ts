import { MeResponse } from '@cairn/schema';
import { useQuery } from '@tanstack/react-query';
import { fetchJson } from './client';
import { setCsrfToken } from './csrf';

export const meQueryKey = ['me'] as const;

/** Who is signed in, their permissions and the session's CSRF token (kept for every write). */
export function useMe() {
  return useQuery({
    queryKey: meQueryKey,
    queryFn: async () => {
      const me = await fetchJson('/api/v1/me', MeResponse);
      setCsrfToken(me.csrfToken);
      return me;
    },
    staleTime: 60_000,
  });
}

/** Whether the signed-in member holds a permission (false while loading or signed out). */
export function useCan(permission: MeResponse['permissions'][number]): boolean {
  const { data } = useMe();
  return data?.permissions.includes(permission) ?? false;
}

/** Where the sign-in button goes: the server's GitHub (or local provider) route, coming back here. */
export const signInHref = (next: string) => `/api/v1/auth/github?next=${encodeURIComponent(next)}`;
