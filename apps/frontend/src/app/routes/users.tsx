import { Stack, Typography } from '@mui/material';
import { useSessionUser } from '@/features/auth/auth-context';
import { SectionBoundary } from '@/components/section-boundary';
import { RoleDutiesCard } from '@/features/users/components/role-duties-card';
import { UsersPanel } from '@/features/users/components/users-panel';

export function UsersRoute() {
  const me = useSessionUser();
  return (
    <Stack spacing={2}>
      <div>
        <Typography variant="h1">Users</Typography>
        <Typography color="text.secondary">
          Who may sign in, and what each person's role lets them do.
        </Typography>
      </div>
      <SectionBoundary name="user list">
        <UsersPanel currentUserId={me.id} />
      </SectionBoundary>
      <RoleDutiesCard />
    </Stack>
  );
}
