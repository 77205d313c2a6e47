import { Card, CardContent } from '@mui/material';
import { DecisionHistory } from '@/features/decisions/components/decision-history';

/** The decision history alone, for the roles that do not decide. */
export function DecisionsCard({ lotId }: { lotId: number }) {
  return (
    <Card>
      <CardContent>
        <DecisionHistory lotId={lotId} />
      </CardContent>
    </Card>
  );
}
