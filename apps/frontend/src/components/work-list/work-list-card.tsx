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
import { errorMessage } from '@/lib/query-client';

export interface WorkListItem {
  key: string | number;
  href: string;
  primary: string;
  secondary: string;
}

interface WorkListQuery {
  isPending: boolean;
  isError: boolean;
  error: unknown;
  refetch: () => unknown;
}

/**
 * One of Today's lists of things to act on: a titled card with its count (red when
 * something waits), loading and error states with a retry, the empty sentence, and each
 * item a link to where it is dealt with.
 */
export function WorkListCard({
  title,
  countLabel,
  query,
  items,
  total = items?.length,
  emptyText,
}: {
  title: string;
  /** The count chip's accessible name, e.g. "2 lots at the reject number". */
  countLabel: (total: number) => string;
  query: WorkListQuery;
  items: WorkListItem[] | undefined;
  total?: number;
  emptyText: string;
}) {
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
              aria-label={countLabel(total)}
            />
          )}
        </Stack>
        {query.isPending && <Skeleton variant="rounded" height={72} aria-label="Loading" />}
        {query.isError && (
          <Alert
            severity="error"
            action={
              <Button color="inherit" onClick={() => void query.refetch()}>
                Retry
              </Button>
            }
          >
            {errorMessage(query.error)}
          </Alert>
        )}
        {items?.length === 0 && <Typography color="text.secondary">{emptyText}</Typography>}
        {items && items.length > 0 && (
          <List dense disablePadding>
            {items.map((item) => (
              <ListItemButton key={item.key} component={RouterLink} to={item.href}>
                <ListItemText primary={item.primary} secondary={item.secondary} />
              </ListItemButton>
            ))}
          </List>
        )}
      </CardContent>
    </Card>
  );
}
