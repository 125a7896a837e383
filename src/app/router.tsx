import { createBrowserRouter, RouterProvider } from 'react-router-dom';
import { PageLoading } from '../components/layout/page-loading';
import { paths } from '../config/paths';
import { AcceptInvitationRoute } from './routes/accept-invitation';
import { AppRoot, appRootLoader } from './routes/app-root';
import { ForgotPasswordRoute } from './routes/forgot-password';
import { HomeRoute } from './routes/home';
import { NotFoundRoute } from './routes/not-found';
import { ResetPasswordRoute } from './routes/reset-password';
import { RouteError } from './routes/route-error';
import { SignInRoute } from './routes/sign-in';

/**
 * Pages used before sign-in, then the signed-in frame. Administrator pages load on demand
 * (route `lazy`), so other roles never download them.
 */
export const router = createBrowserRouter([
  { path: paths.signIn, element: <SignInRoute />, errorElement: <RouteError /> },
  { path: paths.forgotPassword, element: <ForgotPasswordRoute />, errorElement: <RouteError /> },
  { path: paths.resetPassword, element: <ResetPasswordRoute />, errorElement: <RouteError /> },
  { path: paths.acceptInvitation, element: <AcceptInvitationRoute />, errorElement: <RouteError /> },
  {
    id: 'app',
    element: <AppRoot />,
    loader: appRootLoader,
    errorElement: <RouteError />,
    hydrateFallbackElement: <PageLoading />,
    children: [
      { index: true, element: <HomeRoute />, errorElement: <RouteError /> },
      { path: paths.adminUsers, lazy: () => import('./routes/admin/users') },
      { path: paths.sheets, lazy: () => import('./routes/sheets') },
      { path: `${paths.sheets}/:id`, lazy: () => import('./routes/sheets-detail') },
      { path: paths.verify, lazy: () => import('./routes/verify') },
      { path: paths.gauge, lazy: () => import('./routes/gauge') },
      { path: `${paths.gauge}/:revisionId`, lazy: () => import('./routes/gauge-detail') },
      { path: paths.adminOutbox, lazy: () => import('./routes/admin/outbox') },
      { path: paths.adminAudit, lazy: () => import('./routes/admin/audit') },
      { path: paths.fluids, lazy: () => import('./routes/fluids') },
      { path: `${paths.fluids}/:id`, lazy: () => import('./routes/fluids-detail') },
      { path: paths.layerChecks, lazy: () => import('./routes/layer-checks') },
      { path: `${paths.layerChecks}/:id`, lazy: () => import('./routes/layer-checks-detail') },
      { path: paths.batch, lazy: () => import('./routes/batch') },
      { path: paths.dryingPath, lazy: () => import('./routes/drying-path') },
      { path: paths.propertySpread, lazy: () => import('./routes/property-spread') },
      { path: paths.meltPool, lazy: () => import('./routes/melt-pool') },
    ],
  },
  { path: '*', element: <NotFoundRoute /> },
]);

export function AppRouter() {
  return <RouterProvider router={router} />;
}
