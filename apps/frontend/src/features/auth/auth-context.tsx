import { createContext, use, type ReactNode } from 'react';
import { useMe } from '@/features/auth/api/get-me';
import { useLogout } from '@/features/auth/api/logout';
import type { SessionUser } from '@/features/auth/types';
import { FullPageError, FullPageLoader } from '@/components/full-page-state';

interface AuthState {
  /** Null when nobody is signed in (or the session ended with a 401). */
  user: SessionUser | null;
  signOut: () => void;
  signingOut: boolean;
}

const AuthContext = createContext<AuthState | null>(null);

export function AuthProvider({ children }: { children: ReactNode }) {
  const me = useMe();
  const logout = useLogout();

  if (me.isPending) return <FullPageLoader label="Checking your session…" />;
  if (me.isError && me.data === undefined) {
    return (
      <FullPageError
        message="Gaugeproof cannot reach its server."
        onRetry={() => void me.refetch()}
      />
    );
  }

  const value: AuthState = {
    user: me.data ?? null,
    signOut: () => logout.mutate(),
    signingOut: logout.isPending,
  };
  return <AuthContext value={value}>{children}</AuthContext>;
}

export function useAuth(): AuthState {
  const auth = use(AuthContext);
  if (!auth) throw new Error('useAuth must be used inside <AuthProvider>.');
  return auth;
}

/** For screens behind the sign-in gate, where a user is always present. */
export function useSessionUser(): SessionUser {
  const { user } = useAuth();
  if (!user) throw new Error('useSessionUser needs a signed-in user.');
  return user;
}
