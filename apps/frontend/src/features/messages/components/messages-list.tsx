import {
  Alert,
  Button,
  Chip,
  Link,
  List,
  ListItem,
  ListItemText,
  Skeleton,
  Stack,
  Typography,
} from '@mui/material';
import { Link as RouterLink } from 'react-router';
import { paths } from '@/config/paths';
import { useMessages, type MessagesQuery } from '@/features/messages/api/get-messages';
import { useRetryMessage } from '@/features/messages/api/retry-message';
import type { MessageStatus, OutboundMessage } from '@/features/messages/types';
import { errorMessage } from '@/lib/query-client';
import { toasts } from '@/lib/toast-store';
import { formatDateTime } from '@/lib/dates';

/** How a message's state reads to purchasing. */
export function messageState(m: OutboundMessage): {
  label: string;
  color: 'success' | 'error' | 'default' | 'info' | 'warning';
} {
  const labels: Record<MessageStatus, string> = {
    sent: 'Sent',
    failed: 'Failed',
    logged: 'Logged, not sent',
    queued: 'Queued',
  };
  if (m.status === 'failed' && m.nextAttemptAt)
    return { label: 'Failed, will retry', color: 'warning' };
  if (m.status === 'failed') return { label: 'Failed, gave up', color: 'error' };
  if (m.status === 'sent') return { label: labels.sent, color: 'success' };
  if (m.status === 'queued') return { label: labels.queued, color: 'info' };
  return { label: labels.logged, color: 'default' };
}

function relatedLink(m: OutboundMessage) {
  if (m.relatedType === 'vendor_return' && m.relatedId)
    return (
      <Link component={RouterLink} to={paths.returnDetail.getHref(m.relatedId)}>
        return
      </Link>
    );
  return null;
}

function MessageRow({ message, showRelated }: { message: OutboundMessage; showRelated: boolean }) {
  const retry = useRetryMessage();
  const state = messageState(message);
  const when = message.sentAt ?? message.lastAttemptAt ?? message.createdAt;
  const facts = [
    formatDateTime(when),
    `${message.attempts} attempt(s)`,
    message.replyTo ? `replies to ${message.replyTo}` : null,
    message.attachments.map((a) => a.filename).join(', ') || 'no attachments',
    message.nextAttemptAt ? `next try ${formatDateTime(message.nextAttemptAt)}` : null,
  ].filter(Boolean);
  return (
    <ListItem
      divider
      disableGutters
      aria-label={`Message to ${message.to}`}
      secondaryAction={
        message.status === 'failed' || message.status === 'logged' ? (
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
            {message.status === 'failed' ? 'Retry now' : 'Send'}
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
            sx={{ alignItems: 'center', flexWrap: 'wrap', pr: 12 }}
          >
            <Chip size="small" color={state.color} label={state.label} />
            <span>
              {message.to} · {message.subject}
            </span>
            {showRelated && relatedLink(message)}
          </Stack>
        }
        secondary={
          <>
            {facts.join(' · ')}
            {message.error && (
              <Typography
                component="span"
                variant="body2"
                color={message.status === 'failed' ? 'error' : 'text.secondary'}
                sx={{ display: 'block', overflowWrap: 'anywhere' }}
              >
                {message.status === 'failed' ? 'Server answered: ' : ''}
                {message.error}
              </Typography>
            )}
          </>
        }
      />
    </ListItem>
  );
}

/**
 * E-mails with their fate, newest first: those about one record, or all (the Messages
 * screen). A failed one is retried by the queue on its own; "Retry now" does not wait.
 */
export function MessagesList({ related, status }: MessagesQuery) {
  const messages = useMessages({ related, status });
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
    return (
      <Typography color="text.secondary">
        {related ? 'No e-mail sent yet.' : 'No messages here.'}
      </Typography>
    );
  }
  return (
    <Stack spacing={1}>
      <List dense disablePadding aria-label="Outbound messages">
        {messages.data.items.map((m) => (
          <MessageRow key={m.id} message={m} showRelated={!related} />
        ))}
      </List>
      {messages.data.total > messages.data.items.length && (
        <Typography variant="body2" color="text.secondary">
          The newest {messages.data.items.length} of {messages.data.total}; filter by status to see
          others.
        </Typography>
      )}
    </Stack>
  );
}
