import AccountCircleOutlined from '@mui/icons-material/AccountCircleOutlined';
import Logout from '@mui/icons-material/Logout';
import NotificationsOutlined from '@mui/icons-material/NotificationsOutlined';
import { Link as RouterLink } from 'react-router';
import { paths } from '@/config/paths';
import {
  Box,
  Button,
  Divider,
  ListItemIcon,
  Menu,
  MenuItem,
  ToggleButton,
  ToggleButtonGroup,
  Typography,
} from '@mui/material';
import { useState } from 'react';
import { useAuth, useSessionUser } from '@/features/auth/auth-context';
import { roleLabels } from '@/lib/roles';
import { useUnits, type UnitSystem } from '@/lib/units';

export function UserMenu() {
  const user = useSessionUser();
  const { signOut, signingOut } = useAuth();
  const [anchor, setAnchor] = useState<HTMLElement | null>(null);
  const { system, setSystem } = useUnits();

  return (
    <>
      <Button
        color="inherit"
        startIcon={<AccountCircleOutlined />}
        aria-haspopup="menu"
        aria-controls={anchor ? 'user-menu' : undefined}
        onClick={(event) => setAnchor(event.currentTarget)}
      >
        {user.name}
      </Button>
      <Menu
        id="user-menu"
        anchorEl={anchor}
        open={Boolean(anchor)}
        onClose={() => setAnchor(null)}
        anchorOrigin={{ vertical: 'bottom', horizontal: 'right' }}
        transformOrigin={{ vertical: 'top', horizontal: 'right' }}
      >
        <Box sx={{ px: 2, py: 1, minWidth: 220 }}>
          <Typography variant="subtitle1">{user.name}</Typography>
          <Typography variant="body2" color="text.secondary">
            {user.email}
          </Typography>
          <Typography
            variant="body2"
            color="secondary.dark"
            sx={{ fontWeight: 600 }}
            data-testid="user-role"
          >
            {roleLabels[user.role]}
          </Typography>
        </Box>
        <Divider />
        <Box sx={{ px: 2, py: 1 }}>
          <Typography variant="caption" color="text.secondary" component="div" id="units-label">
            Units
          </Typography>
          <ToggleButtonGroup
            size="small"
            exclusive
            value={system}
            aria-labelledby="units-label"
            onChange={(_event, next: UnitSystem | null) => next && setSystem(next)}
          >
            <ToggleButton value="metric">mm · g · mm²</ToggleButton>
            <ToggleButton value="imperial">in · lb · cmil</ToggleButton>
          </ToggleButtonGroup>
        </Box>
        <Divider />
        <MenuItem
          component={RouterLink}
          to={paths.profile.getHref()}
          onClick={() => setAnchor(null)}
        >
          <ListItemIcon>
            <NotificationsOutlined fontSize="small" />
          </ListItemIcon>
          Profile and e-mail notices
        </MenuItem>
        <MenuItem
          disabled={signingOut}
          onClick={() => {
            setAnchor(null);
            signOut();
          }}
        >
          <ListItemIcon>
            <Logout fontSize="small" />
          </ListItemIcon>
          Sign out
        </MenuItem>
      </Menu>
    </>
  );
}
