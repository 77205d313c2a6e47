import { Card, CardContent, Stack, Typography } from '@mui/material';
import { SectionBoundary } from '@/components/section-boundary';
import { useSessionUser } from '@/features/auth/auth-context';
import { NoticeSettingsCard } from '@/features/notices/components/notice-settings-card';
import { roleLabels } from '@/lib/roles';

/** /profile: who is signed in, and the e-mail notices they want. */
export function ProfileRoute() {
  const user = useSessionUser();
  return (
    <Stack spacing={3} sx={{ maxWidth: 760 }}>
      <Typography variant="h1">Your profile</Typography>
      <Card>
        <CardContent>
          <Typography variant="h4" component="h2" gutterBottom>
            {user.name}
          </Typography>
          <Typography color="text.secondary">
            {user.email} · {roleLabels[user.role]}
          </Typography>
        </CardContent>
      </Card>
      <SectionBoundary name="e-mail notices">
        <NoticeSettingsCard email={user.email} />
      </SectionBoundary>
    </Stack>
  );
}
