import { Stack, Typography } from '@mui/material';
import { SectionBoundary } from '@/components/section-boundary';
import { AuditPanel } from '@/features/audit/components/audit-panel';

export function AuditRoute() {
  return (
    <Stack spacing={2}>
      <div>
        <Typography variant="h1">Audit trail</Typography>
        <Typography color="text.secondary">
          Every change, void, decision, e-mail and export, who made it and when. Nothing here can be
          changed or deleted.
        </Typography>
      </div>
      <SectionBoundary name="audit trail">
        <AuditPanel />
      </SectionBoundary>
    </Stack>
  );
}
