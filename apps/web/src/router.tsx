import { createBrowserRouter, type RouteObject } from 'react-router';
import { HomePage } from './routes/HomePage';
import { Layout } from './routes/Layout';
import { NotFoundPage } from './routes/NotFoundPage';

export const routes: RouteObject[] = [
  {
    element: <Layout />,
    children: [
      { index: true, element: <HomePage /> },
      { path: '*', element: <NotFoundPage /> },
    ],
  },
];

export const createRouter = () => createBrowserRouter(routes);
