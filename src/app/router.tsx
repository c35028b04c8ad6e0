import { useState } from 'react';
import { createBrowserRouter, Navigate, RouterProvider, type RouteObject } from 'react-router-dom';
import { Spinner } from '@/components/ui/spinner';
import { useSessionUser } from '@/features/session/hooks/use-session-user';
import { ROLE_HOME, OFFICE_ROLES } from './access';
import { RequireRole } from './guards/require-role';
import { RequireSession } from './guards/require-session';
import { RouteErrorPage } from './routes/errors/route-error-page';

function RoleHome() {
  const user = useSessionUser();
  return <Navigate to={ROLE_HOME[user.role]} replace />;
}

export const appRoutes: RouteObject[] = [
  {
    errorElement: <RouteErrorPage />,
    // Shown while the first screen's code arrives on a slow plant network.
    hydrateFallbackElement: <Spinner label="Loading Crankwise…" className="justify-center" />,
    children: [
      {
        path: '/sign-in',
        lazy: async () => ({ Component: (await import('./routes/sign-in/sign-in-page')).SignInPage }),
      },
      {
        element: <RequireSession />,
        children: [
          { index: true, element: <RoleHome /> },
          {
            path: '/presses',
            lazy: async () => ({ Component: (await import('./routes/presses/presses-page')).PressesPage }),
          },
          {
            path: '/visits',
            lazy: async () => ({ Component: (await import('./routes/visits/my-visits-page')).MyVisitsPage }),
          },
          {
            path: '/visits/new',
            lazy: async () => ({ Component: (await import('./routes/visits/start-visit-page')).StartVisitPage }),
          },
          {
            path: '/visits/:id',
            lazy: async () => ({ Component: (await import('./routes/visits/visit-workspace-page')).VisitWorkspacePage }),
          },
          {
            path: '/visits/:id/close',
            lazy: async () => ({ Component: (await import('./routes/visits/close-out-page')).CloseOutPage }),
          },
          {
            element: <RequireRole roles={OFFICE_ROLES} />,
            children: [
              {
                path: '/customers',
                lazy: async () => ({ Component: (await import('./routes/customers/customers-page')).CustomersPage }),
              },
            ],
          },
          {
            path: '*',
            lazy: async () => ({ Component: (await import('./routes/errors/not-found-page')).NotFoundPage }),
          },
        ],
      },
    ],
  },
];

export function AppRouter() {
  const [router] = useState(() => createBrowserRouter(appRoutes));
  return <RouterProvider router={router} />;
}
