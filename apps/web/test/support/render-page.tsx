// Shared set-up of the page tests (not a test file itself): a fetch stub that answers by route and records
// what was sent, the providers every page needs (a QueryClient that does not retry, a memory router), and
// the sessions /api/v1/me answers with.
import type { MeResponse } from '@cairn/schema';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render } from '@testing-library/react';
import type { ReactNode } from 'react';
import { createMemoryRouter, MemoryRouter, RouterProvider, type RouteObject } from 'react-router';
import { vi } from 'vitest';

export interface SentRequest {
  method: string;
  /** The path and the query string. */
  url: string;
  body: unknown;
  headers: Record<string, string>;
}

export type Route = (url: URL, init: RequestInit | undefined) => Response | undefined;

/** An answer as the API sends it; no body (a 204) when `body` is left out. */
export const json = (status: number, body?: unknown) =>
  new Response(body === undefined ? null : JSON.stringify(body), { status, headers: { 'content-type': 'application/json' } });

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

/** A route answering every request, as a server that knows only one thing. */
export const always =
  (answer: (url: URL, init: RequestInit | undefined) => Response): Route =>
  (url, init) =>
    answer(url, init);

/** The body a route was sent, read as JSON. */
export const bodyOf = (init: RequestInit | undefined): unknown => (typeof init?.body === 'string' ? JSON.parse(init.body) : undefined);

/** A client for one test: nothing retried, so an error answer shows at once. */
export const testQueryClient = () => new QueryClient({ defaultOptions: { queries: { retry: false }, mutations: { retry: false } } });

/** Renders `routes` in a memory router opened at `path`, inside a fresh QueryClient. */
export function renderRoutes(routes: RouteObject[], path: string) {
  const client = testQueryClient();
  const router = createMemoryRouter(routes, { initialEntries: [path] });
  const utils = render(
    <QueryClientProvider client={client}>
      <RouterProvider router={router} />
    </QueryClientProvider>,
  );
  return { ...utils, router, client };
}

/** Renders `ui` inside a fresh QueryClient, with no router. */
export function renderWithClient(ui: ReactNode) {
  const client = testQueryClient();
  return { ...render(<QueryClientProvider client={client}>{ui}</QueryClientProvider>), client };
}

/** Renders `ui` inside a memory router only, for a component that links but fetches nothing. */
export const renderWithRouter = (ui: ReactNode) => render(<MemoryRouter>{ui}</MemoryRouter>);

/** Ids the way the API writes them: uuid(7) is 00000000-0000-4000-8000-000000000007. */
export const uuid = (n: number) => `00000000-0000-4000-8000-${String(n).padStart(12, '0')}`;

export const ME_RESEARCHER: MeResponse = {
  user: { id: '11111111-1111-4111-8111-111111111111', login: 'ada', displayName: 'Ada', email: null, role: 'researcher', notifyOnFinish: false },
  via: 'session',
  permissions: ['runs:read', 'runs:write', 'atlas:read'],
  csrfToken: 'csrf-token-1',
  signIn: { provider: 'local' },
};

export const ME_ADMIN: MeResponse = {
  user: { id: uuid(1), login: 'root-admin', displayName: null, email: null, role: 'admin', notifyOnFinish: false },
  via: 'session',
  permissions: ['runs:read', 'runs:write', 'atlas:read', 'admin'],
  csrfToken: 'csrf-admin',
  signIn: { provider: 'local' },
};

export const ME_VISITOR: MeResponse = { user: null, via: null, permissions: [], csrfToken: null, signIn: { provider: 'local' } };
