import { Table, TableBody, TableCell, TableHead, TableRow, Typography } from '@mui/material';
import type { Reading } from '@/features/inspection/types';

/** Significant figures for an input value and its u in the budget (common practice, no source). */
const figures = (v: number) => Number(v.toPrecision(4)).toString();

/**
 * A reading's uncertainty budget (GUM 5.1.6): each input's u, its sensitivity and its share
 * of the relative combined uncertainty, then k (from ν_eff by Welch–Satterthwaite when a
 * Type A term has few readings) and the note on the constants treated as exact.
 */
export function ReadingBudget({ reading }: { reading: Reading }) {
  const budget = reading.budget ?? [];
  if (budget.length === 0) {
    return <Typography variant="body2">No budget stored with this reading.</Typography>;
  }
  const k = reading.coverageFactor ?? 2;
  const dof = reading.effectiveDegreesOfFreedom;
  return (
    <div>
      <Table size="small" aria-label={`Uncertainty budget of reading ${reading.id}`}>
        <TableHead>
          <TableRow>
            {['Component', 'Value', 'u(xᵢ)', 'Sensitivity', 'Share of u/y', 'How'].map((h) => (
              <TableCell key={h}>{h}</TableCell>
            ))}
          </TableRow>
        </TableHead>
        <TableBody>
          {budget.map((line) => (
            <TableRow key={line.name}>
              <TableCell>{line.name}</TableCell>
              <TableCell sx={{ whiteSpace: 'nowrap' }}>
                {figures(line.value)} {line.unit}
              </TableCell>
              <TableCell sx={{ whiteSpace: 'nowrap' }}>
                {line.standardUncertainty === 0 ? '0' : figures(line.standardUncertainty)}{' '}
                {line.unit}
              </TableCell>
              <TableCell>{line.sensitivity}</TableCell>
              <TableCell>
                {/* A share of u, not a ratio: two significant figures (GUM 7.2.6) */}
                {line.relativeContribution === 0
                  ? '0 %'
                  : `${Number((line.relativeContribution * 100).toPrecision(2))} %`}
              </TableCell>
              <TableCell>
                <Typography variant="caption">{line.note}</Typography>
              </TableCell>
            </TableRow>
          ))}
        </TableBody>
      </Table>
      <Typography variant="body2" sx={{ mt: 1 }}>
        U = k · u with k = {k}
        {dof !== null && dof !== undefined
          ? ` (ν_eff = ${dof.toFixed(1)} by Welch–Satterthwaite, GUM G.4.1; Student t at 95.45 %, GUM Table G.2)`
          : ' (every component Type B, GUM 6.2)'}
        . {reading.budgetNote ?? ''}
      </Typography>
    </div>
  );
}
