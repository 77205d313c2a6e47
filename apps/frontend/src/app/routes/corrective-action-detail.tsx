import ArrowBackOutlined from '@mui/icons-material/ArrowBackOutlined';
import { Alert, Button, Skeleton, Stack } from '@mui/material';
import { Link as RouterLink, useParams } from 'react-router';
import { SectionBoundary } from '@/components/section-boundary';
import { paths } from '@/config/paths';
import { useSessionUser } from '@/features/auth/auth-context';
import { useCorrectiveAction } from '@/features/corrective-actions/api/get-corrective-action';
import { CorrectiveActionDetail } from '@/features/corrective-actions/components/corrective-action-detail';
import { NotFoundRoute } from '@/app/routes/not-found';
import { isApiError } from '@/lib/api-client';
import { errorMessage } from '@/lib/query-client';

export function CorrectiveActionDetailRoute() {
  const id = Number(useParams().id);
  if (!Number.isInteger(id) || id < 1) return <NotFoundRoute />;
  return <CorrectiveActionPage id={id} />;
}

function CorrectiveActionPage({ id }: { id: number }) {
  const user = useSessionUser();
  const car = useCorrectiveAction(id);
  const missing = car.isError && isApiError(car.error) && car.error.status === 404;
  return (
    <Stack spacing={2}>
      <div>
        <Button
          component={RouterLink}
          to={paths.correctiveActions.getHref()}
          startIcon={<ArrowBackOutlined />}
          size="small"
        >
          All corrective actions
        </Button>
      </div>
      {car.isPending && (
        <Skeleton variant="rounded" height={240} aria-label={`Loading corrective action ${id}`} />
      )}
      {car.isError && (
        <Alert
          severity={missing ? 'info' : 'error'}
          action={
            <Button color="inherit" onClick={() => void car.refetch()}>
              Try again
            </Button>
          }
        >
          {missing
            ? `There is no corrective action ${id}.`
            : `The corrective action could not be loaded: ${errorMessage(car.error)}`}
        </Alert>
      )}
      {car.isSuccess && (
        <SectionBoundary name="corrective action">
          {/* The supplier's response is recorded by purchasing (and admin); the server checks. */}
          <CorrectiveActionDetail
            car={car.data}
            canRespond={user.role === 'purchasing' || user.role === 'admin'}
          />
        </SectionBoundary>
      )}
    </Stack>
  );
}
