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
import { Link as RouterLink } from 'react-router';
import { paths } from '@/config/paths';
import { useUnreturnedLots } from '@/features/returns/api/get-unreturned-lots';
import { errorMessage } from '@/lib/query-client';

const DAY_MS = 86_400_000;

function waited(iso: string | null): string {
  if (!iso) return '';
  const days = Math.floor((Date.now() - Date.parse(iso)) / DAY_MS);
  return days < 1 ? 'rejected today' : `rejected ${days} day${days === 1 ? '' : 's'} ago`;
}

/** Today, for purchasing: rejected lots that are on no return yet, the oldest first. */
export function UnreturnedLotsSection() {
  const lots = useUnreturnedLots();
  const count = lots.data ? `${lots.data.items.length}${lots.data.more ? '+' : ''}` : undefined;
  return (
    <Card component="section" aria-label="Rejected, not yet returned" sx={{ height: '100%' }}>
      <CardContent>
        <Stack direction="row" spacing={1} sx={{ alignItems: 'center', mb: 1 }}>
          <Typography variant="h4" component="h2" sx={{ flexGrow: 1 }}>
            Rejected, not yet returned
          </Typography>
          {count !== undefined && (
            <Chip
              label={count}
              size="small"
              color={count !== '0' ? 'error' : 'default'}
              aria-label={`${count} without a return`}
            />
          )}
        </Stack>
        {lots.isPending && <Skeleton variant="rounded" height={72} aria-label="Loading" />}
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
          <Typography color="text.secondary">Every rejected lot is on a return.</Typography>
        )}
        {lots.isSuccess && lots.data.items.length > 0 && (
          <List dense disablePadding aria-label="Rejected lots without a return">
            {lots.data.items.map((l) => (
              <ListItem
                key={l.id}
                disableGutters
                secondaryAction={
                  <Button
                    size="small"
                    variant="outlined"
                    component={RouterLink}
                    to={paths.returns.getHref({ lotId: l.id, supplierId: l.supplier.id })}
                    aria-label={`Raise a return for lot ${l.id}`}
                  >
                    Raise a return
                  </Button>
                }
                sx={{ pr: 16 }}
              >
                <ListItemText
                  primary={
                    <RouterLink to={paths.lot.getHref(l.id)}>
                      Lot {l.id} · {l.supplier.name}
                    </RouterLink>
                  }
                  secondary={`PO ${l.poNumber} · ${l.product.sku} · ${l.quantity} ${l.unit} · ${waited(l.rejectedAt)}`}
                  slotProps={{ secondary: { noWrap: true } }}
                />
              </ListItem>
            ))}
          </List>
        )}
      </CardContent>
    </Card>
  );
}
