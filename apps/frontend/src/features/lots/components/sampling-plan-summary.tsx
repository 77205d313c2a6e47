import { Alert, Chip, Stack, Typography } from '@mui/material';
import { INSPECT_ALL_RULE } from '@gaugeproof/standards';
import { cutInstruction } from '@/features/lots/lib/plan-preview';
import type { SamplingPlan } from '@/features/lots/types';
import { inspectionSeverityLabels } from '@/lib/labels';

interface SamplingPlanSummaryProps {
  plan: SamplingPlan;
  unit: string;
}

/** Code letter, what to cut, Ac/Re and severity of one single sampling plan (ISO 2859-1). */
export function SamplingPlanSummary({ plan, unit }: SamplingPlanSummaryProps) {
  return (
    <Stack spacing={1} aria-label="Sampling plan">
      <Typography variant="h5" component="p">
        {cutInstruction(plan, unit)}
      </Typography>
      <Stack direction="row" spacing={1} useFlexGap sx={{ flexWrap: 'wrap' }}>
        <Chip size="small" label={`Code letter ${plan.codeLetter}`} />
        <Chip
          size="small"
          label={`Accept ≤ ${plan.accept} nonconforming`}
          color="success"
          variant="outlined"
        />
        <Chip
          size="small"
          label={`Reject ≥ ${plan.reject} nonconforming`}
          color="error"
          variant="outlined"
        />
        <Chip
          size="small"
          label={inspectionSeverityLabels[plan.severity]}
          color={plan.severity === 'tightened' ? 'warning' : 'default'}
        />
        <Chip size="small" variant="outlined" label={`Level ${plan.level} · AQL ${plan.aql}`} />
      </Stack>
      {plan.severity === 'tightened' && (
        <Alert severity="warning">
          This supplier and product are on tightened inspection after recent rejections: the plan
          accepts fewer nonconforming units.
        </Alert>
      )}
      {plan.inspectAll && (
        <Alert severity="info">
          Every unit of this lot is inspected: the plan's sample is as large as the lot.{' '}
          {INSPECT_ALL_RULE}
        </Alert>
      )}
    </Stack>
  );
}
