import { Alert, Button } from '@mui/material';
import type { ReactNode } from 'react';
import { Link as RouterLink, useLocation } from 'react-router';
import { canOpen, homePathFor } from '@/app/navigation';
import { useSessionUser } from '@/features/auth/auth-context';

/** Hides a screen from roles the navigation model does not list for it. */
export function RoleGate({ children }: { children: ReactNode }) {
  const user = useSessionUser();
  const { pathname } = useLocation();
  if (canOpen(user.role, pathname)) return children;
  return (
    <Alert
      severity="info"
      action={
        <Button color="inherit" component={RouterLink} to={homePathFor(user.role)}>
          Go to my home screen
        </Button>
      }
    >
      This screen is not part of your role's work.
    </Alert>
  );
}
