import {
  Button,
  Chip,
  Collapse,
  Table,
  TableBody,
  TableCell,
  TableHead,
  TableRow,
  Typography,
} from '@mui/material';
import { useState } from 'react';
import { formatPercent, formatWithUncertainty } from '@gaugeproof/standards';
import { ReadingBudget } from '@/features/inspection/components/reading-budget';
import { VerdictChip } from '@/features/inspection/components/verdict-chip';
import { identifiedLabels, methodLabels } from '@/features/inspection/lib/labels';
import type { Reading } from '@/features/inspection/types';
import { useUnits, type Units } from '@/lib/units';
import { formatDateTime } from '@/lib/dates';

function inputText(units: Units, name: string, raw: number | number[]): string {
  // Raw inputs are shown in full, as typed (issue 13).
  if (Array.isArray(raw)) {
    return name === 'strandDiametersMm'
      ? `d ${raw.map((d) => units.formatDiameterMm(d)).join(', ')}`
      : `${name} ${raw.join(', ')}`;
  }
  const value = raw;
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

/** The result at its precision (GUM 7.2.6): U to two significant figures, the value alike. */
function resultText(r: Reading): string {
  if (r.criterion === 'resistance' && r.resistanceOhmPerKm && r.UResistanceOhmPerKm) {
    return `${formatWithUncertainty(r.resistanceOhmPerKm, r.UResistanceOhmPerKm, 'Ω/km')} at 20 °C`;
  }
  return formatWithUncertainty(r.areaMm2, r.UMm2, 'mm²');
}

export function ReadingsTable({ readings, canVoid, onVoid }: ReadingsTableProps) {
  const units = useUnits();
  const [open, setOpen] = useState<number | null>(null);
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
            'Result ± U',
            'Of nominal area',
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
              key={`${r.id}-row`}
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
                {resultText(r)}
                {r.limit ? (
                  <Typography variant="caption" component="div">
                    max {r.limit.maxOhmPerKm} Ω/km ({r.limit.source})
                  </Typography>
                ) : null}
                <div>
                  <Button
                    size="small"
                    aria-expanded={open === r.id}
                    onClick={() => setOpen(open === r.id ? null : r.id)}
                    sx={{ textDecoration: 'none' }}
                  >
                    {open === r.id ? 'Hide budget' : 'Budget'}
                  </Button>
                </div>
              </TableCell>
              <TableCell>{formatPercent(r.areaRatio)}</TableCell>
              <TableCell sx={{ fontWeight: 700 }}>
                {r.measuresAs}
                {r.fourWire === false && (
                  <Chip size="small" label="two-wire: decides nothing" sx={{ ml: 1 }} />
                )}
                {r.confirmedUnusual && (
                  <Chip
                    size="small"
                    color="warning"
                    label="unusual, confirmed"
                    title={(r.unusual ?? []).map((q) => q.message).join(' ')}
                    sx={{ ml: 1 }}
                  />
                )}
              </TableCell>
              <TableCell>
                {r.identifiedMaterial ? identifiedLabels[r.identifiedMaterial] : '—'}
                {r.materialMismatch ? ' (not as sold)' : ''}
              </TableCell>
              <TableCell sx={r.voided ? { opacity: 0.45 } : undefined}>
                <VerdictChip verdict={r.verdict} />
              </TableCell>
              <TableCell>
                <span style={{ whiteSpace: 'nowrap' }}>{r.takenBy?.name ?? '—'}</span>
                <br />
                <span style={{ whiteSpace: 'nowrap' }}>{formatDateTime(r.takenAt)}</span>
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
            <TableRow key={`${r.id}-budget`}>
              <TableCell colSpan={10} sx={{ py: 0, borderBottom: open === r.id ? undefined : 0 }}>
                <Collapse in={open === r.id} unmountOnExit>
                  <ReadingBudget reading={r} />
                </Collapse>
              </TableCell>
            </TableRow>,
            r.voided ? (
              <TableRow key={`${r.id}-void`}>
                <TableCell colSpan={9}>
                  <Typography variant="body2" color="error">
                    Void: {r.voidReason} — {r.voidedBy?.name ?? 'someone'}
                    {r.voidedAt ? `, ${formatDateTime(r.voidedAt)}` : ''}
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
