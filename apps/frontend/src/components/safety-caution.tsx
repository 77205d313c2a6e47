import { Alert, AlertTitle } from '@mui/material';

/** The standing caution on every screen that touches conductor size, fusing or heat. */
export function SafetyCaution() {
  return (
    <Alert severity="warning" role="note">
      <AlertTitle>Safety caution</AlertTitle>
      An undersized or aluminium conductor drops more voltage and runs hotter, and a fuse sized for
      its label may no longer protect it. Gaugeproof records evidence; it does not certify an
      installation. Follow local codes, the equipment maker's instructions and licensed practice.
    </Alert>
  );
}
