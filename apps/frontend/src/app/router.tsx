import { createBrowserRouter, Navigate, type RouteObject } from 'react-router';
import { AppShell } from '@/app/layout/app-shell';
import { RequireAuth } from '@/app/layout/require-auth';
import { RoleGate } from '@/app/layout/role-gate';
import { lazyRoute, WithRouteFallback } from '@/app/layout/lazy-route';
import { homePathFor } from '@/app/navigation';
import { NotFoundRoute } from '@/app/routes/not-found';
import { RouteError } from '@/app/routes/route-error';
import { SignInRoute } from '@/app/routes/sign-in';
import { loadLotRoute } from '@/app/warm-start';
import { paths } from '@/config/paths';
import { useSessionUser } from '@/features/auth/auth-context';

/** Each screen's code loads on its first visit (first-screen budget of issue 7). */
const TodayRoute = lazyRoute(() => import('@/app/routes/today'), 'TodayRoute');
const LotRoute = lazyRoute(loadLotRoute, 'LotRoute');
const LotBenchRoute = lazyRoute(() => import('@/app/routes/lot-bench'), 'LotBenchRoute');
const LotsRoute = lazyRoute(() => import('@/app/routes/lots'), 'LotsRoute');
const ReceivingRoute = lazyRoute(() => import('@/app/routes/receiving'), 'ReceivingRoute');
const UsersRoute = lazyRoute(() => import('@/app/routes/users'), 'UsersRoute');
const AuditRoute = lazyRoute(() => import('@/app/routes/audit'), 'AuditRoute');
const ScorecardsRoute = lazyRoute(() => import('@/app/routes/scorecards'), 'ScorecardsRoute');
const SupplierScorecardRoute = lazyRoute(
  () => import('@/app/routes/supplier-scorecard'),
  'SupplierScorecardRoute',
);
const InstrumentsRoute = lazyRoute(() => import('@/app/routes/instruments'), 'InstrumentsRoute');
const ProductsRoute = lazyRoute(() => import('@/app/routes/products'), 'ProductsRoute');
const ReferenceRoute = lazyRoute(() => import('@/app/routes/reference'), 'ReferenceRoute');
const SuppliersRoute = lazyRoute(() => import('@/app/routes/suppliers'), 'SuppliersRoute');
const ReturnsRoute = lazyRoute(() => import('@/app/routes/returns'), 'ReturnsRoute');
const SupplierPortalRoute = lazyRoute(
  () => import('@/app/routes/supplier-portal'),
  'SupplierPortalRoute',
);
const MessagesRoute = lazyRoute(() => import('@/app/routes/messages'), 'MessagesRoute');
const ProfileRoute = lazyRoute(() => import('@/app/routes/profile'), 'ProfileRoute');
const ReturnDetailRoute = lazyRoute(
  () => import('@/app/routes/return-detail'),
  'ReturnDetailRoute',
);
const CorrectiveActionsRoute = lazyRoute(
  () => import('@/app/routes/corrective-actions'),
  'CorrectiveActionsRoute',
);
const CorrectiveActionDetailRoute = lazyRoute(
  () => import('@/app/routes/corrective-action-detail'),
  'CorrectiveActionDetailRoute',
);

function HomeRedirect() {
  const user = useSessionUser();
  return <Navigate to={homePathFor(user.role)} replace />;
}

/** Screens inside the shell; RoleGate checks the navigation model's roles. */
const shellRoutes: RouteObject[] = [
  { index: true, element: <HomeRedirect /> },
  {
    path: paths.today.path,
    element: (
      <RoleGate>
        <TodayRoute />
      </RoleGate>
    ),
  },
  {
    path: paths.users.path,
    element: (
      <RoleGate>
        <UsersRoute />
      </RoleGate>
    ),
  },
  {
    path: paths.audit.path,
    element: (
      <RoleGate>
        <AuditRoute />
      </RoleGate>
    ),
  },
  {
    path: paths.receiving.path,
    element: (
      <RoleGate>
        <ReceivingRoute />
      </RoleGate>
    ),
  },
  {
    path: paths.lots.path,
    element: (
      <RoleGate>
        <LotsRoute />
      </RoleGate>
    ),
  },
  {
    path: paths.lot.path,
    element: (
      <RoleGate>
        <LotRoute />
      </RoleGate>
    ),
  },
  {
    path: paths.lotBench.path,
    element: (
      <RoleGate>
        <LotBenchRoute />
      </RoleGate>
    ),
  },
  {
    path: paths.suppliers.path,
    element: (
      <RoleGate>
        <SuppliersRoute />
      </RoleGate>
    ),
  },
  {
    path: paths.products.path,
    element: (
      <RoleGate>
        <ProductsRoute />
      </RoleGate>
    ),
  },
  {
    path: paths.instruments.path,
    element: (
      <RoleGate>
        <InstrumentsRoute />
      </RoleGate>
    ),
  },
  {
    path: paths.reference.path,
    element: (
      <RoleGate>
        <ReferenceRoute />
      </RoleGate>
    ),
  },
  {
    path: paths.scorecards.path,
    element: (
      <RoleGate>
        <ScorecardsRoute />
      </RoleGate>
    ),
  },
  {
    path: paths.supplierScorecard.path,
    element: (
      <RoleGate>
        <SupplierScorecardRoute />
      </RoleGate>
    ),
  },
  {
    path: paths.profile.path,
    element: (
      <RoleGate>
        <ProfileRoute />
      </RoleGate>
    ),
  },
  {
    path: paths.messages.path,
    element: (
      <RoleGate>
        <MessagesRoute />
      </RoleGate>
    ),
  },
  {
    path: paths.returns.path,
    element: (
      <RoleGate>
        <ReturnsRoute />
      </RoleGate>
    ),
  },
  {
    path: paths.returnDetail.path,
    element: (
      <RoleGate>
        <ReturnDetailRoute />
      </RoleGate>
    ),
  },
  {
    path: paths.correctiveActions.path,
    element: (
      <RoleGate>
        <CorrectiveActionsRoute />
      </RoleGate>
    ),
  },
  {
    path: paths.correctiveActionDetail.path,
    element: (
      <RoleGate>
        <CorrectiveActionDetailRoute />
      </RoleGate>
    ),
  },
  { path: '*', element: <NotFoundRoute /> },
].map((route) => ({
  ...route,
  element: <WithRouteFallback>{route.element}</WithRouteFallback>,
  errorElement: <RouteError />,
}));

export const routes: RouteObject[] = [
  {
    errorElement: <RouteError />,
    children: [
      { path: paths.signIn.path, element: <SignInRoute /> },
      // The supplier's page needs no account: its link carries a signed token.
      {
        path: paths.supplierPortal.path,
        element: (
          <WithRouteFallback>
            <SupplierPortalRoute />
          </WithRouteFallback>
        ),
      },
      {
        element: <RequireAuth />,
        children: [{ path: paths.root.path, element: <AppShell />, children: shellRoutes }],
      },
    ],
  },
];

export const createRouter = () => createBrowserRouter(routes);
