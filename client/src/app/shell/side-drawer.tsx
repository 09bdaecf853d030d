import Drawer from '@mui/material/Drawer';
import List from '@mui/material/List';
import ListItemButton from '@mui/material/ListItemButton';
import ListItemIcon from '@mui/material/ListItemIcon';
import ListItemText from '@mui/material/ListItemText';
import Toolbar from '@mui/material/Toolbar';
import { Link as RouterLink } from 'react-router-dom';
import { paths, type RouteName } from '../paths';
import { DRAWER_WIDTH, type NavItem } from './nav-items';

export function SideDrawer({ items, active }: { items: NavItem[]; active: RouteName | null }) {
  return (
    <Drawer
      variant="permanent"
      sx={{ width: DRAWER_WIDTH, flexShrink: 0, '& .MuiDrawer-paper': { width: DRAWER_WIDTH, boxSizing: 'border-box' } }}
    >
      <Toolbar />
      <List component="nav" aria-label="Main">
        {items.map(({ route, label, Icon }) => (
          <ListItemButton
            key={route}
            component={RouterLink}
            to={paths[route].href()}
            selected={active === route}
            aria-current={active === route ? 'page' : undefined}
          >
            <ListItemIcon>
              <Icon />
            </ListItemIcon>
            <ListItemText primary={label} />
          </ListItemButton>
        ))}
      </List>
    </Drawer>
  );
}
