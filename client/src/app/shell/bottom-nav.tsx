import BottomNavigation from '@mui/material/BottomNavigation';
import BottomNavigationAction from '@mui/material/BottomNavigationAction';
import Paper from '@mui/material/Paper';
import { Link as RouterLink } from 'react-router-dom';
import { paths, type RouteName } from '../paths';
import type { NavItem } from './nav-items';

export const BOTTOM_NAV_HEIGHT = 64;

export function BottomNav({ items, active }: { items: NavItem[]; active: RouteName | null }) {
  return (
    <Paper
      component="nav"
      aria-label="Main"
      elevation={8}
      sx={{ position: 'fixed', left: 0, right: 0, bottom: 0, pb: 'env(safe-area-inset-bottom)', zIndex: 'appBar' }}
    >
      <BottomNavigation value={active} showLabels>
        {items.map(({ route, label, Icon }) => (
          <BottomNavigationAction
            key={route}
            value={route}
            label={label}
            icon={<Icon />}
            component={RouterLink}
            to={paths[route].href()}
            aria-current={active === route ? 'page' : undefined}
          />
        ))}
      </BottomNavigation>
    </Paper>
  );
}
