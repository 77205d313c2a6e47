import CloudUploadOutlined from '@mui/icons-material/CloudUploadOutlined';
import { Button } from '@mui/material';
import { QueuedReadingsAlert } from '@/features/inspection/components/bench/queued-readings-alert';
import type { QueuedReading } from '@/features/inspection/lib/offline-queue';

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
    <QueuedReadingsAlert
      label="Waiting to send"
      severity={waiting.length < entries.length ? 'error' : 'info'}
      icon={<CloudUploadOutlined />}
      action={
        waiting.length > 0 ? (
          <Button color="inherit" size="small" loading={sending} onClick={onSend}>
            Send now
          </Button>
        ) : undefined
      }
      title={`${waiting.length} reading${waiting.length === 1 ? '' : 's'} waiting to send`}
      note="Kept on this device and sent in order when the network answers."
      entries={entries}
      describe={(e) =>
        e.refused ? `Refused by the server, not recorded: ${e.refused}` : 'waiting to send'
      }
      entryAction={(e) => (e.refused ? { text: 'Remove', onClick: onDiscard } : null)}
    />
  );
}
