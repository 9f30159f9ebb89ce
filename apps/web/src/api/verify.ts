import { StoredGraphList, VerifyResponse, type VerifyRequest } from '@cairn/schema';
import { useMutation, useQuery } from '@tanstack/react-query';
import { fetchJson, sendJson } from './client';

/** The member's uploaded graphs (the first hundred, newest first) to verify a labelling against. */
export function useUploadedGraphs(enabled: boolean) {
  return useQuery({
    queryKey: ['graphs', 'list', 100, 0],
    queryFn: () => fetchJson('/api/v1/graphs?limit=100&offset=0', StoredGraphList),
    enabled,
  });
}

/** POST /api/v1/verify: nothing is stored, so it is a mutation only because it sends a body. */
export function useVerify() {
  return useMutation({ mutationFn: (body: VerifyRequest) => sendJson('POST', '/api/v1/verify', body, VerifyResponse) });
}
