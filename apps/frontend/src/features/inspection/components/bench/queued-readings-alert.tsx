import {
  Alert,
  Button,
  List,
  ListItem,
  ListItemText,
  Typography,
  type AlertProps,
} from '@mui/material';
import type { ReactNode } from 'react';
import type { QueuedReading } from '@/features/inspection/lib/offline-queue';
import { formatTime } from '@/lib/dates';

/**
 * Readings kept on this device, under a title and a note: one line each (what, by which
 * method, when taken), what became of it, and a small button on the lines that offer one.
 */
export function QueuedReadingsAlert({
  label,
  severity,
  icon,
  action,
  title,
  note,
  entries,
  describe,
  entryAction,
}: {
  label: string;
  severity: AlertProps['severity'];
  icon: ReactNode;
  /** A button for all of them, at the alert's end. */
  action?: ReactNode;
  title: ReactNode;
  note: ReactNode;
  entries: readonly QueuedReading[];
  describe: (entry: QueuedReading) => string;
  /** The button a line offers, if any: its text and what it does with the reading's id. */
  entryAction: (
    entry: QueuedReading,
  ) => { text: string; onClick: (clientId: string) => void } | null;
}) {
  return (
    <Alert severity={severity} icon={icon} aria-label={label} action={action}>
      <Typography sx={{ fontWeight: 700 }}>{title}</Typography>
      <Typography variant="body2">{note}</Typography>
      <List dense disablePadding>
        {entries.map((e) => {
          const button = entryAction(e);
          return (
            <ListItem
              key={e.clientId}
              disableGutters
              secondaryAction={
                button ? (
                  <Button size="small" color="inherit" onClick={() => button.onClick(e.clientId)}>
                    {button.text}
                  </Button>
                ) : undefined
              }
            >
              <ListItemText
                primary={`${e.label} · ${e.request.method} · taken ${formatTime(e.queuedAt)}`}
                secondary={describe(e)}
              />
            </ListItem>
          );
        })}
      </List>
    </Alert>
  );
}
