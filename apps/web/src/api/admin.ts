import { ApiKeyCreatedResponse, ApiKeysResponse, CaughtMailList, MemberResponse, MembersResponse, type ApiKeyCreateRequest, type Role } from '@cairn/schema';
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { ApiRequestError, fetchJson, sendJson } from './client';

export const membersQueryKey = ['admin', 'members'] as const;
export const keysQueryKey = ['admin', 'keys'] as const;

export function useMembers() {
  return useQuery({ queryKey: membersQueryKey, queryFn: () => fetchJson('/api/v1/users', MembersResponse) });
}

/** PATCH /api/v1/users/:id; a 409 (the last admin) comes back as the error, with the server's sentence. */
export function useChangeRole() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, role }: { id: string; role: Role }) => sendJson('PATCH', `/api/v1/users/${encodeURIComponent(id)}`, { role }, MemberResponse),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: membersQueryKey }),
  });
}

export function useApiKeys() {
  return useQuery({ queryKey: keysQueryKey, queryFn: () => fetchJson('/api/v1/keys', ApiKeysResponse) });
}

export function useCreateKey() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: ApiKeyCreateRequest) => sendJson('POST', '/api/v1/keys', body, ApiKeyCreatedResponse),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: keysQueryKey }),
  });
}

/** DELETE /api/v1/keys/:id answers 204 with no body. */
export function useRevokeKey() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: string) => sendJson('DELETE', `/api/v1/keys/${encodeURIComponent(id)}`, undefined, z.unknown()),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: keysQueryKey }),
  });
}

/**
 * The local mail catcher's messages. The route exists only while the catcher runs; its 404 means a real
 * mail service sends Cairn's mail, which is an answer (`null`), not an error.
 */
export function useCaughtMail() {
  return useQuery({
    queryKey: ['admin', 'mail'],
    queryFn: async () => {
      try {
        return await fetchJson('/api/v1/dev/mail', CaughtMailList);
      } catch (err) {
        if (err instanceof ApiRequestError && err.status === 404) return null;
        throw err;
      }
    },
    refetchInterval: 10_000,
  });
}
