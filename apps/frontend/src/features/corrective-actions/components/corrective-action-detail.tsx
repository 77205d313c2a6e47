import { Alert, Button, Card, CardContent, Grid, Link, Stack, Typography } from '@mui/material';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '@/config/paths';
import { useUpdateCorrectiveAction } from '@/features/corrective-actions/api/update-corrective-action';
import { CarResponseForm } from '@/features/corrective-actions/components/car-response-form';
import { CarStatusChip } from '@/features/corrective-actions/components/car-status-chip';
import {
  awaitingResponse,
  commandLabels,
  statusCommands,
} from '@/features/corrective-actions/lib/car-rules';
import { carStatusLabels, type CorrectiveAction } from '@/features/corrective-actions/types';
import { errorMessage } from '@/lib/query-client';
import { toasts } from '@/lib/toast-store';

const dateFormat = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium' });

function Answer({ label, text }: { label: string; text: string | null }) {
  return (
    <div>
      <Typography variant="caption" color="text.secondary">
        {label}
      </Typography>
      <Typography sx={{ whiteSpace: 'pre-wrap' }}>{text ?? '—'}</Typography>
    </div>
  );
}

/** One SCAR: the problem, the lots, the supplier's response and the allowed next steps. */
export function CorrectiveActionDetail({
  car,
  canRespond,
}: {
  car: CorrectiveAction;
  canRespond: boolean;
}) {
  const move = useUpdateCorrectiveAction({ inlineErrors: true });
  return (
    <Stack spacing={3}>
      <Stack direction="row" spacing={2} sx={{ alignItems: 'center', flexWrap: 'wrap' }}>
        <Typography variant="h1">{car.number}</Typography>
        <CarStatusChip car={car} />
      </Stack>
      {car.overdue && (
        <Alert severity="error" variant="filled">
          The supplier's response was due on {car.dueOn} ({car.daysOverdue} d ago) and has not been
          recorded.
        </Alert>
      )}
      <Card>
        <CardContent>
          <Grid container spacing={2}>
            <Grid size={{ xs: 12, md: 6 }}>
              <Answer label="Supplier" text={`${car.supplier.name} (${car.supplier.code})`} />
            </Grid>
            <Grid size={{ xs: 6, md: 3 }}>
              <Answer label="Response due" text={car.dueOn} />
            </Grid>
            <Grid size={{ xs: 6, md: 3 }}>
              <Answer
                label="Raised"
                text={`${dateFormat.format(new Date(car.createdAt))} by ${car.createdBy.name}`}
              />
            </Grid>
            <Grid size={12}>
              <Answer label="Problem" text={car.problem} />
            </Grid>
            <Grid size={12}>
              <Typography variant="caption" color="text.secondary">
                Lots
              </Typography>
              <Stack direction="row" spacing={2} sx={{ flexWrap: 'wrap' }}>
                {car.lots.map((l) => (
                  <Link key={l.id} component={RouterLink} to={paths.lot.getHref(l.id)}>
                    Lot {l.id} · PO {l.poNumber}
                  </Link>
                ))}
              </Stack>
            </Grid>
          </Grid>
        </CardContent>
      </Card>
      <Card>
        <CardContent>
          <Typography variant="h4" component="h2" gutterBottom>
            Supplier response
          </Typography>
          {awaitingResponse(car.status) && canRespond ? (
            <CarResponseForm key={car.updatedAt} car={car} />
          ) : (
            <Stack spacing={2}>
              {awaitingResponse(car.status) && (
                <Typography color="text.secondary">
                  Purchasing records the supplier's response here.
                </Typography>
              )}
              <Answer label="Containment" text={car.containment} />
              <Answer label="Root cause" text={car.rootCause} />
              <Answer label="Corrective action" text={car.correctiveAction} />
            </Stack>
          )}
        </CardContent>
      </Card>
      {statusCommands(car.status).length > 0 && (
        <Stack direction="row" spacing={1} aria-label="Next steps">
          {statusCommands(car.status).map((next) => (
            <Button
              key={next}
              variant={next === 'reopened' ? 'outlined' : 'contained'}
              loading={move.isPending && move.variables.patch.status === next}
              onClick={() =>
                move.mutate(
                  { id: car.id, patch: { version: car.version, status: next } },
                  {
                    onSuccess: (c) =>
                      toasts.success(`${c.number} is ${carStatusLabels[c.status].toLowerCase()}.`),
                  },
                )
              }
            >
              {commandLabels[next]}
            </Button>
          ))}
        </Stack>
      )}
      {move.isError && <Alert severity="error">{errorMessage(move.error)}</Alert>}
    </Stack>
  );
}
