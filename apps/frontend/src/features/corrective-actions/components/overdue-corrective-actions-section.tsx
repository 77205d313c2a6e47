import {
  Alert,
  Button,
  Card,
  CardContent,
  Chip,
  List,
  ListItemButton,
  ListItemText,
  Skeleton,
  Stack,
  Typography,
} from '@mui/material';
import { Link as RouterLink } from 'react-router';
import { paths } from '@/config/paths';
import { useCorrectiveActions } from '@/features/corrective-actions/api/get-corrective-actions';
import { errorMessage } from '@/lib/query-client';

const PARAMS = { overdue: 'true', pageSize: '10', sort: 'dueOn:asc' };

/** Today: the supplier responses that are late, the longest overdue first. */
export function OverdueCorrectiveActionsSection() {
  const cars = useCorrectiveActions(PARAMS);
  const total = cars.data?.total;
  return (
    <Card component="section" aria-label="Overdue corrective actions" sx={{ height: '100%' }}>
      <CardContent>
        <Stack direction="row" spacing={1} sx={{ alignItems: 'center', mb: 1 }}>
          <Typography variant="h4" component="h2" sx={{ flexGrow: 1 }}>
            Overdue corrective actions
          </Typography>
          {total !== undefined && (
            <Chip
              label={total}
              size="small"
              color={total > 0 ? 'error' : 'default'}
              aria-label={`${total} overdue`}
            />
          )}
        </Stack>
        {cars.isPending && (
          <Skeleton variant="rounded" height={72} aria-label="Loading overdue corrective actions" />
        )}
        {cars.isError && (
          <Alert
            severity="error"
            action={
              <Button color="inherit" onClick={() => void cars.refetch()}>
                Retry
              </Button>
            }
          >
            {errorMessage(cars.error)}
          </Alert>
        )}
        {cars.isSuccess && cars.data.items.length === 0 && (
          <Typography color="text.secondary">No supplier response is overdue.</Typography>
        )}
        {cars.isSuccess && cars.data.items.length > 0 && (
          <List dense disablePadding>
            {cars.data.items.map((c) => (
              <ListItemButton
                key={c.id}
                component={RouterLink}
                to={paths.correctiveActionDetail.getHref(c.id)}
              >
                <ListItemText
                  primary={`${c.number} · ${c.supplier.name}`}
                  secondary={`Due ${c.dueOn} · ${c.problem}`}
                  slotProps={{ secondary: { noWrap: true } }}
                />
              </ListItemButton>
            ))}
          </List>
        )}
        <Button
          component={RouterLink}
          to={`${paths.correctiveActions.getHref()}?overdue=true`}
          size="small"
          sx={{ mt: 1 }}
        >
          All corrective actions
        </Button>
      </CardContent>
    </Card>
  );
}
