import { Box, Button, Typography } from '@mui/material';
import { Link as RouterLink } from 'react-router';
import { paths } from '@/config/paths';

export function NotFoundRoute() {
  return (
    <Box sx={{ py: 6, textAlign: 'center' }}>
      <Typography variant="overline" color="secondary.dark">
        404
      </Typography>
      <Typography variant="h1" gutterBottom>
        Page not found
      </Typography>
      <Typography color="text.secondary" sx={{ mb: 3 }}>
        There is no screen at this address. It may have moved, or the link may be mistyped.
      </Typography>
      <Button variant="contained" component={RouterLink} to={paths.root.getHref()}>
        Go to my home screen
      </Button>
    </Box>
  );
}
