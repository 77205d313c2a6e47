import { Navigate, Outlet, useLocation } from 'react-router';
import { paths } from '@/config/paths';
import { useAuth } from '@/features/auth/auth-context';

/** The sign-in gate: without a session, go to sign-in and remember where we were. */
export function RequireAuth() {
  const { user } = useAuth();
  const location = useLocation();
  if (!user) {
    const here = `${location.pathname}${location.search}${location.hash}`;
    const redirectTo = here === paths.root.path ? undefined : here;
    return <Navigate to={paths.signIn.getHref(redirectTo)} replace />;
  }
  return <Outlet />;
}
