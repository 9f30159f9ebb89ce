import {
  RunList,
  RunPlan,
  RunProgressEvent,
  RunShareResponse,
  RunView,
  type RunExportFormat,
  type RunListQuery,
  type RunRequest,
  type RunStatus,
  type Visibility,
} from '@cairn/schema';
import { useMutation, useQuery, useQueryClient, keepPreviousData, type QueryClient } from '@tanstack/react-query';
import { useEffect, useRef, useState } from 'react';
import { fetchJson, sendJson } from './client';

/** Statuses after which a run never changes again. */
export const FINISHED: ReadonlySet<RunStatus> = new Set(['done', 'failed', 'cancelled']);
export const isFinished = (status: RunStatus) => FINISHED.has(status);

export const runKey = (id: string) => ['run', id] as const;
export const runPlanKey = (id: string) => ['run', id, 'plan'] as const;

/** `?a=1&b=x`, leaving out empty values, so filters the member did not set are not sent. */
export function queryString(params: Record<string, string | number | undefined | null>): string {
  const search = new URLSearchParams();
  for (const [k, v] of Object.entries(params)) if (v !== undefined && v !== null && v !== '') search.set(k, String(v));
  const text = search.toString();
  return text ? `?${text}` : '';
}

/** One run. `pollMs` is the fallback when the event stream is not available. */
export function useRun(id: string, { pollMs }: { pollMs?: number | false } = {}) {
  return useQuery({
    queryKey: runKey(id),
    queryFn: () => fetchJson(`/api/v1/runs/${encodeURIComponent(id)}`, RunView),
    refetchInterval: (q) => (pollMs && q.state.data && !isFinished(q.state.data.status) ? pollMs : false),
  });
}

/** The forest, step plan and ordering of a finished run (only asked for once there is a result). */
export function useRunPlan(id: string, enabled: boolean) {
  return useQuery({
    queryKey: runPlanKey(id),
    queryFn: () => fetchJson(`/api/v1/runs/${encodeURIComponent(id)}/plan`, RunPlan),
    enabled,
    staleTime: Infinity, // a finished run's plan never changes
    retry: false,
  });
}

/** The plan of a run shared by link (GET /api/v1/shared/:token/plan), readable signed out. */
export function useSharedRunPlan(token: string, enabled: boolean) {
  return useQuery({
    queryKey: ['shared', token, 'plan'],
    queryFn: () => fetchJson(`/api/v1/shared/${encodeURIComponent(token)}/plan`, RunPlan),
    enabled,
    staleTime: Infinity,
    retry: false,
  });
}

export type RunListFilters = Pick<RunListQuery, 'status' | 'family' | 'owner'> & { limit?: number; cursor?: string | undefined };

export function useRunList(filters: RunListFilters, { enabled = true }: { enabled?: boolean } = {}) {
  const q = { limit: filters.limit ?? 25, cursor: filters.cursor, status: filters.status, family: filters.family, owner: filters.owner };
  return useQuery({
    queryKey: ['runs', q],
    queryFn: () => fetchJson(`/api/v1/runs${queryString(q)}`, RunList),
    enabled,
    // Keep the old page on screen while the next one loads, so the table does not flash empty.
    placeholderData: keepPreviousData,
  });
}

/** The body POST /api/v1/runs takes, as the web app builds it (spec object or text, or an upload's id). */
export type RunRequestBody = Partial<Pick<RunRequest, 'spec' | 'graphId' | 'method' | 'timeLimitSeconds' | 'visibility'>>;

export function useCreateRun() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: RunRequestBody) => sendJson('POST', '/api/v1/runs', body, RunView),
    onSuccess: (run) => {
      queryClient.setQueryData(runKey(run.id), run);
      void queryClient.invalidateQueries({ queryKey: ['runs'] });
    },
  });
}

function storeRun(queryClient: QueryClient, run: RunView) {
  queryClient.setQueryData(runKey(run.id), run);
  void queryClient.invalidateQueries({ queryKey: ['runs'] });
}

export function useCancelRun(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => sendJson('POST', `/api/v1/runs/${encodeURIComponent(id)}/cancel`, undefined, RunView),
    onSuccess: (run) => storeRun(queryClient, run),
  });
}

export function useRunVisibility(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (visibility: Visibility) => sendJson('PATCH', `/api/v1/runs/${encodeURIComponent(id)}`, { visibility }, RunView),
    onSuccess: (run) => storeRun(queryClient, run),
  });
}

export function useShareRun(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (email: string) => sendJson('POST', `/api/v1/runs/${encodeURIComponent(id)}/share`, { email }, RunShareResponse),
    onSuccess: (answer) => storeRun(queryClient, answer.run),
  });
}

/** A run read through its share link: no sign-in needed. */
export function useSharedRun(token: string) {
  return useQuery({
    queryKey: ['shared-run', token],
    queryFn: () => fetchJson(`/api/v1/shared/${encodeURIComponent(token)}`, RunView),
    retry: false,
    // A shared reader has no event stream; an unfinished run is simply read again now and then.
    refetchInterval: (q) => (q.state.data && !isFinished(q.state.data.status) ? 10_000 : false),
  });
}

/** Where a run's files come from: the member's route, or the share link's own for readers without an account. */
export type ExportBase = string;
export const runExportBase = (id: string): ExportBase => `/api/v1/runs/${encodeURIComponent(id)}/export`;
export const sharedExportBase = (token: string): ExportBase => `/api/v1/shared/${encodeURIComponent(token)}/export`;
export const exportHref = (base: ExportBase, format: RunExportFormat) => `${base}?format=${format}`;

export type StreamState = 'connecting' | 'live' | 'polling' | 'closed';

/** After this many failed connections in a row the page stops waiting on the stream and polls instead. */
const MAX_STREAM_ERRORS = 3;

/**
 * Follows an unfinished run over server-sent events: keeps the newest progress report, patches it into
 * the cached run, and on the final event stores the finished run and invalidates what depends on it.
 * When the stream cannot be opened (no EventSource, refused, or dropping repeatedly) it answers
 * `polling`, and the page falls back to re-reading the run.
 */
export function useRunEvents(run: Pick<RunView, 'id' | 'status' | 'links'> | undefined): { progress: RunProgressEvent | null; state: StreamState } {
  const queryClient = useQueryClient();
  const [progress, setProgress] = useState<RunProgressEvent | null>(null);
  const [state, setState] = useState<StreamState>('connecting');
  const id = run?.id;
  const url = run?.links.events;
  const unfinished = run !== undefined && !isFinished(run.status);
  const errors = useRef(0);

  useEffect(() => {
    if (!id || !url || !unfinished) {
      setState('closed');
      return;
    }
    if (typeof window === 'undefined' || typeof window.EventSource !== 'function') {
      setState('polling');
      return;
    }
    const source = new window.EventSource(url, { withCredentials: true });
    errors.current = 0;
    setState('connecting');
    const patch = (fields: Partial<RunView>) =>
      queryClient.setQueryData<RunView>(runKey(id), (old) => (old ? { ...old, ...fields } : old));
    const readJson = (e: Event): unknown => {
      try {
        return JSON.parse((e as MessageEvent<string>).data);
      } catch {
        return undefined;
      }
    };
    source.onopen = () => {
      errors.current = 0;
      setState('live');
    };
    source.addEventListener('status', () => {
      setState('live');
      void queryClient.invalidateQueries({ queryKey: runKey(id), exact: true });
    });
    source.addEventListener('progress', (e) => {
      const parsed = RunProgressEvent.safeParse(readJson(e));
      if (!parsed.success) return;
      setState('live');
      setProgress(parsed.data);
      const { status, ...rest } = parsed.data;
      patch({ status, progress: rest });
    });
    const finish = (e: Event) => {
      // The stream ends after this event; closing stops the browser from reconnecting to it.
      source.close();
      setState('closed');
      const parsed = RunView.safeParse(readJson(e));
      if (parsed.success) queryClient.setQueryData(runKey(id), parsed.data);
      void queryClient.invalidateQueries({ queryKey: runKey(id) });
      void queryClient.invalidateQueries({ queryKey: ['runs'] });
    };
    for (const name of ['done', 'failed', 'cancelled', 'deleted'] as const) source.addEventListener(name, finish);
    source.onerror = () => {
      errors.current += 1;
      // CLOSED means the browser gave up (a 401, 404 or a body that is not an event stream).
      if (source.readyState === 2 || errors.current >= MAX_STREAM_ERRORS) {
        source.close();
        setState('polling');
        void queryClient.invalidateQueries({ queryKey: runKey(id), exact: true });
      }
    };
    return () => source.close();
  }, [id, url, unfinished, queryClient]);

  return { progress, state };
}
