import {
  Alert,
  Button,
  Card,
  CardContent,
  Chip,
  List,
  ListItem,
  ListItemButton,
  ListItemText,
  Skeleton,
  Stack,
  Typography,
} from '@mui/material';
import type { ReactNode } from 'react';
import { Link as RouterLink } from 'react-router';
import { errorMessage } from '@/lib/query-client';

export interface WorkListItem {
  key: string | number;
  primary: ReactNode;
  secondary: string;
  /** Where the item is dealt with: the whole row is a link to it. */
  href?: string;
  /** A row that is no link: a button at its end (e.g. "Raise a return"). */
  action?: ReactNode;
  /** A row that is no link: something shown after its text (e.g. a status chip). */
  aside?: ReactNode;
}

interface WorkListQuery {
  isPending: boolean;
  isError: boolean;
  error: unknown;
  refetch: () => unknown;
}

/**
 * One of Today's lists of things to act on: a titled card with its count, loading and
 * error states with a retry, the empty sentence, each item a link to where it is dealt
 * with (or a row with its own button), and a way on to the full list below.
 */
export function WorkListCard({
  title,
  countLabel,
  query,
  items,
  total = items?.length,
  more = false,
  tone = 'error',
  urgent = tone === 'error',
  loadingLabel = 'Loading',
  listLabel,
  noWrap = false,
  emptyText,
  footer,
}: {
  title: string;
  /** The count chip's accessible name, from the count as shown, e.g. "2 lots at the reject number". */
  countLabel?: (count: string) => string;
  query: WorkListQuery;
  /** Undefined until the list has come. */
  items: WorkListItem[] | undefined;
  total?: number;
  /** More than `total` wait: the count reads "10+". */
  more?: boolean;
  /** The count chip's colour while something waits. */
  tone?: 'error' | 'warning' | 'primary';
  /** Whether the card's border turns red while something waits. */
  urgent?: boolean;
  loadingLabel?: string;
  listLabel?: string;
  /** Keep each item's second line to one line. */
  noWrap?: boolean;
  emptyText: ReactNode;
  footer?: ReactNode;
}) {
  const count = total === undefined ? undefined : `${total}${more ? '+' : ''}`;
  return (
    <Card
      component="section"
      aria-label={title}
      sx={{ height: '100%', borderColor: urgent && total ? 'error.main' : undefined }}
    >
      <CardContent>
        <Stack direction="row" spacing={1} sx={{ alignItems: 'center', mb: 1 }}>
          <Typography variant="h4" component="h2" sx={{ flexGrow: 1 }}>
            {title}
          </Typography>
          {count !== undefined && (
            <Chip
              label={count}
              color={total ? tone : 'default'}
              size="small"
              aria-label={countLabel?.(count)}
            />
          )}
        </Stack>
        {query.isPending && <Skeleton variant="rounded" height={72} aria-label={loadingLabel} />}
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
          <List dense disablePadding aria-label={listLabel}>
            {items.map((item) => {
              const text = (
                <ListItemText
                  primary={item.primary}
                  secondary={item.secondary}
                  slotProps={noWrap ? { secondary: { noWrap: true } } : undefined}
                />
              );
              return item.href ? (
                <ListItemButton key={item.key} component={RouterLink} to={item.href}>
                  {text}
                </ListItemButton>
              ) : (
                <ListItem
                  key={item.key}
                  disableGutters
                  secondaryAction={item.action}
                  sx={item.action ? { pr: 16 } : undefined}
                >
                  {text}
                  {item.aside}
                </ListItem>
              );
            })}
          </List>
        )}
        {footer}
      </CardContent>
    </Card>
  );
}
