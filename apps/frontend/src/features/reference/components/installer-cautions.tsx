import { INSTALLER_CAUTIONS } from '@gaugeproof/standards';
import { Alert, AlertTitle, List, ListItem } from '@mui/material';

/** The installer's cautions from the standards library (REFERENCE §7), beside any drop figure. */
export function InstallerCautions() {
  return (
    <Alert severity="warning" role="note">
      <AlertTitle>Installer cautions</AlertTitle>
      <List dense disablePadding sx={{ listStyle: 'disc', pl: 2 }}>
        {INSTALLER_CAUTIONS.map((caution) => (
          <ListItem key={caution} disableGutters sx={{ display: 'list-item' }}>
            {caution}
          </ListItem>
        ))}
      </List>
    </Alert>
  );
}
