import UploadFileOutlined from '@mui/icons-material/UploadFileOutlined';
import {
  Alert,
  AlertTitle,
  Button,
  Card,
  CardContent,
  Stack,
  Table,
  TableBody,
  TableCell,
  TableHead,
  TableRow,
  Typography,
} from '@mui/material';
import { useRef } from 'react';
import { ImportRejectedError, useImportReadings } from '@/features/inspection/api/import-readings';
import { errorMessage } from '@/lib/query-client';

/** Readings from a bench logger's CSV: all or nothing, every bad cell listed. */
export function ImportReadingsCard({ lotId }: { lotId: number }) {
  const importer = useImportReadings(lotId);
  const input = useRef<HTMLInputElement>(null);
  const rejected = importer.error instanceof ImportRejectedError ? importer.error : null;

  const send = (file: File | undefined) => {
    if (!file) return;
    importer.mutate(file, { onSettled: () => input.current && (input.current.value = '') });
  };

  return (
    <Card>
      <CardContent>
        <Stack spacing={2}>
          <Typography variant="h4" component="h2">
            Import readings from CSV
          </Typography>
          <Typography variant="body2" color="text.secondary">
            One row per reading, as a bench logger exports them, with a header row naming the
            columns: <code>unit, conductor, method, instruments</code> (serials separated by ;) and
            the method&apos;s values{' '}
            <code>
              massG, lengthMm, count, strandDiameterMm, resistanceOhm, temperatureC, diameterMm
            </code>
            ; optional <code>unitRef</code>. Conductor is a purpose (power, ground…) or its number
            on the product. The file is taken whole or not at all, and the server recomputes every
            result.
          </Typography>
          <div>
            <Button
              variant="outlined"
              startIcon={<UploadFileOutlined />}
              loading={importer.isPending}
              onClick={() => input.current?.click()}
            >
              Choose a CSV file
            </Button>
            <input
              ref={input}
              type="file"
              hidden
              accept=".csv,text/csv"
              aria-label="CSV file"
              onChange={(e) => send(e.target.files?.[0])}
            />
          </div>
          {importer.isSuccess && (
            <Alert severity="success">
              {importer.data.imported} reading{importer.data.imported === 1 ? '' : 's'} imported and
              recomputed by the server.
            </Alert>
          )}
          {rejected && (
            <Alert severity="error">
              <AlertTitle>The file was refused: nothing was saved.</AlertTitle>
              {rejected.body?.message && (
                <Typography variant="body2">{[rejected.body.message].flat().join(' ')}</Typography>
              )}
              {rejected.rowErrors.length > 0 && (
                <Table size="small" aria-label="Import errors">
                  <TableHead>
                    <TableRow>
                      <TableCell>Row</TableCell>
                      <TableCell>Column</TableCell>
                      <TableCell>Problem</TableCell>
                    </TableRow>
                  </TableHead>
                  <TableBody>
                    {rejected.rowErrors.map((e, i) => (
                      <TableRow key={`${e.row}-${e.column}-${i}`}>
                        <TableCell>{e.row ?? '—'}</TableCell>
                        <TableCell>{e.column ?? '—'}</TableCell>
                        <TableCell>{e.message}</TableCell>
                      </TableRow>
                    ))}
                  </TableBody>
                </Table>
              )}
              <Typography variant="body2">Correct the file and import it again.</Typography>
            </Alert>
          )}
          {importer.isError && !rejected && (
            <Alert severity="error">
              The import failed, nothing was saved: {errorMessage(importer.error)}
            </Alert>
          )}
        </Stack>
      </CardContent>
    </Card>
  );
}
