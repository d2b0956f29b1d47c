import { createBrowserRouter, type RouteObject } from 'react-router-dom';
import { RouteError } from '@/components/errors/route-error';
import { PageLoading } from '@/components/layout/page-loading';
import { paths } from '@/config/paths';
import { AppLayout } from './app-layout';
import { RequireSignIn } from './require-sign-in';

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
        path: paths.register.path,
        lazy: () => import('./routes/register').then((m) => ({ Component: m.RegisterRoute })),
      },
      {
        path: paths.confirmAccount.path,
        lazy: () =>
          import('./routes/confirm-account').then((m) => ({ Component: m.ConfirmAccountRoute })),
      },
      {
        path: paths.forgotPassword.path,
        lazy: () =>
          import('./routes/password-reset').then((m) => ({ Component: m.ForgotPasswordRoute })),
      },
      {
        path: paths.resetPassword.path,
        lazy: () =>
          import('./routes/password-reset').then((m) => ({ Component: m.ResetPasswordRoute })),
      },
      {
        // Outside the sign-in guard: a student without an account registers from the link.
        path: paths.join.path,
        lazy: () => import('./routes/classes').then((m) => ({ Component: m.JoinRoute })),
      },
      {
        path: paths.verify.path,
        lazy: () => import('./routes/verify').then((m) => ({ Component: m.VerifyRoute })),
      },
      {
        element: <RequireSignIn />,
        children: [
          {
            path: paths.calculations.path,
            lazy: () =>
              import('./routes/calculations/list').then((m) => ({
                Component: m.CalculationsRoute,
              })),
          },
          {
            // Where review mails point.
            path: paths.version.path,
            lazy: () =>
              import('./routes/calculations/version').then((m) => ({
                Component: m.VersionRoute,
              })),
          },
          {
            path: paths.sheet.path,
            lazy: () =>
              import('./routes/calculations/sheet').then((m) => ({
                Component: m.SignOffSheetRoute,
              })),
          },
          {
            path: paths.fillCard.path,
            lazy: () =>
              import('./routes/calculations/fill-card').then((m) => ({
                Component: m.FillCardRoute,
              })),
          },
          {
            path: paths.admin.path,
            lazy: () => import('./routes/admin').then((m) => ({ Component: m.AdminRoute })),
          },
          {
            path: paths.plans.path,
            lazy: () => import('./routes/plans').then((m) => ({ Component: m.PlansRoute })),
          },
          {
            path: paths.plan.path,
            lazy: () => import('./routes/plans').then((m) => ({ Component: m.PlanRoute })),
          },
          {
            path: paths.envelopes.path,
            lazy: () => import('./routes/envelopes').then((m) => ({ Component: m.EnvelopesRoute })),
          },
          {
            path: paths.envelope.path,
            lazy: () => import('./routes/envelopes').then((m) => ({ Component: m.EnvelopeRoute })),
          },
          {
            path: paths.classes.path,
            lazy: () => import('./routes/classes').then((m) => ({ Component: m.ClassesRoute })),
          },
          {
            path: paths.classroom.path,
            lazy: () => import('./routes/classes').then((m) => ({ Component: m.ClassRoute })),
          },
          {
            path: paths.example.path,
            lazy: () => import('./routes/example').then((m) => ({ Component: m.ExampleRoute })),
          },
          {
            path: paths.reviews.path,
            lazy: () => import('./routes/reviews').then((m) => ({ Component: m.ReviewsRoute })),
          },
          {
            path: paths.calculation.path,
            lazy: () =>
              import('./routes/calculations/editor').then((m) => ({
                Component: m.CalculationEditorRoute,
              })),
          },
        ],
      },
      {
        path: '*',
        lazy: () => import('./routes/not-found').then((m) => ({ Component: m.NotFoundRoute })),
      },
    ],
  },
];

export const createAppRouter = () => createBrowserRouter(routes);
