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

const cmil = new Intl.NumberFormat('en-US', { maximumFractionDigits: 0 });
const head = { fontWeight: 600, whiteSpace: 'nowrap' } as const;

/** Significant figures B258 gives a size: 4 from 0.1 in diameter up, 3 below (ASTM B258). */
const figures = (g: Gauge) => ((g.nominalDiameterIn ?? 0) >= 0.1 ? 4 : 3);

/** AWG 4/0 to 40 as ASTM B258 rounds them, from the standards library. */
export function AwgTable() {
  return (
    <Stack spacing={1}>
      <Typography variant="body2" color="text.secondary">
        Source: ASTM B258 (d = 0.005 in × 92^((36 − n)/39), diameters to 0.0001 in, areas from the
        rounded diameter). SAE sizes are not AWG sizes and are not listed.
      </Typography>
      <TableContainer sx={{ maxHeight: 480 }}>
        <Table size="small" stickyHeader aria-label="AWG sizes">
          <TableHead>
            <TableRow>
              <TableCell sx={head}>AWG</TableCell>
              <TableCell sx={head} align="right">
                Diameter in
              </TableCell>
              <TableCell sx={head} align="right">
                Diameter mm
              </TableCell>
              <TableCell sx={head} align="right">
                Area cmil
              </TableCell>
              <TableCell sx={head} align="right">
                Area mm²
              </TableCell>
            </TableRow>
          </TableHead>
          <TableBody>
            {AWG_SIZES.map((g) => (
              <TableRow key={g.label} hover>
                <TableCell>{g.label}</TableCell>
                <TableCell align="right">{g.nominalDiameterIn?.toFixed(4)}</TableCell>
                <TableCell align="right">{g.nominalDiameterMm?.toPrecision(4)}</TableCell>
                <TableCell align="right">{cmil.format(g.nominalAreaCmil ?? 0)}</TableCell>
                <TableCell align="right">{g.nominalAreaMm2.toPrecision(figures(g))}</TableCell>
              </TableRow>
            ))}
          </TableBody>
        </Table>
      </TableContainer>
    </Stack>
  );
}

/** IEC 60228 nominal cross-sections, with their circular mils and the nearest AWG size. */
export function MetricTable() {
  return (
    <Stack spacing={1}>
      <Typography variant="body2" color="text.secondary">
        Source: IEC 60228 nominal cross-sections (the series from memory). Nearest AWG on a
        logarithmic scale, for orientation only: a metric size is not an AWG size.
      </Typography>
      <TableContainer sx={{ maxHeight: 480 }}>
        <Table size="small" stickyHeader aria-label="Metric sizes">
          <TableHead>
            <TableRow>
              <TableCell sx={head}>Size</TableCell>
              <TableCell sx={head} align="right">
                Area cmil
              </TableCell>
              <TableCell sx={head}>Nearest AWG</TableCell>
            </TableRow>
          </TableHead>
          <TableBody>
            {METRIC_SIZES.map((g) => (
              <TableRow key={g.label} hover>
                <TableCell>{g.label}</TableCell>
                <TableCell align="right">{cmil.format(mm2ToCmil(g.nominalAreaMm2))}</TableCell>
                <TableCell>{measuresAs(g.nominalAreaMm2, 'awg').gauge.label}</TableCell>
              </TableRow>
            ))}
          </TableBody>
        </Table>
      </TableContainer>
    </Stack>
  );
}
