import { Alert, AlertTitle, Checkbox, FormControlLabel, Link, Stack } from '@mui/material';
import { Link as RouterLink } from 'react-router';
import { paths } from '@/config/paths';
import type { LotSummary } from '@/features/lots/types';
import { countOf } from '@/lib/counts';
import { formatDate } from '@/lib/dates';
import { inSentence, lotStatusLabels } from '@/lib/labels';

interface AlreadyReceivedAlertProps {
  poNumber: string;
  packingSlip: string;
  lots: readonly LotSummary[];
  receiveAgain: boolean;
  onReceiveAgainChange: (next: boolean) => void;
}

/**
 * Shown before saving when this PO and packing slip were received already (issue 15): the
 * lots it names open with a link; a genuine second delivery under the same slip is one tick
 * away (the server asks the same on save, so a missed warning still stops a double entry).
 */
export function AlreadyReceivedAlert(props: AlreadyReceivedAlertProps) {
  const { lots } = props;
  return (
    <Alert severity="warning" aria-label="Already received" role="alert">
      <AlertTitle>
        PO {props.poNumber.trim()} with packing slip {props.packingSlip.trim()} was already received
      </AlertTitle>
      <Stack spacing={0.5}>
        {lots.map((lot) => (
          <span key={lot.id}>
            <Link component={RouterLink} to={paths.lot.getHref(lot.id)} sx={{ fontWeight: 600 }}>
              Lot {lot.id}
            </Link>{' '}
            · received {formatDate(lot.receivedAt)} by {lot.receivedBy.name} ·{' '}
            {countOf(lot.quantity, lot.unit)} of {lot.supplier.code} {lot.product.sku} ·{' '}
            {inSentence(lotStatusLabels[lot.status])}
          </span>
        ))}
        <span>
          Open the lot already received, or, if this is another delivery under the same slip (a back
          order), receive it again as a new lot.
        </span>
        <FormControlLabel
          control={
            <Checkbox
              checked={props.receiveAgain}
              onChange={(e) => props.onReceiveAgainChange(e.target.checked)}
            />
          }
          label="This is another delivery under the same slip: receive it again"
        />
      </Stack>
    </Alert>
  );
}
