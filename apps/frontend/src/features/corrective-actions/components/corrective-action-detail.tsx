import MailOutlined from '@mui/icons-material/MailOutlined';
import {
  Alert,
  Button,
  Card,
  CardContent,
  Grid,
  Link,
  List,
  ListItem,
  ListItemText,
  Stack,
  Typography,
} from '@mui/material';
import { useState } from 'react';
import { Link as RouterLink } from 'react-router';
import {
  useRevokeLinks,
  useScarFiles,
  useSendToSupplier,
} from '@/features/corrective-actions/api/supplier-link';
import { CarStepDialog } from '@/features/corrective-actions/components/car-step-dialog';
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
import { formatDate } from '@/lib/dates';

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
  const send = useSendToSupplier(car.id);
  const revoke = useRevokeLinks(car.id);
  const [dialog, setDialog] = useState<'reopened' | 'verified' | null>(null);
  const sendable = car.status !== 'verified' && car.status !== 'closed';
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
                text={`${formatDate(car.createdAt)} by ${car.createdBy.name}`}
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
              <Answer label="In place by (promised)" text={car.promisedOn} />
              {car.respondedAt && (
                <Answer
                  label="Answered"
                  text={`${formatDate(car.respondedAt)}${car.respondedBy ? ` · ${car.respondedBy}` : ''}`}
                />
              )}
              {car.reopenComment && <Answer label="Last asked for more" text={car.reopenComment} />}
              {car.verification && (
                <Answer
                  label="Verified"
                  text={`${formatDate(car.verification.at)} by ${car.verification.by?.name ?? '—'}: ${car.verification.note ?? ''}${car.verification.lot ? ` (lot ${car.verification.lot.id}, PO ${car.verification.lot.poNumber})` : ''}`}
                />
              )}
            </Stack>
          )}
        </CardContent>
      </Card>
      <ScarFiles id={car.id} />
      {sendable && (
        <Stack
          direction="row"
          spacing={1}
          sx={{ flexWrap: 'wrap' }}
          aria-label="The supplier's page"
        >
          <Button
            variant="outlined"
            startIcon={<MailOutlined />}
            loading={send.isPending}
            onClick={() =>
              send.mutate(undefined, {
                onSuccess: ({ message }) =>
                  message.status === 'sent' || message.status === 'queued'
                    ? toasts.success(`A link to answer went to ${message.to}.`)
                    : toasts.show(
                        `The link to ${message.to} is stored but not sent: ${message.error ?? message.status}`,
                        'warning',
                      ),
              })
            }
          >
            E-mail the supplier a link to answer
          </Button>
          <Button
            color="inherit"
            loading={revoke.isPending}
            onClick={() =>
              revoke.mutate(undefined, {
                onSuccess: ({ revoked }) =>
                  toasts.success(
                    revoked ? `${revoked} link(s) withdrawn.` : 'There was no open link.',
                  ),
              })
            }
          >
            Withdraw the links
          </Button>
        </Stack>
      )}
      {(send.isError || revoke.isError) && (
        <Alert severity="error">{errorMessage(send.error ?? revoke.error)}</Alert>
      )}
      {statusCommands(car.status).length > 0 && (
        <Stack direction="row" spacing={1} aria-label="Next steps">
          {statusCommands(car.status).map((next) => (
            <Button
              key={next}
              variant={next === 'reopened' ? 'outlined' : 'contained'}
              loading={move.isPending && move.variables.patch.status === next}
              onClick={() =>
                next === 'reopened' || next === 'verified'
                  ? setDialog(next)
                  : move.mutate(
                      { id: car.id, patch: { version: car.version, status: next } },
                      {
                        onSuccess: (c) =>
                          toasts.success(
                            `${c.number} is ${carStatusLabels[c.status].toLowerCase()}.`,
                          ),
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
      {dialog && <CarStepDialog car={car} step={dialog} onClose={() => setDialog(null)} />}
    </Stack>
  );
}

/** The files the supplier sent with its answer. */
function ScarFiles({ id }: { id: number }) {
  const files = useScarFiles(id);
  if (!files.data?.length) return null;
  return (
    <Card>
      <CardContent>
        <Typography variant="h4" component="h2" gutterBottom>
          Files from the supplier
        </Typography>
        <List dense disablePadding aria-label="Files from the supplier">
          {files.data.map((f) => (
            <ListItem key={f.id} disableGutters>
              <ListItemText
                primary={
                  <Link href={`/api/corrective-actions/${id}/attachments/${f.id}`}>
                    {f.filename}
                  </Link>
                }
                secondary={[
                  `${(f.sizeBytes / 1024).toFixed(0)} KB`,
                  f.addedBy,
                  formatDate(f.createdAt),
                ]
                  .filter(Boolean)
                  .join(' · ')}
              />
            </ListItem>
          ))}
        </List>
      </CardContent>
    </Card>
  );
}
