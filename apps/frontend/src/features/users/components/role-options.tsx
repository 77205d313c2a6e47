import { MenuItem } from '@mui/material';
import { ROLES, roleLabels } from '@/lib/roles';

/** Menu items for a role select; MUI's Select wants them as direct children. */
export const roleOptions = ROLES.map((role) => (
  <MenuItem key={role} value={role}>
    {roleLabels[role]}
  </MenuItem>
));
