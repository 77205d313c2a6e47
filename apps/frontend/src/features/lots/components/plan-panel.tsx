import { Alert, Card, CardContent, LinearProgress, Typography } from '@mui/material';
import { useSamplingPlan } from '@/features/lots/api/get-sampling-plan';
import { parseLotQuantity } from '@/features/lots/api/create-lot';
import { SamplingPlanSummary } from '@/features/lots/components/sampling-plan-summary';
import { previewPlan } from '@/features/lots/lib/plan-preview';
import { countOf } from '@/lib/counts';
import { useDebouncedValue } from '@/lib/use-debounced-value';
import type { ProductOption } from '@/features/lots/types';
import { errorMessage } from '@/lib/query-client';

interface PlanPanelProps {
  product: ProductOption | null;
  quantityText: string;
  unit: string;
}

/**
 * The sampling plan while the clerk types: computed at once in the browser, then replaced by
 * the server's answer (which knows the current switching state) when it arrives.
 */
export function PlanPanel({ product, quantityText, unit }: PlanPanelProps) {
  const quantity = parseLotQuantity(quantityText);
  const serverQuantity = useDebouncedValue(quantity, 350);
  const server = useSamplingPlan(product?.id ?? null, serverQuantity);

  if (!product) {
    return (
      <Alert severity="info">
        Choose the product and type the quantity to see the sampling plan.
      </Alert>
    );
  }
  if (quantity === null) {
    return (
      <Alert severity="info">
        Type the quantity received (a whole number of at least 1) to see how many units to cut.
      </Alert>
    );
  }
  const preview = previewPlan({
    quantity,
    inspectionLevel: product.inspectionLevel,
    aql: product.aql,
    severity: product.inspectionState.severity,
  });
  const answer = serverQuantity === quantity && server.isSuccess ? server.data : undefined;
  const discontinued = answer ? answer.discontinued : preview.kind === 'discontinued';
  const plan = answer?.samplingPlan ?? (preview.kind === 'plan' ? preview.plan : null);

  return (
    <Card variant="outlined">
      {(server.isFetching || serverQuantity !== quantity) && (
        <LinearProgress aria-label="Checking the plan" />
      )}
      <CardContent>
        <Typography variant="overline" component="h2">
          Sampling plan for {countOf(quantity, unit)}{' '}
          {answer ? '' : '(preview, checking with the server…)'}
        </Typography>
        {discontinued && (
          <Alert severity="error" sx={{ mb: 1 }}>
            {answer?.message ??
              'Inspection of this supplier and product is discontinued after repeated rejections: the lot can be received and held, but a QA lead must decide how to proceed.'}
          </Alert>
        )}
        {answer?.message && !discontinued && (
          <Alert severity={answer.severity === 'normal' ? 'info' : 'warning'} sx={{ mb: 1 }}>
            {answer.message}
          </Alert>
        )}
        {plan && <SamplingPlanSummary plan={plan} unit={unit} />}
        {preview.kind === 'error' && !answer && <Alert severity="error">{preview.message}</Alert>}
        {server.isError && serverQuantity === quantity && (
          <Alert severity="warning" sx={{ mt: 1 }}>
            The server could not confirm the plan: {errorMessage(server.error)}
          </Alert>
        )}
      </CardContent>
    </Card>
  );
}
