import LocalShippingOutlined from '@mui/icons-material/LocalShippingOutlined';
import { Button, Grid, Stack, Typography } from '@mui/material';
import { Link as RouterLink } from 'react-router';
import { SafetyCaution } from '@/components/safety-caution';
import { SectionBoundary } from '@/components/section-boundary';
import { paths } from '@/config/paths';
import { useSessionUser } from '@/features/auth/auth-context';
import { ConcessionsAwaitingSection } from '@/features/decisions/components/concessions-awaiting-section';
import { OverdueCorrectiveActionsSection } from '@/features/corrective-actions/components/overdue-corrective-actions-section';
import { InstrumentsDueSection } from '@/features/inspection/components/instruments-due-section';
import { RejectReachedSection } from '@/features/lots/components/reject-reached-section';
import { TodayLotsSection } from '@/features/lots/components/today-lots-section';
import { UnreturnedLotsSection } from '@/features/returns/components/unreturned-lots-section';
import { roleLabels } from '@/lib/roles';

const CAN_RECEIVE = ['clerk', 'qa_lead', 'admin'];
const FOLLOWS_SUPPLIERS = ['purchasing', 'qa_lead', 'admin'];
const RETURNS_GOODS = ['purchasing', 'admin'];
const DECIDES = ['qa_lead', 'admin'];

export function TodayRoute() {
  const user = useSessionUser();
  return (
    <Stack spacing={3}>
      <Stack
        direction={{ xs: 'column', sm: 'row' }}
        spacing={2}
        sx={{ justifyContent: 'space-between' }}
      >
        <div>
          <Typography variant="h1">Today</Typography>
          <Typography color="text.secondary">
            Hello, {user.name}. You are signed in as {roleLabels[user.role]}. Oldest work first.
          </Typography>
        </div>
        {CAN_RECEIVE.includes(user.role) && (
          <div>
            <Button
              variant="contained"
              size="large"
              startIcon={<LocalShippingOutlined />}
              component={RouterLink}
              to={paths.receiving.getHref()}
            >
              Receive a delivery
            </Button>
          </div>
        )}
      </Stack>
      <Grid container spacing={2}>
        {DECIDES.includes(user.role) && (
          <Grid size={{ xs: 12, lg: 6 }}>
            <SectionBoundary name="lots at the reject number">
              <RejectReachedSection />
            </SectionBoundary>
          </Grid>
        )}
        {DECIDES.includes(user.role) && (
          <Grid size={{ xs: 12, lg: 6 }}>
            <SectionBoundary name="concessions awaiting approval">
              <ConcessionsAwaitingSection />
            </SectionBoundary>
          </Grid>
        )}
        {RETURNS_GOODS.includes(user.role) && (
          <Grid size={{ xs: 12, lg: 6 }}>
            <SectionBoundary name="rejected lots without a return">
              <UnreturnedLotsSection />
            </SectionBoundary>
          </Grid>
        )}
        <Grid size={{ xs: 12, lg: 6 }}>
          <SectionBoundary name="lots on hold">
            <TodayLotsSection
              title="On hold"
              status="on_hold"
              emptyText="No lot is waiting to be inspected."
            />
          </SectionBoundary>
        </Grid>
        <Grid size={{ xs: 12, lg: 6 }}>
          <SectionBoundary name="lots being inspected">
            <TodayLotsSection
              title="Being inspected"
              status="inspecting"
              emptyText="No inspection is under way."
            />
          </SectionBoundary>
        </Grid>
        <Grid size={{ xs: 12, lg: 6 }}>
          <SectionBoundary name="lots awaiting a decision">
            <TodayLotsSection
              title="Awaiting a decision"
              status="awaiting_decision"
              emptyText="No inspected lot is waiting for the QA lead."
            />
          </SectionBoundary>
        </Grid>
        <Grid size={{ xs: 12, lg: 6 }}>
          <SectionBoundary name="instruments due">
            <InstrumentsDueSection />
          </SectionBoundary>
        </Grid>
        {FOLLOWS_SUPPLIERS.includes(user.role) && (
          <Grid size={{ xs: 12, lg: 6 }}>
            <SectionBoundary name="overdue corrective actions">
              <OverdueCorrectiveActionsSection />
            </SectionBoundary>
          </Grid>
        )}
      </Grid>
      <SafetyCaution />
    </Stack>
  );
}
