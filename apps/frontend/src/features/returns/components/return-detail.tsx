import FileDownloadOutlined from '@mui/icons-material/FileDownloadOutlined';
import MailOutlined from '@mui/icons-material/MailOutlined';
import PictureAsPdfOutlined from '@mui/icons-material/PictureAsPdfOutlined';
import {
  Alert,
  Button,
  Card,
  CardContent,
  Link,
  List,
  ListItem,
  ListItemText,
  Stack,
  Typography,
} from '@mui/material';
import { useState } from 'react';
import { Link as RouterLink } from 'react-router-dom';
import { downloadCsv } from '@/components/data-table/csv-download-button';
import { paths } from '@/config/paths';
import { useUpdateReturn } from '@/features/returns/api/update-return';
import { EditReturnForm } from '@/features/returns/components/edit-return-form';
import { EmailSupplierDialog } from '@/features/returns/components/email-supplier-dialog';
import { ReturnStatusChip } from '@/features/returns/components/return-status-chip';
import { ReturnStatusStepper } from '@/features/returns/components/return-status-stepper';
import { formatMoney } from '@/features/returns/lib/chargeback';
import { returnEditable } from '@/features/returns/lib/return-steps';
import { returnStatusLabels, type VendorReturn } from '@/features/returns/types';
import { errorMessage } from '@/lib/query-client';
import { toasts } from '@/lib/toast-store';

const dateFormat = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium' });

/** One return to vendor: its lots, status, costs, documents and the e-mail to the supplier. */
export function ReturnDetail({ ret }: { ret: VendorReturn }) {
  const advance = useUpdateReturn({ inlineErrors: true });
  const [emailing, setEmailing] = useState(false);
  const [csvBusy, setCsvBusy] = useState(false);

  const downloadReadings = () => {
    setCsvBusy(true);
    downloadCsv(`/returns/${ret.id}/export.csv`, {}, `${ret.number}-readings.csv`)
      .catch((e: unknown) => toasts.error(errorMessage(e)))
      .finally(() => setCsvBusy(false));
  };

  return (
    <Stack spacing={3}>
      <Stack direction="row" spacing={2} sx={{ alignItems: 'center', flexWrap: 'wrap' }}>
        <Typography variant="h1">Return {ret.number}</Typography>
        <ReturnStatusChip status={ret.status} />
      </Stack>
      <Typography color="text.secondary">
        To {ret.supplier.name} ({ret.supplier.code}) · raised{' '}
        {dateFormat.format(new Date(ret.createdAt))} by {ret.createdBy.name} · chargeback{' '}
        <strong>{formatMoney(ret.chargebackTotal)}</strong>
      </Typography>
      <Card>
        <CardContent>
          <ReturnStatusStepper
            status={ret.status}
            busy={advance.isPending}
            onAdvance={(status) =>
              advance.mutate(
                { id: ret.id, patch: { status } },
                {
                  onSuccess: (r) =>
                    toasts.success(
                      `Return ${r.number} is ${returnStatusLabels[r.status].toLowerCase()}.`,
                    ),
                },
              )
            }
          />
          {advance.isError && (
            <Alert severity="error" sx={{ mt: 2 }}>
              {errorMessage(advance.error)}
            </Alert>
          )}
          {ret.status === 'draft' && (
            <Typography variant="body2" color="text.secondary" sx={{ mt: 1 }}>
              Marking it sent records the lots as returned to the supplier.
            </Typography>
          )}
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
        <Button variant="contained" startIcon={<MailOutlined />} onClick={() => setEmailing(true)}>
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
              <ListItem key={lot.id} disableGutters>
                <ListItemText
                  primary={
                    <Link component={RouterLink} to={paths.lot.getHref(lot.id)}>
                      Lot {lot.id} · PO {lot.poNumber}
                    </Link>
                  }
                  secondary={`${lot.quantity} ${lot.unit} · ${lot.status.replace(/_/g, ' ')}`}
                />
              </ListItem>
            ))}
          </List>
        </CardContent>
      </Card>
      <Card>
        <CardContent>
          <Typography variant="h4" component="h2" gutterBottom>
            RMA, notes and costs
          </Typography>
          {returnEditable(ret.status) ? (
            <EditReturnForm key={ret.updatedAt} ret={ret} />
          ) : (
            <Typography>
              RMA {ret.rmaNumber ?? '—'} · {ret.notes ?? 'no notes'} · chargeback{' '}
              {formatMoney(ret.chargebackTotal)}. A closed return does not change.
            </Typography>
          )}
        </CardContent>
      </Card>
      {emailing && <EmailSupplierDialog ret={ret} onClose={() => setEmailing(false)} />}
    </Stack>
  );
}
