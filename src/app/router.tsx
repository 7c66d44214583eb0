import { createBrowserRouter, RouterProvider } from 'react-router-dom';
import { paths } from '@/config/paths';
import * as root from '@/app/routes/root';

// Every screen is its own chunk (lazy); loaders warm the query cache before it shows.
const router = createBrowserRouter([
  {
    id: 'root',
    Component: root.Component,
    HydrateFallback: root.HydrateFallback,
    ErrorBoundary: root.ErrorBoundary,
    children: [
      { path: paths.auth.signIn.path, lazy: () => import('@/app/routes/auth/sign-in') },
      { path: paths.auth.forgotPassword.path, lazy: () => import('@/app/routes/auth/forgot-password') },
      { path: paths.auth.setPassword.path, lazy: () => import('@/app/routes/auth/set-password') },
      // Printed sheets: signed in, but outside the app's shell (no navigation on paper).
      { path: paths.wallRunsPrint.path, lazy: () => import('@/app/routes/planner/wall-runs-print') },
      {
        id: 'app',
        lazy: () => import('@/app/routes/app/shell'),
        children: [
          { index: true, lazy: () => import('@/app/routes/app/home') },
          { path: paths.account.path, lazy: () => import('@/app/routes/app/account') },

          { path: paths.search.path, lazy: () => import('@/app/routes/register/search') },
          { path: paths.clients.path, lazy: () => import('@/app/routes/register/clients') },
          { path: paths.client.path, lazy: () => import('@/app/routes/register/client') },
          { path: paths.sites.path, lazy: () => import('@/app/routes/register/sites') },
          { path: paths.site.path, lazy: () => import('@/app/routes/register/site') },
          { path: paths.walls.path, lazy: () => import('@/app/routes/register/walls') },
          { path: paths.wall.path, lazy: () => import('@/app/routes/register/wall') },
          { path: paths.cabinets.path, lazy: () => import('@/app/routes/register/cabinets') },
          { path: paths.wallLabels.path, lazy: () => import('@/app/routes/register/wall-labels') },
          { path: paths.catalogue.path, lazy: () => import('@/app/routes/register/catalogue') },
          { path: paths.tickets.path, lazy: () => import('@/app/routes/tickets/list') },
          { path: paths.newTicket.path, lazy: () => import('@/app/routes/tickets/new') },
          { path: paths.ticket.path, lazy: () => import('@/app/routes/tickets/ticket') },
          { path: paths.planner.path, lazy: () => import('@/app/routes/planner/planner') },
          { path: paths.stock.path, lazy: () => import('@/app/routes/stock/stock') },
          { path: paths.wallRuns.path, lazy: () => import('@/app/routes/planner/wall-runs') },
          { path: paths.dispatch.path, lazy: () => import('@/app/routes/visits/dispatch') },
          { path: paths.visits.path, lazy: () => import('@/app/routes/visits/list') },
          { path: paths.closeVisit.path, lazy: () => import('@/app/routes/visits/close-visit') },
          { path: paths.visit.path, lazy: () => import('@/app/routes/visits/visit') },
          { path: paths.logRepair.path, lazy: () => import('@/app/routes/repairs/log-repair') },
          { path: paths.outbox.path, lazy: () => import('@/app/routes/repairs/outbox') },
          { path: paths.scan.path, lazy: () => import('@/app/routes/scan/scan') },
          { path: paths.cabinetLabel.path, lazy: () => import('@/app/routes/register/cabinet-label') },

          { path: paths.admin.users.path, lazy: () => import('@/app/routes/admin/users') },
          { path: paths.admin.audit.path, lazy: () => import('@/app/routes/admin/audit') },
          { path: paths.admin.mailbox.path, lazy: () => import('@/app/routes/admin/mailbox') },

          { path: '*', lazy: () => import('@/app/routes/app/not-found') },
        ],
      },
    ],
  },
]);

/** Runs `fn` once, when the first screen's code and data have arrived (or at once if they have). */
export function afterFirstScreen(fn: () => void) {
  if (router.state.initialized) return fn();
  const stop = router.subscribe((state) => {
    if (!state.initialized) return;
    stop();
    fn();
  });
}

export function AppRouter() {
  return <RouterProvider router={router} />;
}
