import FileDownloadOutlined from '@mui/icons-material/FileDownloadOutlined';
import MailOutlined from '@mui/icons-material/MailOutlined';
import PictureAsPdfOutlined from '@mui/icons-material/PictureAsPdfOutlined';
import {
  Alert,
  Button,
  Card,
  CardContent,
  IconButton,
  Link,
  List,
  ListItem,
  ListItemText,
  Stack,
  Tooltip,
  Typography,
} from '@mui/material';
import RemoveCircleOutline from '@mui/icons-material/RemoveCircleOutlineOutlined';
import { useState } from 'react';
import { Link as RouterLink } from 'react-router';
import { downloadCsv } from '@/components/data-table/csv-download-button';
import { paths } from '@/config/paths';
import { useReturnStep } from '@/features/returns/api/return-steps';
import { useUpdateReturn } from '@/features/returns/api/update-return';
import { EditReturnForm } from '@/features/returns/components/edit-return-form';
import { ReturnStepDialog } from '@/features/returns/components/return-step-dialogs';
import { EmailSupplierDialog } from '@/features/returns/components/email-supplier-dialog';
import { ReturnStatusChip } from '@/features/returns/components/return-status-chip';
import { ReturnStatusStepper } from '@/features/returns/components/return-status-stepper';
import { formatMoney } from '@/features/returns/lib/chargeback';
import { draftOnly, returnEditable, type ReturnStep } from '@/features/returns/lib/return-steps';
import { returnStatusLabels, type VendorReturn } from '@/features/returns/types';
import { errorMessage } from '@/lib/query-client';
import { toasts } from '@/lib/toast-store';
import { formatCalendarDate, formatDate } from '@/lib/dates';
import { inSentence, labelOf, lotStatusLabels } from '@/lib/labels';
import { countOf } from '@/lib/counts';

/** One return to vendor: its lots, status, costs, documents and the e-mail to the supplier. */
export function ReturnDetail({ ret }: { ret: VendorReturn }) {
  const quick = useReturnStep();
  const edit = useUpdateReturn({ inlineErrors: true });
  const [emailing, setEmailing] = useState(false);
  const [dialog, setDialog] = useState<'ship' | 'credit' | 'cancel' | null>(null);
  const [csvBusy, setCsvBusy] = useState(false);

  const downloadReadings = () => {
    setCsvBusy(true);
    downloadCsv(`/returns/${ret.id}/export.csv`, {}, `${ret.number}-readings.csv`)
      .catch((e: unknown) => toasts.error(errorMessage(e)))
      .finally(() => setCsvBusy(false));
  };
  const onStep = (step: ReturnStep) => {
    if (step === 'ship' || step === 'credit' || step === 'cancel') return setDialog(step);
    quick.mutate(
      { id: ret.id, step, version: ret.version },
      {
        onSuccess: (r) =>
          toasts.success(`Return ${r.number} is ${returnStatusLabels[r.status].toLowerCase()}.`),
      },
    );
  };
  const takeOff = (lotId: number) =>
    edit.mutate(
      {
        id: ret.id,
        patch: {
          version: ret.version,
          lotIds: ret.lots.map((l) => l.id).filter((id) => id !== lotId),
        },
      },
      { onSuccess: () => toasts.success(`Lot ${lotId} is off return ${ret.number}.`) },
    );

  return (
    <Stack spacing={3}>
      <Stack direction="row" spacing={2} sx={{ alignItems: 'center', flexWrap: 'wrap' }}>
        <Typography variant="h1">Return {ret.number}</Typography>
        <ReturnStatusChip status={ret.status} />
      </Stack>
      <Typography color="text.secondary">
        To {ret.supplier.name} ({ret.supplier.code}) · raised {formatDate(ret.createdAt)} by{' '}
        {ret.createdBy.name} · chargeback{' '}
        <strong>{formatMoney(ret.chargebackTotal, ret.currency)}</strong>
      </Typography>
      <Card>
        <CardContent>
          <ReturnStatusStepper
            status={ret.status}
            busy={quick.isPending ? quick.variables.step : null}
            onStep={onStep}
          />
          {quick.isError && (
            <Alert severity="error" sx={{ mt: 2 }}>
              {errorMessage(quick.error)}
            </Alert>
          )}
          {ret.status === 'draft' && (
            <Typography variant="body2" color="text.secondary" sx={{ mt: 1 }}>
              E-mailing the notice or recording the shipment records the lots as returned to the
              supplier.
            </Typography>
          )}
          <ReturnFacts ret={ret} />
        </CardContent>
      </Card>
      <Stack direction="row" spacing={1} sx={{ flexWrap: 'wrap' }}>
        <Button
          variant="outlined"
          startIcon={<FileDownloadOutlined />}
          loading={csvBusy}
          onClick={downloadReadings}
        >
          Download CSV
        </Button>
        <Button
          variant="outlined"
          startIcon={<PictureAsPdfOutlined />}
          href={`/api/returns/${ret.id}/evidence.pdf`}
          target="_blank"
          rel="noopener"
        >
          Download evidence pack (PDF)
        </Button>
        <Button
          variant="text"
          href={`/api/returns/${ret.id}/evidence.pdf?paper=letter`}
          target="_blank"
          rel="noopener"
          aria-label="Download evidence pack on US Letter paper"
        >
          US Letter
        </Button>
        <Button
          variant="contained"
          startIcon={<MailOutlined />}
          disabled={!returnEditable(ret.status)}
          onClick={() => setEmailing(true)}
        >
          E-mail supplier
        </Button>
      </Stack>
      <Card>
        <CardContent>
          <Typography variant="h4" component="h2" gutterBottom>
            Lots ({ret.lots.length})
          </Typography>
          <List dense disablePadding aria-label="Lots on the return">
            {ret.lots.map((lot) => (
              <ListItem
                key={lot.id}
                disableGutters
                secondaryAction={
                  draftOnly(ret.status) && ret.lots.length > 1 ? (
                    <Tooltip title="Take this lot off the return">
                      <IconButton
                        edge="end"
                        aria-label={`Take lot ${lot.id} off the return`}
                        disabled={edit.isPending}
                        onClick={() => takeOff(lot.id)}
                      >
                        <RemoveCircleOutline />
                      </IconButton>
                    </Tooltip>
                  ) : undefined
                }
              >
                <ListItemText
                  primary={
                    <Link component={RouterLink} to={paths.lot.getHref(lot.id)}>
                      Lot {lot.id} · PO {lot.poNumber}
                    </Link>
                  }
                  secondary={`${countOf(lot.quantity, lot.unit)} · ${inSentence(labelOf(lotStatusLabels, lot.status))}`}
                />
              </ListItem>
            ))}
          </List>
          {edit.isError && <Alert severity="error">{errorMessage(edit.error)}</Alert>}
        </CardContent>
      </Card>
      <Card>
        <CardContent>
          <Typography variant="h4" component="h2" gutterBottom>
            RMA, notes and costs
          </Typography>
          {returnEditable(ret.status) ? (
            <EditReturnForm key={ret.id} ret={ret} />
          ) : (
            <Typography>
              RMA {ret.rmaNumber ?? '—'} · {ret.notes ?? 'no notes'} · chargeback{' '}
              {formatMoney(ret.chargebackTotal, ret.currency)}. A {ret.status} return does not
              change.
            </Typography>
          )}
        </CardContent>
      </Card>
      {emailing && <EmailSupplierDialog ret={ret} onClose={() => setEmailing(false)} />}
      {dialog && <ReturnStepDialog ret={ret} step={dialog} onClose={() => setDialog(null)} />}
    </Stack>
  );
}

/** What each step recorded: e-mail, shipment, credit, cancellation. */
function ReturnFacts({ ret }: { ret: VendorReturn }) {
  const facts: string[] = [];
  if (ret.emailedAt) facts.push(`Notice e-mailed ${formatDate(ret.emailedAt)}`);
  if (ret.shipment)
    facts.push(
      `Shipped ${formatCalendarDate(ret.shipment.shippedOn)}${ret.shipment.carrier ? ` by ${ret.shipment.carrier}` : ''}${ret.shipment.trackingNumber ? `, tracking ${ret.shipment.trackingNumber}` : ''}${ret.shipment.quantity !== null ? `, ${countOf(ret.shipment.quantity, ret.lots[0]?.unit ?? '')}` : ''}`,
    );
  if (ret.acknowledgedAt) facts.push(`Acknowledged ${formatDate(ret.acknowledgedAt)}`);
  if (ret.credit)
    facts.push(
      `Credit note ${ret.credit.creditNoteNumber}${ret.credit.amount !== null ? `: ${formatMoney(ret.credit.amount, ret.currency)}` : ''}`,
    );
  if (ret.cancelReason && ret.cancelledAt)
    facts.push(`Cancelled ${formatDate(ret.cancelledAt)}: ${ret.cancelReason}`);
  if (!facts.length) return null;
  return (
    <List dense disablePadding aria-label="Return history" sx={{ mt: 2 }}>
      {facts.map((f) => (
        <ListItem key={f} disableGutters>
          <ListItemText primary={f} />
        </ListItem>
      ))}
    </List>
  );
}
