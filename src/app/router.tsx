import { useState, type ComponentType } from 'react';
import { createBrowserRouter, Navigate, RouterProvider, type RouteObject } from 'react-router-dom';
import { Spinner } from '@/components/ui/spinner';
import { useSessionUser } from '@/features/session/hooks/use-session-user';
import { ADMIN_ONLY, ROLE_HOME, OFFICE_ROLES } from './access';
import { RequireRole } from './guards/require-role';
import { RequireSession } from './guards/require-session';
import { RouteErrorPage } from './routes/errors/route-error-page';

/** A route's page, loaded the first time it is visited (each page is its own chunk). */
function page<K extends string, M extends Record<K, ComponentType>>(load: () => Promise<M>, name: K) {
  return async () => ({ Component: (await load())[name] });
}

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
      { path: '/sign-in', lazy: page(() => import('./routes/sign-in/sign-in-page'), 'SignInPage') },
      // The customer's read-only report: a signed link from the e-mail, no account.
      { path: '/report/:token', lazy: page(() => import('./routes/report/report-page'), 'ReportPage') },
      // An invited person sets their password here before they have an account to sign in with.
      { path: '/accept-invite/:token', lazy: page(() => import('./routes/invite/accept-invite-page'), 'AcceptInvitePage') },
      {
        element: <RequireSession />,
        children: [
          { index: true, element: <RoleHome /> },
          { path: '/presses', lazy: page(() => import('./routes/presses/presses-page'), 'PressesPage') },
          { path: '/visits', lazy: page(() => import('./routes/visits/my-visits-page'), 'MyVisitsPage') },
          { path: '/visits/new', lazy: page(() => import('./routes/visits/start-visit-page'), 'StartVisitPage') },
          { path: '/visits/:id', lazy: page(() => import('./routes/visits/visit-workspace-page'), 'VisitWorkspacePage') },
          { path: '/visits/:id/close', lazy: page(() => import('./routes/visits/close-out-page'), 'CloseOutPage') },
          {
            element: <RequireRole roles={OFFICE_ROLES} />,
            children: [
              { path: '/customers', lazy: page(() => import('./routes/customers/customers-page'), 'CustomersPage') },
              { path: '/review', lazy: page(() => import('./routes/manager/review-queue-page'), 'ReviewQueuePage') },
              { path: '/review/:id', lazy: page(() => import('./routes/manager/visit-record-page'), 'VisitRecordPage') },
              { path: '/visits/all', lazy: page(() => import('./routes/manager/all-visits-page'), 'AllVisitsPage') },
              { path: '/dashboard', lazy: page(() => import('./routes/manager/dashboard-page'), 'DashboardPage') },
              { path: '/presses/:id/history', lazy: page(() => import('./routes/manager/press-history-page'), 'PressHistoryPage') },
              { path: '/admin', lazy: page(() => import('./routes/admin/admin-home-page'), 'AdminHomePage') },
              { path: '/admin/customers', lazy: page(() => import('./routes/admin/directory-customers-page'), 'DirectoryCustomersPage') },
              { path: '/admin/sites', lazy: page(() => import('./routes/admin/directory-sites-page'), 'DirectorySitesPage') },
              { path: '/admin/presses', lazy: page(() => import('./routes/admin/directory-presses-page'), 'DirectoryPressesPage') },
            ],
          },
          {
            element: <RequireRole roles={ADMIN_ONLY} />,
            children: [
              { path: '/admin/users', lazy: page(() => import('./routes/admin/users-page'), 'UsersPage') },
              { path: '/admin/band-sets', lazy: page(() => import('./routes/admin/band-sets-page'), 'BandSetsPage') },
              { path: '/admin/procedures', lazy: page(() => import('./routes/admin/procedures-page'), 'ProceduresPage') },
              { path: '/admin/firmware-rules', lazy: page(() => import('./routes/admin/firmware-rules-page'), 'FirmwareRulesPage') },
            ],
          },
          { path: '*', lazy: page(() => import('./routes/errors/not-found-page'), 'NotFoundPage') },
        ],
      },
    ],
  },
];

export function AppRouter() {
  const [router] = useState(() => createBrowserRouter(appRoutes));
  return <RouterProvider router={router} />;
}
