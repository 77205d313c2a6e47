import {
  Alert,
  Chip,
  List,
  ListItem,
  ListItemText,
  Skeleton,
  Stack,
  Typography,
} from '@mui/material';
import { useLotDecisions } from '@/features/decisions/api/get-lot-decisions';
import { errorMessage } from '@/lib/query-client';
import { outcomeLabels, type Decision } from '@/features/decisions/types';
import { formatDateTime } from '@/lib/dates';

const outcomeColour = {
  accept: 'success',
  accept_on_concession: 'warning',
  reject: 'error',
} as const;

/** Every decision on the lot, newest first; a later one supersedes, none is ever edited. */
export function DecisionHistory({ lotId }: { lotId: number }) {
  const decisions = useLotDecisions(lotId);
  return (
    <section aria-label="Decisions">
      <Typography variant="h5" component="h3" gutterBottom>
        Decisions
      </Typography>
      {decisions.isPending && <Skeleton height={48} aria-label="Loading the decisions" />}
      {decisions.isError && <Alert severity="error">{errorMessage(decisions.error)}</Alert>}
      {decisions.isSuccess && <DecisionList decisions={decisions.data} />}
    </section>
  );
}

function DecisionList({ decisions }: { decisions: readonly Decision[] }) {
  const newestFirst = [...decisions].sort(
    (a, b) => b.decidedAt.localeCompare(a.decidedAt) || b.id - a.id,
  );
  return newestFirst.length === 0 ? (
    <Typography color="text.secondary">No decision yet.</Typography>
  ) : (
    <List dense disablePadding>
      {newestFirst.map((d, i) => (
        <ListItem key={d.id} disableGutters sx={{ opacity: i === 0 ? 1 : 0.7 }}>
          <ListItemText
            primary={
              <Stack
                component="span"
                direction="row"
                spacing={1}
                sx={{ alignItems: 'center', flexWrap: 'wrap' }}
              >
                <Chip
                  size="small"
                  color={outcomeColour[d.outcome]}
                  label={outcomeLabels[d.outcome]}
                />
                {i > 0 && <Chip size="small" variant="outlined" label="Superseded" />}
                {d.ncrNumber && <Chip size="small" variant="outlined" label={d.ncrNumber} />}
              </Stack>
            }
            secondary={
              <>
                {`${d.decidedBy.name}, ${formatDateTime(d.decidedAt)} · recommended ${d.recommendation}`}
                {d.reason && (
                  <Typography component="span" variant="body2" sx={{ display: 'block' }}>
                    “{d.reason}”
                  </Typography>
                )}
              </>
            }
          />
        </ListItem>
      ))}
    </List>
  );
}
