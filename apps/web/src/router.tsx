import { createBrowserRouter, type RouteObject } from 'react-router';
import { HomePage } from './routes/HomePage';
import { Layout } from './routes/Layout';
import { NotFoundPage } from './routes/NotFoundPage';

// Pages beyond the home page load when first visited, so the first page stays small.
const page = <K extends string>(load: () => Promise<Record<K, () => React.ReactNode>>, name: K): RouteObject['lazy'] =>
  async () => ({ Component: (await load())[name] });

export const routes: RouteObject[] = [
  {
    element: <Layout />,
    // Shown while the first lazily loaded page arrives.
    hydrateFallbackElement: <p className="p-8 text-lichen-500">Loading…</p>,
    children: [
      { index: true, element: <HomePage /> },
      { path: 'runs', lazy: page(() => import('./pages/RunsPage'), 'RunsPage') },
      { path: 'runs/new', lazy: page(() => import('./pages/NewRunPage'), 'NewRunPage') },
      { path: 'runs/:id', lazy: page(() => import('./pages/RunPage'), 'RunPage') },
      { path: 'shared/:token', lazy: page(() => import('./pages/SharedRunPage'), 'SharedRunPage') },
      { path: 'sweeps', lazy: page(() => import('./pages/SweepsPage'), 'SweepsPage') },
      { path: 'sweeps/:id', lazy: page(() => import('./pages/SweepPage'), 'SweepPage') },
      { path: 'atlas', lazy: page(() => import('./pages/AtlasPage'), 'AtlasPage') },
      { path: 'verify', lazy: page(() => import('./pages/VerifyPage'), 'VerifyPage') },
      { path: 'admin/*', lazy: page(() => import('./pages/AdminPage'), 'AdminPage') },
      { path: '*', element: <NotFoundPage /> },
    ],
  },
];

export const createRouter = () => createBrowserRouter(routes);
