import { SweepList, SweepView, type SweepRequest } from '@cairn/schema';
import { keepPreviousData, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { fetchJson, sendJson } from './client';

export const SWEEP_PAGE_SIZE = 20;
/** How often a sweep with unfinished cells is asked again; its cells fill in as the queue works through them. */
export const SWEEP_REFRESH_MS = 2000;

export const sweepsQueryKey = ['sweeps'] as const;

/** One page of sweeps, newest first; the previous page stays on screen while the next loads. */
export function useSweeps(offset: number) {
  return useQuery({
    queryKey: [...sweepsQueryKey, 'list', offset],
    queryFn: () => fetchJson(`/api/v1/sweeps?limit=${SWEEP_PAGE_SIZE}&offset=${offset}`, SweepList),
    placeholderData: keepPreviousData,
  });
}

/** Whether any cell still waits for its run: then the sweep is polled. */
export const sweepIsActive = (view: SweepView | undefined) => view?.cells.some((c) => c.status === 'queued' || c.status === 'running') ?? false;

/** One sweep with its cells, polled every two seconds while a cell is queued or running. */
export function useSweep(id: string) {
  return useQuery({
    queryKey: [...sweepsQueryKey, 'one', id],
    queryFn: () => fetchJson(`/api/v1/sweeps/${encodeURIComponent(id)}`, SweepView),
    refetchInterval: (query) => (sweepIsActive(query.state.data) ? SWEEP_REFRESH_MS : false),
  });
}

// The create answer is read only for the new sweep's id, so either a SweepView or a bare summary will do.
const CreatedSweep = z.union([z.object({ sweep: z.object({ id: z.uuid() }) }).transform((b) => b.sweep.id), z.object({ id: z.uuid() }).transform((b) => b.id)]);

/** POST /api/v1/sweeps; resolves to the new sweep's id. */
export function useCreateSweep() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: SweepRequest) => sendJson('POST', '/api/v1/sweeps', body, CreatedSweep),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: sweepsQueryKey }),
  });
}

export const sweepExportHref = (id: string) => `/api/v1/sweeps/${encodeURIComponent(id)}/export?format=csv`;
