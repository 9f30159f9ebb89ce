import { AtlasList, QuickAnswer } from '@cairn/schema';
import { useQuery } from '@tanstack/react-query';
import { fetchJson } from './client';
import { queryString } from './runs';

/** GET /api/v1/quick?spec=: the fastest answer Cairn has (atlas, closed form, or bounds on the spot). */
export function useQuickAnswer(spec: string | null) {
  return useQuery({
    queryKey: ['quick', spec],
    queryFn: () => fetchJson(`/api/v1/quick${queryString({ spec })}`, QuickAnswer),
    enabled: spec !== null,
    staleTime: 5 * 60_000,
    retry: false,
  });
}

/** The newest atlas rows, for visitors who may not list runs. */
export function useRecentAtlas(enabled: boolean, limit = 8) {
  return useQuery({
    queryKey: ['atlas', { limit, recent: true }],
    queryFn: () => fetchJson(`/api/v1/atlas${queryString({ limit })}`, AtlasList),
    enabled,
    staleTime: 60_000,
  });
}
