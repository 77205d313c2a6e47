import { Alert, Box, Button, Card, CardContent, Skeleton, Stack, Typography } from '@mui/material';
import { useState } from 'react';
import { useLotTimeline } from '@/features/audit/api/get-lot-timeline';
import type { TimelineEvent } from '@/features/audit/types';
import { errorMessage } from '@/lib/query-client';
import { formatDateTime } from '@/lib/dates';

const dotColour = (action: string) =>
  action.startsWith('decision')
    ? 'secondary.main'
    : action.includes('void')
      ? 'error.main'
      : action.startsWith('return') || action.startsWith('message')
        ? 'warning.main'
        : 'primary.main';

function Entry({ event, last }: { event: TimelineEvent; last: boolean }) {
  return (
    <Stack direction="row" spacing={1.5} component="li" sx={{ listStyle: 'none' }}>
      <Stack sx={{ alignItems: 'center' }}>
        <Box
          sx={{
            width: 10,
            height: 10,
            mt: 0.75,
            borderRadius: '50%',
            bgcolor: dotColour(event.action),
          }}
        />
        {!last && <Box sx={{ flex: 1, width: 2, bgcolor: 'divider', my: 0.5 }} />}
      </Stack>
      <Box sx={{ pb: 1.5 }}>
        <Typography variant="body2">{event.summary}</Typography>
        <Typography variant="caption" color="text.secondary">
          {event.actor?.name ?? 'The system'} · {formatDateTime(event.at)}
        </Typography>
      </Box>
    </Stack>
  );
}

/**
 * Events shown before the clerk asks for the earlier ones: a lot read by a CSV import has
 * hundreds, which made the Lot page several screens of timeline (our choice).
 */
export const RECENT_EVENTS = 10;

/**
 * Everything that happened to the lot, from the append-only audit trail, oldest first:
 * the latest RECENT_EVENTS, and the earlier ones on request.
 */
export function LotTimeline({ lotId }: { lotId: number }) {
  const timeline = useLotTimeline(lotId);
  const [all, setAll] = useState(false);
  const events = timeline.data ?? [];
  const earlier = all ? 0 : Math.max(0, events.length - RECENT_EVENTS);
  const shown = events.slice(earlier);
  return (
    <Card aria-label="Timeline">
      <CardContent>
        <Typography variant="h4" component="h2" gutterBottom>
          Timeline
        </Typography>
        {timeline.isPending && (
          <Skeleton variant="rounded" height={96} aria-label="Loading the timeline" />
        )}
        {timeline.isError && (
          <Alert
            severity="error"
            action={
              <Button color="inherit" onClick={() => void timeline.refetch()}>
                Retry
              </Button>
            }
          >
            The timeline could not be loaded: {errorMessage(timeline.error)}
          </Alert>
        )}
        {timeline.isSuccess && timeline.data.length === 0 && (
          <Typography color="text.secondary">Nothing recorded yet.</Typography>
        )}
        {earlier > 0 && (
          <Button size="small" onClick={() => setAll(true)} sx={{ mb: 1 }}>
            Show the {earlier} earlier {earlier === 1 ? 'event' : 'events'}
          </Button>
        )}
        {shown.length > 0 && (
          <Box component="ol" sx={{ m: 0, p: 0 }} aria-label="Lot events">
            {shown.map((event, i) => (
              <Entry key={event.id} event={event} last={i === shown.length - 1} />
            ))}
          </Box>
        )}
      </CardContent>
    </Card>
  );
}
