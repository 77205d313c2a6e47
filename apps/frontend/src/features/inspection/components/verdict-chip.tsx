import { Chip } from '@mui/material';
import { verdictColours, verdictLabels } from '@/features/inspection/lib/labels';
import type { SampleVerdict } from '@/features/inspection/types';

export function VerdictChip({ verdict }: { verdict: SampleVerdict }) {
  return <Chip size="small" color={verdictColours[verdict]} label={verdictLabels[verdict]} />;
}
