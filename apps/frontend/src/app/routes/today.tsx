import {
  Alert,
  Card,
  CardContent,
  List,
  ListItem,
  ListItemText,
  Stack,
  Typography,
} from '@mui/material';
import { SafetyCaution } from '@/components/safety-caution';
import { useSessionUser } from '@/features/auth/auth-context';
import { roleDuties, roleLabels } from '@/lib/roles';

export function TodayRoute() {
  const user = useSessionUser();
  return (
    <Stack spacing={3} sx={{ maxWidth: 880 }}>
      <div>
        <Typography variant="h1">Today</Typography>
        <Typography color="text.secondary">
          Hello, {user.name}. You are signed in as {roleLabels[user.role]}.
        </Typography>
      </div>

      <Card>
        <CardContent>
          <Typography variant="h4" component="h2" gutterBottom>
            What your role does
          </Typography>
          <List dense disablePadding>
            {roleDuties[user.role].map((duty) => (
              <ListItem key={duty} disableGutters>
                <ListItemText primary={duty} />
              </ListItem>
            ))}
          </List>
        </CardContent>
      </Card>

      <Alert severity="info">
        Lots on hold, lots awaiting a decision and instruments coming due will be listed here as
        those screens are built. Nothing is shown until there is real data behind it.
      </Alert>

      <SafetyCaution />
    </Stack>
  );
}
