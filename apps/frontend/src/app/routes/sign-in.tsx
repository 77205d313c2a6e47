import { Alert, Box, Paper, Typography } from '@mui/material';
import { Navigate, useSearchParams } from 'react-router';
import { afterSignInPath } from '@/app/navigation';
import { shellColors } from '@/app/theme';
import { useAuth } from '@/features/auth/auth-context';
import { SignInForm } from '@/features/auth/components/sign-in-form';

export function SignInRoute() {
  const { user } = useAuth();
  const [params] = useSearchParams();
  const redirectTo = params.get('redirectTo');

  if (user) return <Navigate to={afterSignInPath(user.role, redirectTo)} replace />;

  return (
    <Box
      sx={{
        minHeight: '100vh',
        display: 'grid',
        placeItems: 'center',
        p: 2,
        background: `linear-gradient(160deg, ${shellColors.ink} 0%, #1d4f57 55%, ${shellColors.copper} 140%)`,
      }}
    >
      <Paper
        variant="elevation"
        elevation={6}
        sx={{ width: '100%', maxWidth: 420, p: { xs: 3, sm: 4 } }}
      >
        <Typography variant="overline" color="secondary.dark">
          Incoming inspection
        </Typography>
        <Typography variant="h1" sx={{ mb: 0.5 }}>
          Gaugeproof
        </Typography>
        <Typography color="text.secondary" sx={{ mb: 2 }}>
          Sign in to log deliveries, record readings and decide on lots.
        </Typography>
        {redirectTo && (
          <Alert severity="info" sx={{ mb: 1 }}>
            Sign in to continue where you were.
          </Alert>
        )}
        {/* Once signed in, the user is set and the redirect above takes over. */}
        <SignInForm />
      </Paper>
    </Box>
  );
}
