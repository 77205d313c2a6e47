import ArrowBackOutlined from '@mui/icons-material/ArrowBackOutlined';
import { Alert, Button, Card, CardContent, Skeleton, Stack, Typography } from '@mui/material';
import { Link as RouterLink, useParams } from 'react-router';
import { SectionBoundary } from '@/components/section-boundary';
import { paths } from '@/config/paths';
import { MessagesList } from '@/features/messages/components/messages-list';
import { useReturn } from '@/features/returns/api/get-return';
import { ReturnDetail } from '@/features/returns/components/return-detail';
import { NotFoundRoute } from '@/app/routes/not-found';
import { isApiError } from '@/lib/api-client';
import { errorMessage } from '@/lib/query-client';

export function ReturnDetailRoute() {
  const id = Number(useParams().id);
  if (!Number.isInteger(id) || id < 1) return <NotFoundRoute />;
  return <ReturnPage id={id} />;
}

function ReturnPage({ id }: { id: number }) {
  const ret = useReturn(id);
  return (
    <Stack spacing={2}>
      <div>
        <Button
          component={RouterLink}
          to={paths.returns.getHref()}
          startIcon={<ArrowBackOutlined />}
          size="small"
        >
          All returns
        </Button>
      </div>
      {ret.isPending && (
        <Skeleton variant="rounded" height={240} aria-label={`Loading return ${id}`} />
      )}
      {ret.isError && (
        <Alert
          severity={isApiError(ret.error) && ret.error.status === 404 ? 'info' : 'error'}
          action={
            <Button color="inherit" onClick={() => void ret.refetch()}>
              Try again
            </Button>
          }
        >
          {isApiError(ret.error) && ret.error.status === 404
            ? `There is no return ${id}.`
            : `The return could not be loaded: ${errorMessage(ret.error)}`}
        </Alert>
      )}
      {ret.isSuccess && (
        <>
          <SectionBoundary name="return">
            <ReturnDetail ret={ret.data} />
          </SectionBoundary>
          <Card>
            <CardContent>
              <Typography variant="h4" component="h2" gutterBottom>
                E-mails to the supplier
              </Typography>
              <SectionBoundary name="messages">
                <MessagesList related={{ relatedType: 'vendor_return', relatedId: id }} />
              </SectionBoundary>
            </CardContent>
          </Card>
        </>
      )}
    </Stack>
  );
}
