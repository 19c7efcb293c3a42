import { useState } from 'react';
import { createBrowserRouter, Navigate, RouterProvider } from 'react-router-dom';
import { NotAllowed } from '@/components/feedback/not-allowed';
import { PageLoader } from '@/components/feedback/page-loader';
import { AppShell } from '@/components/layout/app-shell';
import { RequireAuth, RequireRole, RequireSignedOut } from '@/lib/auth/route-guards';
import { RouteError } from './routes/route-error';

// Each page is its own chunk (`lazy`), so a phone on a slow line downloads only what it opens.
// Guards and the shell are small and needed on every signed-in page, so they stay in the main chunk.
function createAppRouter() {
  return createBrowserRouter([
    {
      HydrateFallback: PageLoader,
      ErrorBoundary: RouteError,
      children: [
        {
          element: <RequireSignedOut />,
          children: [
            {
              path: 'sign-in',
              lazy: async () => ({ Component: (await import('./routes/sign-in')).SignInRoute }),
            },
            {
              path: 'sign-up',
              lazy: async () => ({ Component: (await import('./routes/sign-up')).SignUpRoute }),
            },
          ],
        },
        // Public either way: a reset link must work even in a browser still signed in.
        {
          path: 'forgot-password',
          lazy: async () => ({ Component: (await import('./routes/forgot-password')).ForgotPasswordRoute }),
        },
        {
          path: 'reset-password',
          lazy: async () => ({ Component: (await import('./routes/reset-password')).ResetPasswordRoute }),
        },
        {
          path: 'dev/mail',
          lazy: async () => ({ Component: (await import('./routes/dev-mail')).DevMailRoute }),
        },
        {
          element: <RequireAuth />,
          children: [
            {
              // A bare sheet to print: outside the shell, so no navigation bars on paper.
              path: 'formulas/:id/print',
              lazy: async () => ({ Component: (await import('./routes/formula-print')).FormulaPrintRoute }),
            },
            {
              element: <AppShell />,
              children: [
                {
                  index: true,
                  lazy: async () => ({ Component: (await import('./routes/home')).HomeRoute }),
                },
                {
                  path: 'shelf',
                  lazy: async () => ({ Component: (await import('./routes/shelf')).ShelfRoute }),
                },
                {
                  path: 'cultures/:id',
                  lazy: async () => ({ Component: (await import('./routes/culture')).CultureRoute }),
                },
                {
                  path: 'cultures/:id/feed',
                  lazy: async () => ({ Component: (await import('./routes/log-feeding')).LogFeedingRoute }),
                },
                {
                  path: 'cultures/:id/import',
                  lazy: async () => ({ Component: (await import('./routes/import-feedings')).ImportFeedingsRoute }),
                },
                {
                  path: 'cultures/:id/rise-check',
                  lazy: async () => ({ Component: (await import('./routes/rise-check')).RiseCheckRoute }),
                },
                {
                  path: 'feedings/:id',
                  lazy: async () => ({ Component: (await import('./routes/feeding')).FeedingRoute }),
                },
                {
                  path: 'feedings/:id/temperatures/import',
                  lazy: async () => ({ Component: (await import('./routes/logger-import')).LoggerImportRoute }),
                },
                {
                  path: 'bench',
                  children: [
                    {
                      index: true,
                      lazy: async () => ({ Component: (await import('./routes/bench-list')).BenchListRoute }),
                    },
                    {
                      path: 'new',
                      lazy: async () => ({ Component: (await import('./routes/bench-new')).BenchNewRoute }),
                    },
                    {
                      path: ':id',
                      lazy: async () => ({ Component: (await import('./routes/bench-plan')).BenchPlanRoute }),
                    },
                    {
                      path: ':id/kitchen/import',
                      lazy: async () => ({ Component: (await import('./routes/kitchen-import')).KitchenImportRoute }),
                    },
                  ],
                },
                {
                  path: 'formulas',
                  children: [
                    {
                      index: true,
                      lazy: async () => ({ Component: (await import('./routes/formula-list')).FormulaListRoute }),
                    },
                    {
                      path: 'water-temperature',
                      lazy: async () => ({
                        Component: (await import('./routes/formula-water-temperature')).FormulaWaterTemperatureRoute,
                      }),
                    },
                    {
                      path: 'new',
                      lazy: async () => ({ Component: (await import('./routes/formula-editor')).FormulaEditorRoute }),
                    },
                    {
                      path: ':id',
                      lazy: async () => ({ Component: (await import('./routes/formula-editor')).FormulaEditorRoute }),
                    },
                  ],
                },
                {
                  path: 'account',
                  lazy: async () => ({
                    Component: (await import('./routes/account')).AccountRoute,
                  }),
                },
                {
                  path: 'account/alerts',
                  lazy: async () => ({ Component: (await import('./routes/alerts-settings')).AlertSettingsRoute }),
                },
                {
                  path: 'alerts',
                  lazy: async () => ({ Component: (await import('./routes/alerts')).AlertsRoute }),
                },
                {
                  path: 'classes',
                  children: [
                    {
                      index: true,
                      lazy: async () => ({ Component: (await import('./routes/classes')).ClassesRoute }),
                    },
                    {
                      path: 'join',
                      lazy: async () => ({ Component: (await import('./routes/class-join')).ClassJoinRoute }),
                    },
                    {
                      path: ':classId',
                      lazy: async () => ({ Component: (await import('./routes/class')).ClassRoute }),
                    },
                    {
                      path: ':classId/cultures/:cultureId',
                      lazy: async () => ({ Component: (await import('./routes/class-culture')).ClassCultureRoute }),
                    },
                    {
                      path: ':classId/feedings/:feedingId',
                      lazy: async () => ({ Component: (await import('./routes/class-feeding')).ClassFeedingRoute }),
                    },
                    {
                      path: ':classId/plans/:planId',
                      lazy: async () => ({ Component: (await import('./routes/class-plan')).ClassPlanRoute }),
                    },
                  ],
                },
                {
                  // The link in an invitation e-mail; signed-out visitors sign in (or up) and come back.
                  path: 'invites/:token',
                  lazy: async () => ({ Component: (await import('./routes/class-invite')).ClassInviteRoute }),
                },
                {
                  path: 'admin',
                  element: (
                    <RequireRole role="admin" fallback={<NotAllowed what="This page is for Peakwise admins." />} />
                  ),
                  children: [
                    { index: true, element: <Navigate to="accounts" replace /> },
                    {
                      path: 'accounts',
                      lazy: async () => ({
                        Component: (await import('./routes/admin/accounts')).AdminAccountsRoute,
                      }),
                    },
                  ],
                },
              ],
            },
          ],
        },
        {
          path: '*',
          lazy: async () => ({ Component: (await import('./routes/not-found')).NotFoundRoute }),
        },
      ],
    },
  ]);
}

export function AppRouter() {
  // Created once per mount (not at import time), so importing this module has no side effects.
  const [router] = useState(createAppRouter);
  return <RouterProvider router={router} />;
}
