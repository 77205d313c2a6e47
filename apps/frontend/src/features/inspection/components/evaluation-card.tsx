import { Alert, Card, CardContent, Stack, Typography } from '@mui/material';
import type { ReactNode } from 'react';
import type { Evaluation } from '@/features/inspection/types';

const recommendationText: Record<Evaluation['recommendation'], string> = {
  accept: 'Recommendation: accept',
  reject: 'Recommendation: reject',
  incomplete: 'Inspection incomplete',
};
const recommendationSeverity = { accept: 'success', reject: 'error', incomplete: 'info' } as const;

function Figure({ label, value }: { label: string; value: number }) {
  return (
    <div>
      <Typography variant="h3" component="p">
        {value}
      </Typography>
      <Typography variant="caption" color="text.secondary">
        {label}
      </Typography>
    </div>
  );
}

/**
 * The evaluation so far, counted by unit as ISO 2859 counts nonconforming units. `action`
 * sits beside the recommendation (the Lot page puts "Go to the decision" there).
 */
export function EvaluationCard({
  evaluation,
  action,
}: {
  evaluation: Evaluation;
  action?: ReactNode;
}) {
  return (
    <Card aria-label="Evaluation">
      <CardContent>
        <Typography variant="h4" component="h2" gutterBottom>
          Evaluation
        </Typography>
        <Stack direction="row" spacing={4} sx={{ mb: 2 }}>
          <Figure label="units planned" value={evaluation.samplesPlanned} />
          <Figure label="tested" value={evaluation.samplesTested} />
          <Figure label="nonconforming" value={evaluation.nonconforming} />
          <Figure label="inconclusive" value={evaluation.inconclusive} />
        </Stack>
        <Alert severity={recommendationSeverity[evaluation.recommendation]} action={action}>
          <strong>{recommendationText[evaluation.recommendation]}.</strong> {evaluation.message}
        </Alert>
      </CardContent>
    </Card>
  );
}
