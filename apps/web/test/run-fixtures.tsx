// Shared helpers of the run-centred page tests (not a test file itself): a fetch stub that answers by
// route and records what was sent, the providers every page needs, and runs as the API shows them.
import type { MeResponse, RunSummary, RunView, SolveResult } from '@cairn/schema';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render } from '@testing-library/react';
import type { ReactNode } from 'react';
import { createMemoryRouter, RouterProvider, type RouteObject } from 'react-router';
import { vi } from 'vitest';

export interface SentRequest {
  method: string;
  url: string;
  body: unknown;
  headers: Record<string, string>;
}

export type Route = (url: URL, init: RequestInit | undefined) => Response | undefined;

export const json = (status: number, body: unknown) => new Response(JSON.stringify(body), { status, headers: { 'content-type': 'application/json' } });

/** Stubs fetch: each request goes to the first route that answers it; unknown ones get a 404 in the API's shape. */
export function stubFetch(...routes: Route[]): SentRequest[] {
  const sent: SentRequest[] = [];
  vi.stubGlobal(
    'fetch',
    vi.fn(async (input: RequestInfo | URL, init?: RequestInit) => {
      const url = new URL(String(input), 'http://cairn.test');
      const headers: Record<string, string> = {};
      new Headers(init?.headers).forEach((v, k) => (headers[k] = v));
      let body: unknown = init?.body;
      if (typeof body === 'string') body = JSON.parse(body);
      sent.push({ method: (init?.method ?? 'GET').toUpperCase(), url: url.pathname + url.search, body, headers });
      for (const route of routes) {
        const res = route(url, init);
        if (res) return res;
      }
      return json(404, { error: { code: 'not_found', message: `no route ${url.pathname}` } });
    }),
  );
  return sent;
}

/** A route answering one method and path (the query string is not compared). */
export const on =
  (method: string, path: string, answer: (url: URL, init: RequestInit | undefined) => Response): Route =>
  (url, init) =>
    (init?.method ?? 'GET').toUpperCase() === method && url.pathname === path ? answer(url, init) : undefined;

export const ME_RESEARCHER: MeResponse = {
  user: { id: '11111111-1111-4111-8111-111111111111', login: 'ada', displayName: 'Ada', email: null, role: 'researcher', notifyOnFinish: false },
  via: 'session',
  permissions: ['runs:read', 'runs:write', 'atlas:read'],
  csrfToken: 'csrf-token-1',
  signIn: { provider: 'local' },
};

export const ME_VISITOR: MeResponse = { user: null, via: null, permissions: [], csrfToken: null, signIn: { provider: 'local' } };

export const RUN_ID = '22222222-2222-4222-8222-222222222222';

export function runSummary(over: Partial<RunSummary> = {}): RunSummary {
  const id = over.id ?? RUN_ID;
  return {
    id,
    status: 'done',
    spec: { family: 'grid', rows: 2, cols: 3 },
    specText: 'grid:2x3',
    graphKey: 'grid:2x3',
    family: 'grid',
    method: 'auto',
    timeLimitSeconds: 60,
    visibility: 'private',
    progress: null,
    rankNumber: 4,
    lower: 4,
    upper: 4,
    provenance: 'exact-search',
    error: null,
    owner: { id: ME_RESEARCHER.user!.id, login: 'ada' },
    sweepId: null,
    attempts: 1,
    cancelRequested: false,
    createdAt: '2025-03-01T10:00:00.000Z',
    startedAt: '2025-03-01T10:00:01.000Z',
    finishedAt: '2025-03-01T10:00:03.500Z',
    links: {
      self: `/api/v1/runs/${id}`,
      events: `/api/v1/runs/${id}/events`,
      cancel: `/api/v1/runs/${id}/cancel`,
      export: `/api/v1/runs/${id}/export`,
      web: `http://cairn.test/runs/${id}`,
      shared: null,
    },
    ...over,
  };
}

/** The 2 x 3 grid ranked 1 3 1 / 2 4 2 (checked by hand: both 1s and both 2s are separated by larger labels). */
export const GRID_RESULT: SolveResult = {
  graph: { vertexCount: 6, edgeCount: 7, family: { kind: 'grid', rows: 2, cols: 3 } },
  rankNumber: 4,
  lower: 4,
  upper: 4,
  labels: [1, 3, 1, 2, 4, 2],
  provenance: { value: 'exact-search', lower: { argument: 'exact search proved no ranking with 3 labels exists', source: 'exact-search' }, upper: { construction: 'exact-search', argument: 'a ranking found by exact search (4 labels)' } },
  witness: null,
  verified: true,
  stats: { method: 'auto', elapsedMs: 2500, nodes: 812, memoSize: 40, stopReason: null },
};

export function runView(over: Partial<RunView> = {}): RunView {
  return { ...runSummary(over), result: over.result === undefined ? GRID_RESULT : over.result };
}

export function renderRoutes(routes: RouteObject[], path: string) {
  const client = new QueryClient({ defaultOptions: { queries: { retry: false }, mutations: { retry: false } } });
  const router = createMemoryRouter(routes, { initialEntries: [path] });
  const utils = render(
    <QueryClientProvider client={client}>
      <RouterProvider router={router} />
    </QueryClientProvider>,
  );
  return { ...utils, router, client };
}

export function renderWithClient(ui: ReactNode) {
  const client = new QueryClient({ defaultOptions: { queries: { retry: false }, mutations: { retry: false } } });
  return { ...render(<QueryClientProvider client={client}>{ui}</QueryClientProvider>), client };
}
