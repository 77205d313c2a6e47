import { AWG_SIZES, METRIC_SIZES, measuresAs, mm2ToCmil, type Gauge } from '@gaugeproof/standards';
import {
  Stack,
  Table,
  TableBody,
  TableCell,
  TableContainer,
  TableHead,
  TableRow,
  Typography,
} from '@mui/material';
import type { ReactNode } from 'react';

const cmil = new Intl.NumberFormat('en-US', { maximumFractionDigits: 0 });
const head = { fontWeight: 600, whiteSpace: 'nowrap' } as const;

/** Significant figures B258 gives a size: 4 from 0.1 in diameter up, 3 below (ASTM B258). */
const figures = (g: Gauge) => ((g.nominalDiameterIn ?? 0) >= 0.1 ? 4 : 3);

interface Column {
  title: string;
  /** Numbers stand right-aligned. */
  numeric?: boolean;
  cell: (g: Gauge) => ReactNode;
}

/** A table of sizes, its source above it, the header kept in view while it scrolls. */
function SizeTable({
  label,
  source,
  sizes,
  columns,
}: {
  label: string;
  source: ReactNode;
  sizes: readonly Gauge[];
  columns: readonly Column[];
}) {
  const align = (c: Column) => (c.numeric ? 'right' : undefined);
  return (
    <Stack spacing={1}>
      <Typography variant="body2" color="text.secondary">
        {source}
      </Typography>
      <TableContainer sx={{ maxHeight: 480 }}>
        <Table size="small" stickyHeader aria-label={label}>
          <TableHead>
            <TableRow>
              {columns.map((c) => (
                <TableCell key={c.title} sx={head} align={align(c)}>
                  {c.title}
                </TableCell>
              ))}
            </TableRow>
          </TableHead>
          <TableBody>
            {sizes.map((g) => (
              <TableRow key={g.label} hover>
                {columns.map((c) => (
                  <TableCell key={c.title} align={align(c)}>
                    {c.cell(g)}
                  </TableCell>
                ))}
              </TableRow>
            ))}
          </TableBody>
        </Table>
      </TableContainer>
    </Stack>
  );
}

const AWG_COLUMNS: Column[] = [
  { title: 'AWG', cell: (g) => g.label },
  { title: 'Diameter in', numeric: true, cell: (g) => g.nominalDiameterIn?.toFixed(4) },
  { title: 'Diameter mm', numeric: true, cell: (g) => g.nominalDiameterMm?.toPrecision(4) },
  { title: 'Area cmil', numeric: true, cell: (g) => cmil.format(g.nominalAreaCmil ?? 0) },
  { title: 'Area mm²', numeric: true, cell: (g) => g.nominalAreaMm2.toPrecision(figures(g)) },
];

/** AWG 4/0 to 40 as ASTM B258 rounds them, from the standards library. */
export function AwgTable() {
  return (
    <SizeTable
      label="AWG sizes"
      source="Source: ASTM B258 (d = 0.005 in × 92^((36 − n)/39), diameters to 0.0001 in, areas from the rounded diameter). SAE sizes are not AWG sizes and are not listed."
      sizes={AWG_SIZES}
      columns={AWG_COLUMNS}
    />
  );
}

const METRIC_COLUMNS: Column[] = [
  { title: 'Size', cell: (g) => g.label },
  { title: 'Area cmil', numeric: true, cell: (g) => cmil.format(mm2ToCmil(g.nominalAreaMm2)) },
  { title: 'Nearest AWG', cell: (g) => measuresAs(g.nominalAreaMm2, 'awg').gauge.label },
];

/** IEC 60228 nominal cross-sections, with their circular mils and the nearest AWG size. */
export function MetricTable() {
  return (
    <SizeTable
      label="Metric sizes"
      source="Source: IEC 60228 nominal cross-sections (the series from memory). Nearest AWG on a logarithmic scale, for orientation only: a metric size is not an AWG size."
      sizes={METRIC_SIZES}
      columns={METRIC_COLUMNS}
    />
  );
}
