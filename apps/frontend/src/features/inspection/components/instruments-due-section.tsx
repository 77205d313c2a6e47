import {
  Alert,
  Button,
  Card,
  CardContent,
  Chip,
  List,
  ListItem,
  ListItemText,
  Skeleton,
  Stack,
  Typography,
} from '@mui/material';
import { useInstruments } from '@/features/inspection/api/get-instruments';
import { instrumentKindLabels, labelOf } from '@/lib/labels';
import { errorMessage } from '@/lib/query-client';

/** Instruments due for calibration within 14 days or overdue: readings with an overdue one are refused. */
export function InstrumentsDueSection() {
  const due = useInstruments({ dueWithinDays: 14 });
  const items = [...(due.data?.items ?? [])].sort((a, b) => a.daysToDue - b.daysToDue);
  return (
    <Card component="section" aria-label="Instruments due" sx={{ height: '100%' }}>
      <CardContent>
        <Stack direction="row" spacing={1} sx={{ alignItems: 'center', mb: 1 }}>
          <Typography variant="h4" component="h2" sx={{ flexGrow: 1 }}>
            Instruments due
          </Typography>
          {due.isSuccess && (
            <Chip
              size="small"
              label={due.data.total}
              color={due.data.total > 0 ? 'warning' : 'default'}
            />
          )}
        </Stack>
        {due.isPending && (
          <Skeleton variant="rounded" height={72} aria-label="Loading instruments due" />
        )}
        {due.isError && (
          <Alert
            severity="error"
            action={
              <Button color="inherit" onClick={() => void due.refetch()}>
                Retry
              </Button>
            }
          >
            {errorMessage(due.error)}
          </Alert>
        )}
        {due.isSuccess && items.length === 0 && (
          <Typography color="text.secondary">
            No instrument is due for calibration in the next 14 days.
          </Typography>
        )}
        {items.length > 0 && (
          <List dense disablePadding>
            {items.map((i) => (
              <ListItem key={i.id} disableGutters>
                <ListItemText
                  primary={`${i.name} (${i.serial})`}
                  secondary={`${labelOf(instrumentKindLabels, i.kind)} · due ${i.calibrationDueOn}`}
                />
                <Chip
                  size="small"
                  color={i.calibrationStatus === 'overdue' ? 'error' : 'warning'}
                  label={
                    i.calibrationStatus === 'overdue'
                      ? `Overdue ${-i.daysToDue} d: readings refused`
                      : `Due in ${i.daysToDue} d`
                  }
                />
              </ListItem>
            ))}
          </List>
        )}
      </CardContent>
    </Card>
  );
}
