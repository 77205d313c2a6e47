import PersonOutlined from '@mui/icons-material/PersonOutlined';
import { Alert, Button, List, ListItem, ListItemText, Typography } from '@mui/material';
import type { QueuedReading } from '@/features/inspection/lib/offline-queue';
import { formatTime } from '@/lib/dates';

interface HeldReadingsProps {
  /** Readings on this device taken by someone other than the signed-in user. */
  entries: readonly QueuedReading[];
  /** For a reading kept before the device knew who took it: "I took it". */
  onClaim: (clientId: string) => void;
}

/** "Alex Doe's" reading waits for Alex: the server files a reading under whoever sends it. */
function recorderWords(entries: readonly QueuedReading[]): string {
  const names = [...new Set(entries.map((e) => e.recordedBy?.name ?? ''))].filter(Boolean);
  return names.length > 0 ? names.join(' and ') : 'someone else';
}

/**
 * Readings another user took on this device while the network was down: they are not sent
 * under the signed-in user's name; they wait for their recorder's next sign-in here.
 */
export function HeldReadings({ entries, onClaim }: HeldReadingsProps) {
  if (entries.length === 0) return null;
  const count = `${entries.length} reading${entries.length === 1 ? '' : 's'}`;
  return (
    <Alert severity="warning" icon={<PersonOutlined />} aria-label="Waiting for their recorder">
      <Typography sx={{ fontWeight: 700 }}>
        {count} taken by {recorderWords(entries)} {entries.length === 1 ? 'waits' : 'wait'} for
        their recorder
      </Typography>
      <Typography variant="body2">
        Not sent under your name: a reading is filed under whoever sends it. It goes when the person
        who took it signs in on this device.
      </Typography>
      <List dense disablePadding>
        {entries.map((e) => (
          <ListItem
            key={e.clientId}
            disableGutters
            secondaryAction={
              e.recordedBy ? undefined : (
                <Button size="small" color="inherit" onClick={() => onClaim(e.clientId)}>
                  I took it
                </Button>
              )
            }
          >
            <ListItemText
              primary={`${e.label} · ${e.request.method} · taken ${formatTime(e.queuedAt)}`}
              secondary={
                e.recordedBy
                  ? `taken by ${e.recordedBy.name}`
                  : 'kept before this device noted who took readings: send it only if you took it'
              }
            />
          </ListItem>
        ))}
      </List>
    </Alert>
  );
}
