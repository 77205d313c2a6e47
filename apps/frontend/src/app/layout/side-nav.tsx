import { List, ListItemButton, ListItemIcon, ListItemText, Toolbar } from '@mui/material';
import { NavLink } from 'react-router';
import { navItemsFor } from '@/app/navigation';
import { useSessionUser } from '@/features/auth/auth-context';

export function SideNav({ onNavigate }: { onNavigate?: () => void }) {
  const user = useSessionUser();
  return (
    <>
      <Toolbar />
      <List data-testid="side-nav" sx={{ px: 1, py: 2 }}>
        {navItemsFor(user.role).map(({ label, path, icon: Icon }) => (
          <ListItemButton
            key={path}
            component={NavLink}
            to={path}
            onClick={onNavigate}
            sx={{
              borderRadius: 1,
              mb: 0.5,
              '&.active': { bgcolor: 'primary.main', color: 'primary.contrastText' },
              '&.active .MuiListItemIcon-root': { color: 'inherit' },
            }}
          >
            <ListItemIcon sx={{ minWidth: 40 }}>
              <Icon />
            </ListItemIcon>
            <ListItemText primary={label} />
          </ListItemButton>
        ))}
      </List>
    </>
  );
}
