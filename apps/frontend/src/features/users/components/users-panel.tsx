import PersonAddOutlined from '@mui/icons-material/PersonAddOutlined';
import { Alert, Box, Button, Paper, Skeleton, Stack, Typography } from '@mui/material';
import { useCallback, useState } from 'react';
import { useUsers } from '@/features/users/api/get-users';
import { useUpdateUser } from '@/features/users/api/update-user';
import { CreateUserDialog } from '@/features/users/components/create-user-dialog';
import { EditUserDialog } from '@/features/users/components/edit-user-dialog';
import { UsersTable } from '@/features/users/components/users-table';
import type { User } from '@/features/users/types';
import { errorMessage } from '@/lib/query-client';
import { toasts } from '@/lib/toast-store';

export function UsersPanel({ currentUserId }: { currentUserId: number }) {
  const users = useUsers();
  const toggle = useUpdateUser();
  const { mutate: updateUser } = toggle;
  const [creating, setCreating] = useState(false);
  const [editing, setEditing] = useState<User | null>(null);

  const onToggleActive = useCallback(
    (user: User) =>
      updateUser(
        { id: user.id, version: user.version, patch: { active: !user.active } },
        {
          onSuccess: () =>
            toasts.success(`${user.name} is now ${user.active ? 'inactive' : 'active'}.`),
        },
      ),
    [updateUser],
  );

  return (
    <Paper variant="outlined">
      <Stack direction="row" sx={{ p: 2, alignItems: 'center', justifyContent: 'space-between' }}>
        <Typography variant="h4" component="h2">
          People
        </Typography>
        <Button
          variant="contained"
          startIcon={<PersonAddOutlined />}
          onClick={() => setCreating(true)}
        >
          New user
        </Button>
      </Stack>

      {users.isPending && (
        <Box sx={{ px: 2, pb: 2 }} aria-label="Loading users">
          {[0, 1, 2].map((i) => (
            <Skeleton key={i} height={40} />
          ))}
        </Box>
      )}
      {users.isError && (
        <Alert
          severity="error"
          sx={{ m: 2 }}
          action={
            <Button color="inherit" onClick={() => void users.refetch()}>
              Try again
            </Button>
          }
        >
          The users could not be loaded: {errorMessage(users.error)}
        </Alert>
      )}
      {users.isSuccess && users.data.length === 0 && (
        <Typography color="text.secondary" sx={{ px: 2, pb: 3 }}>
          No users yet. Add the first one with “New user”.
        </Typography>
      )}
      {users.isSuccess && users.data.length > 0 && (
        <UsersTable
          users={users.data}
          currentUserId={currentUserId}
          busyUserId={toggle.isPending ? toggle.variables.id : null}
          onEdit={setEditing}
          onToggleActive={onToggleActive}
        />
      )}

      <CreateUserDialog open={creating} onClose={() => setCreating(false)} />
      {editing && <EditUserDialog user={editing} onClose={() => setEditing(null)} />}
    </Paper>
  );
}
