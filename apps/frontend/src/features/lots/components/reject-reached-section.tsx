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
import { useRejectReachedLots } from '@/features/lots/api/get-reject-reached';
import { errorMessage } from '@/lib/query-client';

/**
 * Lots whose nonconforming units already reach the plan's reject number: nothing more can
 * make them acceptable (curtailed rejection), so they wait only for the QA lead's decision.
 */
export function RejectReachedSection() {
  const lots = useRejectReachedLots();
  const total = lots.data?.total;
  const title = 'At the reject number';
  return (
    <Card
      component="section"
      aria-label={title}
      sx={{ height: '100%', borderColor: total ? 'error.main' : undefined }}
    >
      <CardContent>
        <Stack direction="row" spacing={1} sx={{ alignItems: 'center', mb: 1 }}>
          <Typography variant="h4" component="h2" sx={{ flexGrow: 1 }}>
            {title}
          </Typography>
          {total !== undefined && (
            <Chip
              label={total}
              color={total > 0 ? 'error' : 'default'}
              size="small"
              aria-label={`${total} lots at the reject number`}
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
          <Typography color="text.secondary">No lot has reached its reject number.</Typography>
        )}
        {lots.isSuccess && lots.data.items.length > 0 && (
          <List dense disablePadding>
            {lots.data.items.map((lot) => (
              <ListItemButton key={lot.id} component={RouterLink} to={paths.lot.getHref(lot.id)}>
                <ListItemText
                  primary={`Lot ${lot.id} · ${lot.product.sku} · PO ${lot.poNumber}`}
                  secondary={`${lot.supplier.name} · ${lot.nonconformingUnits} nonconforming unit${lot.nonconformingUnits === 1 ? '' : 's'}, reject at ${lot.reject}: decide it now`}
                />
              </ListItemButton>
            ))}
          </List>
        )}
      </CardContent>
    </Card>
  );
}
