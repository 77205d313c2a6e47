import {
  Button,
  Table,
  TableBody,
  TableCell,
  TableHead,
  TableRow,
  Typography,
} from '@mui/material';
import { VerdictChip } from '@/features/inspection/components/verdict-chip';
import { identifiedLabels, methodLabels } from '@/features/inspection/lib/labels';
import type { Reading } from '@/features/inspection/types';
import { useUnits, type Units } from '@/lib/units';

const dateTime = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium', timeStyle: 'short' });

function inputText(units: Units, name: string, value: number): string {
  switch (name) {
    case 'massG':
      return `m ${units.formatMassG(value)}`;
    case 'lengthMm':
      return `L ${units.formatLengthMm(value)}`;
    case 'strandDiameterMm':
      return `d ${units.formatDiameterMm(value)}`;
    case 'diameterMm':
      return `D ${units.formatDiameterMm(value)}`;
    case 'resistanceOhm':
      return `R ${units.formatResistanceOhm(value)}`;
    case 'temperatureC':
      return `${value} °C`;
    case 'count':
      return `${value} strands`;
    default:
      return `${name} ${value}`;
  }
}

interface ReadingsTableProps {
  readings: readonly Reading[];
  /** Whether the signed-in user may void this reading (a clerk: their own, until the decision). */
  canVoid: (reading: Reading) => boolean;
  onVoid: (reading: Reading) => void;
}

export function ReadingsTable({ readings, canVoid, onVoid }: ReadingsTableProps) {
  const units = useUnits();
  if (readings.length === 0) {
    return <Typography color="text.secondary">No readings on this sample yet.</Typography>;
  }
  return (
    <Table size="small" aria-label="Readings">
      <TableHead>
        <TableRow>
          {[
            'Method',
            'Inputs',
            'Area ± U (k = 2)',
            'Of nominal',
            'Measures as',
            'Material',
            'Verdict',
            'Taken, with',
            '',
          ].map((h) => (
            <TableCell key={h}>{h}</TableCell>
          ))}
        </TableRow>
      </TableHead>
      <TableBody>
        {readings.map((r) => {
          const struck = r.voided
            ? { textDecoration: 'line-through', color: 'text.disabled' }
            : undefined;
          return [
            <TableRow
              key={r.id}
              sx={struck ? { '& td': struck } : undefined}
              data-voided={r.voided || undefined}
            >
              <TableCell>{methodLabels[r.method]}</TableCell>
              <TableCell sx={{ whiteSpace: 'nowrap' }}>
                {Object.entries(r.inputs).map(([k, v]) => (
                  <div key={k}>{inputText(units, k, v)}</div>
                ))}
              </TableCell>
              <TableCell sx={{ whiteSpace: 'nowrap' }}>
                {units.formatAreaMm2(r.areaMm2)} ± {units.formatAreaMm2(r.UMm2)}
              </TableCell>
              <TableCell>{(r.areaRatio * 100).toFixed(1)} %</TableCell>
              <TableCell sx={{ fontWeight: 700 }}>{r.measuresAs}</TableCell>
              <TableCell>
                {r.identifiedMaterial ? identifiedLabels[r.identifiedMaterial] : '—'}
                {r.materialMismatch ? ' (not as sold)' : ''}
              </TableCell>
              <TableCell sx={r.voided ? { opacity: 0.45 } : undefined}>
                <VerdictChip verdict={r.verdict} />
              </TableCell>
              <TableCell>
                <span style={{ whiteSpace: 'nowrap' }}>{r.takenBy.name}</span>
                <br />
                <span style={{ whiteSpace: 'nowrap' }}>{dateTime.format(new Date(r.takenAt))}</span>
                <Typography variant="caption" component="div" color="text.secondary">
                  {r.instruments.map((i) => `${i.name} (${i.serial})`).join(', ') || '—'}
                </Typography>
              </TableCell>
              <TableCell sx={{ textDecoration: 'none' }}>
                {canVoid(r) && !r.voided && (
                  <Button size="small" color="error" onClick={() => onVoid(r)}>
                    Void
                  </Button>
                )}
              </TableCell>
            </TableRow>,
            r.voided ? (
              <TableRow key={`${r.id}-void`}>
                <TableCell colSpan={9}>
                  <Typography variant="body2" color="error">
                    Void: {r.voidReason} — {r.voidedBy?.name ?? 'someone'}
                    {r.voidedAt ? `, ${dateTime.format(new Date(r.voidedAt))}` : ''}
                  </Typography>
                </TableCell>
              </TableRow>
            ) : null,
          ];
        })}
      </TableBody>
    </Table>
  );
}
