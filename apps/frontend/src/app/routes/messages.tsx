import { MenuItem, Paper, Stack, TextField, Typography } from '@mui/material';
import { useSearchParams } from 'react-router';
import { SectionBoundary } from '@/components/section-boundary';
import { MessagesList } from '@/features/messages/components/messages-list';
import { MESSAGE_STATUSES, type MessageStatus } from '@/features/messages/types';

const labels: Record<MessageStatus, string> = {
  queued: 'Queued',
  sent: 'Sent',
  failed: 'Failed',
  logged: 'Logged, not sent',
};

/** Every e-mail the product sent or is sending, with the SMTP server's answer. */
export function MessagesRoute() {
  const [params, setParams] = useSearchParams();
  const raw = params.get('status') ?? '';
  const status = (MESSAGE_STATUSES as readonly string[]).includes(raw)
    ? (raw as MessageStatus)
    : '';
  return (
    <Stack spacing={2}>
      <div>
        <Typography variant="h1">Messages</Typography>
        <Typography color="text.secondary">
          E-mails to suppliers and their fate. A failed one is tried again on its own, later each
          time; replies go to the person who sent it.
        </Typography>
      </div>
      <Paper variant="outlined" sx={{ p: 2 }}>
        <TextField
          select
          label="Status"
          value={status}
          onChange={(e) => setParams(e.target.value ? { status: e.target.value } : {})}
          sx={{ width: 220, mb: 2 }}
        >
          <MenuItem value="">All</MenuItem>
          {MESSAGE_STATUSES.map((s) => (
            <MenuItem key={s} value={s}>
              {labels[s]}
            </MenuItem>
          ))}
        </TextField>
        <SectionBoundary name="message list">
          <MessagesList status={status} />
        </SectionBoundary>
      </Paper>
    </Stack>
  );
}
