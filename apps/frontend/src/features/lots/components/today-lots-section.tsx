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
import { useLots } from '@/features/lots/api/get-lots';
import type { LotStatus } from '@/features/lots/types';
import { errorMessage } from '@/lib/query-client';
import { countOf } from '@/features/lots/lib/plan-preview';
import { formatDate } from '@/lib/dates';

interface TodayLotsSectionProps {
  title: string;
  status: LotStatus;
  /** What the empty list means for the user ("Nothing is waiting on the dock."). */
  emptyText: string;
}

const daysAgo = (iso: string) => Math.floor((Date.now() - new Date(iso).getTime()) / 86_400_000);

/** The ten oldest lots in one status, oldest first: the order work should be done in. */
export function TodayLotsSection({ title, status, emptyText }: TodayLotsSectionProps) {
  const lots = useLots({ status: [status], pageSize: 10, sort: 'receivedAt:asc' });
  const total = lots.data?.total;
  const shown = lots.data?.items.length ?? 0;
  return (
    <Card component="section" aria-label={title} sx={{ height: '100%' }}>
      <CardContent>
        <Stack direction="row" spacing={1} sx={{ alignItems: 'center', mb: 1 }}>
          <Typography variant="h4" component="h2" sx={{ flexGrow: 1 }}>
            {title}
          </Typography>
          {total !== undefined && (
            <Chip
              label={total}
              color={total > 0 ? 'primary' : 'default'}
              size="small"
              aria-label={`${total} lots`}
            />
          )}
        </Stack>
        {lots.isPending && (
          <Skeleton variant="rounded" height={72} aria-label={`Loading ${title.toLowerCase()}`} />
        )}
        {lots.isError && (
          <Alert
            severity="error"
            action={
              <Button color="inherit" onClick={() => void lots.refetch()}>
                Retry
              </Button>
            }
          >
            {errorMessage(lots.error)}
          </Alert>
        )}
        {lots.isSuccess && lots.data.items.length === 0 && (
          <Typography color="text.secondary">{emptyText}</Typography>
        )}
        {lots.isSuccess && lots.data.items.length > 0 && (
          <List dense disablePadding>
            {lots.data.items.map((lot) => {
              const age = daysAgo(lot.receivedAt);
              return (
                <ListItemButton key={lot.id} component={RouterLink} to={paths.lot.getHref(lot.id)}>
                  <ListItemText
                    primary={`Lot ${lot.id} · ${lot.product.sku} · PO ${lot.poNumber}`}
                    secondary={`${lot.supplier.name} · ${countOf(lot.quantity, lot.unit)} · received ${formatDate(lot.receivedAt)}${age >= 1 ? ` (${age} d ago)` : ''}`}
                  />
                </ListItemButton>
              );
            })}
          </List>
        )}
        {total !== undefined && total > 0 && (
          <Button
            component={RouterLink}
            to={paths.lots.getHref(status)}
            size="small"
            sx={{ mt: 1 }}
          >
            {total > shown ? `All ${total} in the Lots list` : 'Open in the Lots list'}
          </Button>
        )}
      </CardContent>
    </Card>
  );
}
