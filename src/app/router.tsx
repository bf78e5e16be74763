import type { QueryClient } from '@tanstack/react-query';
import { createBrowserRouter, type RouteObject } from 'react-router-dom';
import { paths } from '@/config/paths';
import { requireSignedIn } from './guards';
import { AppShell } from './layout/app-shell';
import { OfflineLine, PageSkeleton } from '@/components/ui/states';
import { NotFoundPage, RouteError } from './route-error';
import { appRoutes } from './routes';

export function createRouter(qc: QueryClient) {
  const routes: RouteObject[] = [
    {
      errorElement: <RouteError />,
      // Shown while the first page's code and the signed-in check load (a page reload, a link opened in a new tab).
      hydrateFallbackElement: (
        <div className="mx-auto flex max-w-7xl flex-col gap-4 px-4 py-6 md:px-8">
          <OfflineLine>Trayline opens once you are back online.</OfflineLine>
          <PageSkeleton />
        </div>
      ),
      children: [
        { path: paths.signIn, lazy: () => import('./routes/auth/sign-in.route') },
        { path: paths.register, lazy: () => import('./routes/auth/register.route') },
        { path: paths.invite(), lazy: () => import('./routes/auth/accept-invite.route') },
        { path: paths.forgotPassword, lazy: () => import('./routes/auth/forgot-password.route') },
        { path: paths.resetPassword(), lazy: () => import('./routes/auth/reset-password.route') },
        {
          loader: requireSignedIn(qc),
          element: <AppShell />,
          errorElement: <RouteError />,
          children: appRoutes(qc).map((r) => ({ ...r, errorElement: <RouteError /> })),
        },
        { path: '*', element: <NotFoundPage /> },
      ],
    },
  ];
  return createBrowserRouter(routes);
}
