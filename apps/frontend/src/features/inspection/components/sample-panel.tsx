import { Alert, Box, Divider, Stack, Typography } from '@mui/material';
import { useState } from 'react';
import { VoidWithReasonDialog } from '@/components/void-with-reason-dialog';
import { useVoidReading, voidReadingSchema } from '@/features/inspection/api/void-reading';
import { CrossSectionDrawing } from '@/features/inspection/components/cross-section-drawing';
import { ReadingForm } from '@/features/inspection/components/reading-form';
import { ReadingsTable } from '@/features/inspection/components/readings-table';
import { VerdictChip } from '@/features/inspection/components/verdict-chip';
import { currentReading } from '@/features/inspection/lib/labels';
import type { Conductor, Instrument, Reading, Sample } from '@/features/inspection/types';

interface SamplePanelProps {
  sample: Sample;
  conductor: Conductor;
  minAreaRatio: number;
  instruments: readonly Instrument[];
  canRecord: boolean;
  /** Whether the signed-in user may void this reading (a clerk: their own, until the decision). */
  canVoid: (reading: Reading) => boolean;
}

/** One sample: its readings, the drawing of its current result, and the form for the next reading. */
export function SamplePanel({
  sample,
  conductor,
  minAreaRatio,
  instruments,
  canRecord,
  canVoid,
}: SamplePanelProps) {
  const [voiding, setVoiding] = useState<number | null>(null);
  const voidReading = useVoidReading();
  const current = currentReading(sample.readings);
  return (
    <Stack spacing={2} aria-label={`Sample ${sample.seq}`}>
      <Stack direction="row" spacing={1} sx={{ alignItems: 'center' }}>
        <Typography variant="h5" component="h3">
          Unit {sample.seq}
          {sample.unitRef ? ` · ${sample.unitRef}` : ''}
        </Typography>
        <VerdictChip verdict={sample.verdict} />
      </Stack>
      {sample.disagreement && (
        <Alert severity="warning" aria-label="Readings disagree">
          {sample.disagreement.message}
        </Alert>
      )}
      <Box sx={{ overflowX: 'auto' }}>
        <ReadingsTable
          readings={sample.readings}
          canVoid={canVoid}
          onVoid={(r) => setVoiding(r.id)}
        />
      </Box>
      {current && (
        <Stack
          direction={{ xs: 'column', md: 'row' }}
          spacing={2}
          sx={{ alignItems: 'flex-start' }}
        >
          <CrossSectionDrawing
            gauge={conductor.gauge}
            nominalAreaMm2={conductor.nominalAreaMm2}
            measuredAreaMm2={current.areaMm2}
            measuresAs={current.measuresAs}
            notCopper={
              current.materialMismatch ||
              current.identifiedMaterial === 'cca' ||
              current.identifiedMaterial === 'aluminium'
            }
          />
          <Alert
            severity={
              current.verdict === 'conforms'
                ? 'success'
                : current.verdict === 'nonconforming'
                  ? 'error'
                  : 'warning'
            }
            sx={{ flex: 1 }}
          >
            <strong>Measures as {current.measuresAs}</strong> (server result).
            {current.reasons.map((reason) => (
              <Typography key={reason} variant="body2">
                {reason}
              </Typography>
            ))}
            {current.consequence && (
              <Box sx={{ mt: 1 }} aria-label="Installer's consequence">
                <Typography variant="body2">
                  <strong>{current.consequence.text}</strong>
                </Typography>
                {current.consequence.cautions.map((c) => (
                  <Typography key={c} variant="caption" component="div">
                    {c}
                  </Typography>
                ))}
              </Box>
            )}
          </Alert>
        </Stack>
      )}
      {canRecord && (
        <>
          <Divider />
          <ReadingForm
            sampleId={sample.id}
            conductor={conductor}
            minAreaRatio={minAreaRatio}
            instruments={instruments}
          />
        </>
      )}
      {/* Readings are never deleted: voiding keeps the reading visible, struck through, with this reason. */}
      <VoidWithReasonDialog
        thing="reading"
        targetId={voiding}
        explanation="The reading stays visible, struck through, and no longer counts towards the sample's verdict."
        examples="For example: length mis-typed, sample not fully stripped."
        schema={voidReadingSchema}
        mutation={voidReading}
        onVoid={(readingId, reason) => voidReading.mutateAsync({ readingId, reason })}
        onClose={() => setVoiding(null)}
      />
    </Stack>
  );
}
