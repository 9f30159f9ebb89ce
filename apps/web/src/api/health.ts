import { HealthResponse } from '@cairn/schema';
import { useQuery } from '@tanstack/react-query';
import { fetchJson } from './client';

/** The server's health, polled so the page notices the database going away and coming back. */
export function useHealth() {
  return useQuery({
    queryKey: ['health'],
    queryFn: () => fetchJson('/api/health', HealthResponse, { acceptStatus: [503] }),
    refetchInterval: 10_000,
  });
}
