import MenuIcon from '@mui/icons-material/Menu';
import { AppBar, Box, Drawer, IconButton, Toolbar, Typography } from '@mui/material';
import { lazy, Suspense, useState } from 'react';
import { Outlet } from 'react-router';
import { ScanTagButton } from '@/app/layout/scan-tag-button';
import { SideNav } from '@/app/layout/side-nav';
import { UserMenu } from '@/app/layout/user-menu';
import { useAuth } from '@/features/auth/auth-context';

// Readings this user took offline on this device: the IndexedDB queue's code loads apart.
const YourWaitingReadings = lazy(
  () => import('@/features/inspection/components/bench/your-waiting-readings'),
);

const drawerWidth = 232;

export function AppShell() {
  const { user } = useAuth();
  const [mobileOpen, setMobileOpen] = useState(false);

  return (
    <Box sx={{ display: 'flex', minHeight: '100vh' }}>
      <AppBar position="fixed" sx={{ zIndex: (theme) => theme.zIndex.drawer + 1 }}>
        <Toolbar>
          <IconButton
            color="inherit"
            edge="start"
            aria-label="Open navigation"
            onClick={() => setMobileOpen(true)}
            sx={{ mr: 1, display: { md: 'none' } }}
          >
            <MenuIcon />
          </IconButton>
          <Typography
            variant="h6"
            component="span"
            sx={{ fontWeight: 700, letterSpacing: '0.02em' }}
          >
            Gaugeproof
          </Typography>
          <Typography
            variant="body2"
            component="span"
            sx={{ ml: 2, opacity: 0.75, display: { xs: 'none', sm: 'inline' } }}
          >
            Incoming inspection · supplier quality
          </Typography>
          <Box sx={{ flexGrow: 1 }} />
          <Box sx={{ mr: 1.5 }}>
            <ScanTagButton />
          </Box>
          <UserMenu />
        </Toolbar>
      </AppBar>

      <Box
        component="nav"
        aria-label="Main"
        sx={{ width: { md: drawerWidth }, flexShrink: { md: 0 } }}
      >
        <Drawer
          variant="temporary"
          open={mobileOpen}
          onClose={() => setMobileOpen(false)}
          sx={{
            display: { xs: 'block', md: 'none' },
            '& .MuiDrawer-paper': { width: drawerWidth },
          }}
        >
          <SideNav onNavigate={() => setMobileOpen(false)} />
        </Drawer>
        <Drawer
          variant="permanent"
          open
          sx={{
            display: { xs: 'none', md: 'block' },
            // Papers are outlined by default; a docked drawer needs only its right edge.
            '& .MuiDrawer-paper': {
              width: drawerWidth,
              borderTop: 0,
              borderLeft: 0,
              borderBottom: 0,
            },
          }}
        >
          <SideNav />
        </Drawer>
      </Box>

      <Box component="main" sx={{ flexGrow: 1, minWidth: 0, p: { xs: 2, md: 3 } }}>
        <Toolbar />
        <Suspense fallback={null}>
          <YourWaitingReadings user={user} />
        </Suspense>
        <Outlet />
      </Box>
    </Box>
  );
}
