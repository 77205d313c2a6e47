import ExpandLessOutlined from '@mui/icons-material/ExpandLessOutlined';
import ExpandMoreOutlined from '@mui/icons-material/ExpandMoreOutlined';
import {
  Card,
  CardContent,
  Collapse,
  IconButton,
  Stack,
  Typography,
  useMediaQuery,
  type Theme,
} from '@mui/material';
import { useEffect, useRef, useState } from 'react';
import { AddSampleButton } from '@/features/inspection/components/add-sample-button';
import { ConductorCaution } from '@/features/inspection/components/conductor-caution';
import { SamplePanel } from '@/features/inspection/components/sample-panel';
import { UnitGrid } from '@/features/inspection/components/unit-grid';
import {
  claimedMaterialText,
  conductorLabel,
  needsCaution,
} from '@/features/inspection/lib/labels';
import type { Conductor, Instrument, Sample, Reading } from '@/features/inspection/types';
import { useUnits } from '@/lib/units';

interface ConductorSectionProps {
  lotId: number;
  conductor: Conductor;
  samples: readonly Sample[];
  plannedUnits: number;
  minAreaRatio: number;
  instruments: readonly Instrument[];
  canRecord: boolean;
  /** Whether the signed-in user may void this reading (a clerk: their own, until the decision). */
  canVoid: (reading: Reading) => boolean;
  /** The overview grid asked to show this sample (ignored when it is another conductor's). */
  jump?: { sampleId: number; at: number } | null;
}

export function ConductorSection(props: ConductorSectionProps) {
  const { conductor, samples } = props;
  const { formatAreaMm2 } = useUnits();
  const [selectedId, setSelectedId] = useState<number | null>(null);
  // On a phone the sections start folded: the overview grid above is the way in.
  const phone = useMediaQuery((theme: Theme) => theme.breakpoints.down('md'));
  const [open, setOpen] = useState(!phone);
  const ref = useRef<HTMLElement>(null);
  const { jump } = props;
  useEffect(() => {
    if (!jump || !samples.some((s) => s.id === jump.sampleId)) return;
    setSelectedId(jump.sampleId);
    setOpen(true);
    ref.current?.scrollIntoView({ behavior: 'smooth', block: 'start' });
  }, [jump, samples]);
  const selected = samples.find((s) => s.id === selectedId) ?? samples.at(-1);
  const label = conductorLabel(conductor);
  const caution = needsCaution(
    conductor,
    props.minAreaRatio,
    samples.flatMap((s) => s.readings),
  );
  const nextUnit = Math.max(0, ...samples.map((s) => s.seq)) + 1;

  return (
    <Card
      component="section"
      aria-label={`${label} conductor`}
      ref={ref}
      sx={{ scrollMarginTop: 72 }}
    >
      <CardContent>
        <Stack spacing={2}>
          <Stack
            direction={{ xs: 'column', sm: 'row' }}
            spacing={2}
            sx={{ justifyContent: 'space-between' }}
          >
            <div>
              <Typography variant="h4" component="h2">
                {label}
              </Typography>
              <Typography color="text.secondary">
                Sold as {claimedMaterialText(conductor.claimedMaterial)}
                {conductor.claimedStrands ? `, ${conductor.claimedStrands} strands` : ''} · nominal{' '}
                {formatAreaMm2(conductor.nominalAreaMm2)} · {samples.length} of {props.plannedUnits}{' '}
                units cut
              </Typography>
            </div>
            <Stack direction="row" spacing={1} sx={{ alignItems: 'flex-start' }}>
              {props.canRecord && open && (
                <AddSampleButton
                  lotId={props.lotId}
                  conductorId={conductor.id}
                  conductorLabel={label}
                  nextUnit={nextUnit}
                  onAdded={(s) => setSelectedId(s.id)}
                />
              )}
              <IconButton
                aria-label={open ? `Fold the ${label} conductor` : `Unfold the ${label} conductor`}
                aria-expanded={open}
                onClick={() => setOpen((o) => !o)}
              >
                {open ? <ExpandLessOutlined /> : <ExpandMoreOutlined />}
              </IconButton>
            </Stack>
          </Stack>
          <Collapse in={open} unmountOnExit>
            <Stack spacing={2}>
              <UnitGrid
                units={props.plannedUnits}
                samples={samples}
                selectedSampleId={selected?.id ?? null}
                onSelect={(s) => setSelectedId(s.id)}
              />
              <ConductorCaution
                label={label}
                undersized={caution.undersized}
                notCopper={caution.notCopper}
              />
              {selected ? (
                <SamplePanel
                  key={selected.id}
                  sample={selected}
                  conductor={conductor}
                  minAreaRatio={props.minAreaRatio}
                  instruments={props.instruments}
                  canRecord={props.canRecord}
                  canVoid={props.canVoid}
                />
              ) : (
                <Typography color="text.secondary">
                  No sample of this conductor yet. Cut one from the first unit and add it here.
                </Typography>
              )}
            </Stack>
          </Collapse>
        </Stack>
      </CardContent>
    </Card>
  );
}
