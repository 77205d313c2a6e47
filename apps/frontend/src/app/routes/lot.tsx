import PhoneIphoneOutlined from '@mui/icons-material/PhoneIphoneOutlined';
import { Alert, Box, Button, Grid, Stack } from '@mui/material';
import { Link as RouterLink, useParams } from 'react-router';
import { SectionBoundary } from '@/components/section-boundary';
import { paths } from '@/config/paths';
import { LotTimeline } from '@/features/audit/components/lot-timeline';
import { useSessionUser } from '@/features/auth/auth-context';
import { DecisionPanel } from '@/features/decisions/components/decision-panel';
import { DecisionsCard } from '@/features/decisions/components/decisions-card';
import { PrintTagButton } from '@/features/decisions/components/print-tag-button';
import { useLot } from '@/features/inspection/api/get-lot';
import { EvaluationCard } from '@/features/inspection/components/evaluation-card';
import { ImportReadingsCard } from '@/features/inspection/components/import-readings-card';
import { InspectionPanel } from '@/features/inspection/components/inspection-panel';
import { LotHeader } from '@/features/lots/components/lot-header';
import { PhotosPanel } from '@/features/photos/components/photos-panel';
import { isApiError } from '@/lib/api-client';
import type { Role } from '@/lib/roles';
import { lotLoadFallback } from './lot-load-fallback';
import { photoSampleOptions } from './photo-sample-options';

const RECORDERS: readonly Role[] = ['clerk', 'qa_lead', 'admin'];
const VOIDERS: readonly Role[] = ['qa_lead', 'admin'];
const OPEN_STATUSES = ['on_hold', 'inspecting', 'awaiting_decision'];
const DECIDERS: readonly Role[] = ['qa_lead', 'admin'];
const RETURNERS: readonly Role[] = ['purchasing', 'admin'];

export function LotRoute() {
  const { id } = useParams();
  const lotId = Number(id);
  const user = useSessionUser();
  const lot = useLot(lotId);

  if (
    !Number.isInteger(lotId) ||
    lotId <= 0 ||
    (lot.isError && isApiError(lot.error) && lot.error.status === 404)
  ) {
    return (
      <Alert
        severity="info"
        action={
          <Button component={RouterLink} to={paths.lots.getHref()}>
            All lots
          </Button>
        }
      >
        There is no lot {id}.
      </Alert>
    );
  }
  const fallback = lotLoadFallback(lot, lotId);
  if (fallback || !lot.data) return fallback;
  const data = lot.data;
  const open = OPEN_STATUSES.includes(data.status);
  const canRecord = open && RECORDERS.includes(user.role);
  // A lot goes to `returned` when its return is e-mailed or shipped: the supplier holds its
  // evidence, which stays as sent (the server refuses a void or a new photo, issue 17).
  const frozen = data.status === 'returned';
  // On a laptop screen the decision sits below the readings and photos: a QA lead gets a
  // way straight to it from the recommendation.
  const toDecision =
    data.status === 'awaiting_decision' && DECIDERS.includes(user.role) ? (
      <Button
        color="inherit"
        onClick={() => document.getElementById('decision')?.scrollIntoView({ behavior: 'smooth' })}
      >
        Go to the decision
      </Button>
    ) : undefined;
  const sampleOptions = photoSampleOptions(data);

  return (
    <Stack spacing={3}>
      <LotHeader
        lot={data}
        actions={
          canRecord ? (
            <Button
              variant="contained"
              startIcon={<PhoneIphoneOutlined />}
              component={RouterLink}
              to={paths.lotBench.getHref(data.id)}
            >
              Bench mode
            </Button>
          ) : undefined
        }
      />
      {frozen && (
        <Alert severity="info" role="note" aria-label="Evidence as sent">
          This lot went back to the supplier. Its readings and photos stay exactly as the supplier
          received them: nothing can be voided or added.
        </Alert>
      )}
      <Grid container spacing={3}>
        <Grid size={{ xs: 12, xl: 8 }}>
          <Stack spacing={3}>
            <SectionBoundary name="evaluation">
              <EvaluationCard evaluation={data.evaluation} action={toDecision} />
            </SectionBoundary>
            <SectionBoundary name="samples and readings">
              <InspectionPanel
                lot={data}
                canRecord={canRecord}
                canVoid={(r) =>
                  !frozen &&
                  (VOIDERS.includes(user.role) ||
                    // A clerk corrects their own slip until the lot is decided.
                    (user.role === 'clerk' && open && r.takenBy?.id === user.id))
                }
              />
            </SectionBoundary>
            {canRecord && (
              <SectionBoundary name="CSV import">
                <ImportReadingsCard lotId={data.id} />
              </SectionBoundary>
            )}
            <SectionBoundary name="photos">
              <PhotosPanel
                lotId={data.id}
                photos={data.photos}
                samples={sampleOptions}
                canUpload={!frozen && RECORDERS.includes(user.role)}
                frozen={frozen}
                canVoid={(p) =>
                  !frozen &&
                  (VOIDERS.includes(user.role) ||
                    // A clerk voids their own photo until the lot is decided.
                    (user.role === 'clerk' && open && p.uploadedBy?.id === user.id))
                }
              />
            </SectionBoundary>
          </Stack>
        </Grid>
        <Grid size={{ xs: 12, xl: 4 }} data-testid="lot-side-column">
          <Stack spacing={3}>
            <Stack direction="row" spacing={1} sx={{ flexWrap: 'wrap' }}>
              <PrintTagButton lotId={data.id} />
              {data.status === 'rejected' && RETURNERS.includes(user.role) && (
                <Button
                  variant="contained"
                  component={RouterLink}
                  to={paths.returns.getHref({ lotId: data.id, supplierId: data.supplier.id })}
                >
                  Raise return
                </Button>
              )}
            </Stack>
            <Box id="decision" sx={{ scrollMarginTop: 80 }}>
              <SectionBoundary name="decision">
                {DECIDERS.includes(user.role) ? (
                  <DecisionPanel lot={data} meId={user.id} />
                ) : (
                  <DecisionsCard lotId={data.id} />
                )}
              </SectionBoundary>
            </Box>
            <SectionBoundary name="timeline">
              <LotTimeline lotId={data.id} />
            </SectionBoundary>
          </Stack>
        </Grid>
      </Grid>
    </Stack>
  );
}
