import { lazy, Suspense } from 'react';
import Box from '@mui/material/Box';
import Toolbar from '@mui/material/Toolbar';
import useMediaQuery from '@mui/material/useMediaQuery';
import { useTheme } from '@mui/material/styles';
import { Outlet, useLocation } from 'react-router-dom';
import { useSession } from '@/features/auth/use-auth';
import { BOTTOM_NAV_HEIGHT, BottomNav } from './bottom-nav';
import { activeRoute, DRAWER_WIDTH, itemsFor } from './nav-items';
import { TopBar } from './top-bar';

// Only a desktop shows the drawer (and MUI's drawer brings its modal and slide with it), so a
// phone never loads it; until it is there, its width is kept so the page does not move.
const SideDrawer = lazy(() => import('./side-drawer').then((m) => ({ default: m.SideDrawer })));

/** The signed-in frame: bottom navigation on a phone, a side drawer from the md breakpoint up. */
export function AppShell() {
  const theme = useTheme();
  const desktop = useMediaQuery(theme.breakpoints.up('md'), { noSsr: true });
  const { activeClub } = useSession();
  const { pathname } = useLocation();
  const items = itemsFor(activeClub.role, desktop);
  const active = activeRoute(items, pathname);
  return (
    <Box sx={{ display: 'flex', minHeight: '100dvh' }}>
      <TopBar desktop={desktop} />
      {desktop && (
        <Suspense fallback={<Box sx={{ width: DRAWER_WIDTH, flexShrink: 0 }} />}>
          <SideDrawer items={items} active={active} />
        </Suspense>
      )}
      <Box
        component="main"
        sx={{
          flexGrow: 1,
          minWidth: 0,
          px: { xs: 2, md: 4 },
          pb: desktop ? 4 : `calc(${BOTTOM_NAV_HEIGHT + 16}px + env(safe-area-inset-bottom))`,
        }}
      >
        <Toolbar sx={{ mb: 2, mt: 'env(safe-area-inset-top)' }} />
        {/* A screen opened by its address shows inside the frame once its chunk is here. */}
        <Suspense fallback={null}>
          <Outlet />
        </Suspense>
      </Box>
      {!desktop && <BottomNav items={items} active={active} />}
    </Box>
  );
}
