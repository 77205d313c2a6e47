import { Alert, Box, Button, Card, CardContent, Skeleton, Typography } from '@mui/material';
import type { ReactNode } from 'react';

interface ChartCardProps {
  title: string;
  subtitle?: ReactNode;
  loading: boolean;
  error: unknown;
  onRetry?: () => void;
  /** True when the data arrived but holds nothing to draw. */
  empty: boolean;
  emptyText: string;
  height?: number;
  children: ReactNode;
}

/** A titled card that shows a chart, or its loading, empty or error state. */
export function ChartCard(props: ChartCardProps) {
  const { title, subtitle, loading, error, empty, height = 260 } = props;
  let body: ReactNode;
  if (error) {
    body = (
      <Alert
        severity="error"
        action={
          props.onRetry ? (
            <Button color="inherit" size="small" onClick={props.onRetry}>
              Retry
            </Button>
          ) : undefined
        }
      >
        {error instanceof Error ? error.message : 'The chart could not be loaded.'}
      </Alert>
    );
  } else if (loading) {
    body = <Skeleton variant="rounded" height={height} aria-label={`Loading ${title}`} />;
  } else if (empty) {
    body = (
      <Box sx={{ height, display: 'grid', placeItems: 'center' }}>
        <Typography color="text.secondary">{props.emptyText}</Typography>
      </Box>
    );
  } else {
    body = props.children;
  }
  return (
    <Card variant="outlined" component="section" aria-label={title} sx={{ height: '100%' }}>
      <CardContent>
        <Typography variant="h2" sx={{ fontSize: '1.1rem', fontWeight: 600 }}>
          {title}
        </Typography>
        {subtitle ? (
          <Typography variant="body2" color="text.secondary" sx={{ mb: 1 }}>
            {subtitle}
          </Typography>
        ) : null}
        {body}
      </CardContent>
    </Card>
  );
}
