import { createBrowserRouter, type RouteObject } from 'react-router-dom';
import { AppLayout } from '@/components/layout/app-layout';
import { RouteError } from '@/components/errors/route-error';
import { PageLoading } from '@/components/layout/page-loading';
import { paths } from '@/config/paths';

/** Routes, each page loaded on demand so the first page stays small. */
export const routes: RouteObject[] = [
  {
    element: <AppLayout />,
    errorElement: <RouteError />,
    // Shown while the first lazily loaded page arrives.
    HydrateFallback: PageLoading,
    children: [
      {
        path: paths.home.path,
        lazy: () => import('./routes/home').then((m) => ({ Component: m.HomeRoute })),
      },
      {
        path: paths.signIn.path,
        lazy: () => import('./routes/sign-in').then((m) => ({ Component: m.SignInRoute })),
      },
      {
        path: '*',
        lazy: () => import('./routes/not-found').then((m) => ({ Component: m.NotFoundRoute })),
      },
    ],
  },
];

export const createAppRouter = () => createBrowserRouter(routes);
