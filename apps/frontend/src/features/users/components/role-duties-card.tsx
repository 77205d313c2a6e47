import { Card, CardContent, Grid, Typography } from '@mui/material';
import { roleDuties, roleLabels, ROLES } from '@/lib/roles';

/** What each role may do, beside the list of who holds it. The server enforces the same. */
export function RoleDutiesCard() {
  return (
    <Card component="section" aria-label="What each role may do">
      <CardContent>
        <Typography variant="h4" component="h2" gutterBottom>
          What each role may do
        </Typography>
        <Grid container spacing={2}>
          {ROLES.map((role) => (
            <Grid key={role} size={{ xs: 12, sm: 6, lg: 3 }}>
              <Typography variant="subtitle1" component="h3" sx={{ fontWeight: 700 }}>
                {roleLabels[role]}
              </Typography>
              <Typography component="ul" variant="body2" sx={{ pl: 2.5, my: 0.5 }}>
                {roleDuties[role].map((duty) => (
                  <li key={duty}>{duty}</li>
                ))}
              </Typography>
            </Grid>
          ))}
        </Grid>
      </CardContent>
    </Card>
  );
}
