import {
  Alert,
  Button,
  Chip,
  List,
  ListItem,
  ListItemText,
  Skeleton,
  Stack,
  Typography,
} from '@mui/material';
import { useMessages, type RelatedRecord } from '@/features/messages/api/get-messages';
import { useRetryMessage } from '@/features/messages/api/retry-message';
import type { MessageStatus, OutboundMessage } from '@/features/messages/types';
import { errorMessage } from '@/lib/query-client';
import { toasts } from '@/lib/toast-store';

const dateTime = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium', timeStyle: 'short' });
const statusChip: Record<
  MessageStatus,
  { label: string; color: 'success' | 'error' | 'default' | 'info' }
> = {
  sent: { label: 'Sent', color: 'success' },
  failed: { label: 'Failed', color: 'error' },
  logged: { label: 'Logged, not sent', color: 'default' },
  queued: { label: 'Queued', color: 'info' },
};

function MessageRow({ message }: { message: OutboundMessage }) {
  const retry = useRetryMessage();
  const chip = statusChip[message.status];
  return (
    <ListItem
      divider
      disableGutters
      aria-label={`Message to ${message.to}`}
      secondaryAction={
        message.status === 'failed' ? (
          <Button
            size="small"
            loading={retry.isPending}
            onClick={() =>
              retry.mutate(message.id, {
                onSuccess: (m) =>
                  m.status === 'sent'
                    ? toasts.success(`The message to ${m.to} went out.`)
                    : toasts.error(`The message to ${m.to} failed again: ${m.error ?? m.status}`),
              })
            }
          >
            Retry
          </Button>
        ) : undefined
      }
    >
      <ListItemText
        primary={
          <Stack
            component="span"
            direction="row"
            spacing={1}
            sx={{ alignItems: 'center', flexWrap: 'wrap' }}
          >
            <Chip size="small" color={chip.color} label={chip.label} />
            <span>
              {message.to} · {message.subject}
            </span>
          </Stack>
        }
        secondary={
          <>
            {`${dateTime.format(new Date(message.sentAt ?? message.createdAt))} · ${message.attempts} attempt(s) · ${message.attachments.map((a) => a.filename).join(', ') || 'no attachments'}`}
            {message.error && (
              <Typography
                component="span"
                variant="body2"
                color={message.status === 'failed' ? 'error' : 'text.secondary'}
                sx={{ display: 'block' }}
              >
                {message.error}
              </Typography>
            )}
          </>
        }
      />
    </ListItem>
  );
}

/** Every e-mail sent about one record, newest first, with its fate; failed ones can be retried. */
export function MessagesList({ related }: { related: RelatedRecord }) {
  const messages = useMessages(related);
  if (messages.isPending)
    return <Skeleton variant="rounded" height={56} aria-label="Loading the messages" />;
  if (messages.isError) {
    return (
      <Alert
        severity="error"
        action={
          <Button color="inherit" onClick={() => void messages.refetch()}>
            Retry
          </Button>
        }
      >
        The messages could not be loaded: {errorMessage(messages.error)}
      </Alert>
    );
  }
  if (messages.data.items.length === 0) {
    return <Typography color="text.secondary">No e-mail sent yet.</Typography>;
  }
  return (
    <List dense disablePadding aria-label="Outbound messages">
      {messages.data.items.map((m) => (
        <MessageRow key={m.id} message={m} />
      ))}
    </List>
  );
}
