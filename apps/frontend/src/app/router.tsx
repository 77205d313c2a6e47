import { createBrowserRouter, Navigate, type RouteObject } from 'react-router-dom';
import { AppShell } from '@/app/layout/app-shell';
import { RequireAuth } from '@/app/layout/require-auth';
import { RoleGate } from '@/app/layout/role-gate';
import { homePathFor } from '@/app/navigation';
import { NotFoundRoute } from '@/app/routes/not-found';
import { RouteError } from '@/app/routes/route-error';
import { SignInRoute } from '@/app/routes/sign-in';
import { TodayRoute } from '@/app/routes/today';
import { LotRoute } from '@/app/routes/lot';
import { LotsRoute } from '@/app/routes/lots';
import { ReceivingRoute } from '@/app/routes/receiving';
import { UsersRoute } from '@/app/routes/users';
import { ScorecardsRoute } from '@/app/routes/scorecards';
import { SupplierScorecardRoute } from '@/app/routes/supplier-scorecard';
import { InstrumentsRoute } from '@/app/routes/instruments';
import { ProductsRoute } from '@/app/routes/products';
import { ReferenceRoute } from '@/app/routes/reference';
import { SuppliersRoute } from '@/app/routes/suppliers';
import { ReturnsRoute } from '@/app/routes/returns';
import { ReturnDetailRoute } from '@/app/routes/return-detail';
import { CorrectiveActionsRoute } from '@/app/routes/corrective-actions';
import { CorrectiveActionDetailRoute } from '@/app/routes/corrective-action-detail';
import { paths } from '@/config/paths';
import { useSessionUser } from '@/features/auth/auth-context';

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
].map((route) => ({ ...route, errorElement: <RouteError /> }));

export const routes: RouteObject[] = [
  {
    errorElement: <RouteError />,
    children: [
      { path: paths.signIn.path, element: <SignInRoute /> },
      {
        element: <RequireAuth />,
        children: [{ path: paths.root.path, element: <AppShell />, children: shellRoutes }],
      },
    ],
  },
];

export const createRouter = () => createBrowserRouter(routes);
