import CloudUploadOutlined from '@mui/icons-material/CloudUploadOutlined';
import { Alert, Button, List, ListItem, ListItemText, Stack, Typography } from '@mui/material';
import type { QueuedReading } from '@/features/inspection/lib/offline-queue';
import { formatTime } from '@/lib/dates';

interface WaitingReadingsProps {
  entries: readonly QueuedReading[];
  sending: boolean;
  onSend: () => void;
  onDiscard: (clientId: string) => void;
}

/** Readings kept on this device until the network is back; refused ones say why. */
export function WaitingReadings({ entries, sending, onSend, onDiscard }: WaitingReadingsProps) {
  if (entries.length === 0) return null;
  const waiting = entries.filter((e) => e.refused === null);
  return (
    <Alert
      severity={waiting.length < entries.length ? 'error' : 'info'}
      icon={<CloudUploadOutlined />}
      aria-label="Waiting to send"
      action={
        waiting.length > 0 ? (
          <Button color="inherit" size="small" loading={sending} onClick={onSend}>
            Send now
          </Button>
        ) : undefined
      }
    >
      <Typography sx={{ fontWeight: 700 }}>
        {waiting.length} reading{waiting.length === 1 ? '' : 's'} waiting to send
      </Typography>
      <Typography variant="body2">
        Kept on this device and sent in order when the network answers.
      </Typography>
      <List dense disablePadding>
        {entries.map((e) => (
          <ListItem
            key={e.clientId}
            disableGutters
            secondaryAction={
              e.refused ? (
                <Button size="small" color="inherit" onClick={() => onDiscard(e.clientId)}>
                  Remove
                </Button>
              ) : undefined
            }
          >
            <ListItemText
              primary={`${e.label} · ${e.request.method} · taken ${formatTime(e.queuedAt)}`}
              secondary={
                e.refused ? `Refused by the server, not recorded: ${e.refused}` : 'waiting to send'
              }
            />
          </ListItem>
        ))}
      </List>
      <Stack />
    </Alert>
  );
}
