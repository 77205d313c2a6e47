import { Alert, Card, CardContent, Stack } from '@mui/material';
import { useState } from 'react';
import { useInstruments } from '@/features/inspection/api/get-instruments';
import { LotOverviewGrid } from '@/features/inspection/components/lot-overview-grid';
import { ConductorSection } from '@/features/inspection/components/conductor-section';
import type { LotDetail, Reading } from '@/features/inspection/types';
import { errorMessage } from '@/lib/query-client';

interface InspectionPanelProps {
  lot: LotDetail;
  canRecord: boolean;
  /** Whether the signed-in user may void this reading (a clerk: their own, until the decision). */
  canVoid: (reading: Reading) => boolean;
}

/** Per conductor of the product: the units of the plan, their samples and readings. */
export function InspectionPanel({ lot, canRecord, canVoid }: InspectionPanelProps) {
  const instruments = useInstruments({ active: true });
  const conductors = [...lot.product.conductors].sort((a, b) => a.position - b.position);
  // A cell of the overview chose this sample; `at` makes a second click on it jump again.
  const [jump, setJump] = useState<{ sampleId: number; at: number } | null>(null);
  return (
    <Stack spacing={3}>
      <Card>
        <CardContent>
          <LotOverviewGrid
            units={lot.samplingPlan.sampleSize}
            conductors={conductors}
            samples={lot.samples}
            onJump={(s) => setJump({ sampleId: s.id, at: Date.now() })}
          />
        </CardContent>
      </Card>
      {canRecord && instruments.isError && (
        <Alert severity="error">
          The instrument register cannot be loaded: {errorMessage(instruments.error)}
        </Alert>
      )}
      {conductors.map((conductor) => (
        <ConductorSection
          key={conductor.id}
          lotId={lot.id}
          conductor={conductor}
          samples={lot.samples
            .filter((s) => s.conductorId === conductor.id)
            .sort((a, b) => a.seq - b.seq)}
          plannedUnits={lot.samplingPlan.sampleSize}
          minAreaRatio={lot.product.minAreaRatio}
          instruments={instruments.data?.items ?? []}
          canRecord={canRecord}
          canVoid={canVoid}
          jump={jump}
        />
      ))}
    </Stack>
  );
}
