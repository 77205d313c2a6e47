import PersonOutlined from '@mui/icons-material/PersonOutlined';
import { QueuedReadingsAlert } from '@/features/inspection/components/bench/queued-readings-alert';
import type { QueuedReading } from '@/features/inspection/lib/offline-queue';

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
    <QueuedReadingsAlert
      label="Waiting for their recorder"
      severity="warning"
      icon={<PersonOutlined />}
      title={`${count} taken by ${recorderWords(entries)} ${entries.length === 1 ? 'waits' : 'wait'} for their recorder`}
      note="Not sent under your name: a reading is filed under whoever sends it. It goes when the person who took it signs in on this device."
      entries={entries}
      describe={(e) =>
        e.recordedBy
          ? `taken by ${e.recordedBy.name}`
          : 'kept before this device noted who took readings: send it only if you took it'
      }
      entryAction={(e) => (e.recordedBy ? null : { text: 'I took it', onClick: onClaim })}
    />
  );
}
