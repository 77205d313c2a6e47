import { Stack, Typography } from '@mui/material';
import { SectionBoundary } from '@/components/section-boundary';
import { useSessionUser } from '@/features/auth/auth-context';
import { SuppliersPanel } from '@/features/suppliers/components/suppliers-panel';

export function SuppliersRoute() {
  const user = useSessionUser();
  // The server is the authority; this only hides the commands.
  const canWrite = user.role === 'purchasing' || user.role === 'admin';
  return (
    <Stack spacing={2}>
      <div>
        <Typography variant="h1">Suppliers</Typography>
        <Typography color="text.secondary">
          Who sends the cable, and whether their deliveries are trusted, watched or suspended.
        </Typography>
      </div>
      <SectionBoundary name="supplier list">
        <SuppliersPanel canWrite={canWrite} />
      </SectionBoundary>
    </Stack>
  );
}
