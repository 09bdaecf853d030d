import { createTheme, type Theme } from '@mui/material/styles';
import { standardColours, sunlightColours } from './palette';

export type ThemeMode = 'standard' | 'sunlight';

/** Smallest touch target, in px: usable with wet fingers and one hand. */
export const TOUCH_TARGET = 48;

export function createAppTheme(mode: ThemeMode): Theme {
  const c = mode === 'sunlight' ? sunlightColours : standardColours;
  const sunlight = mode === 'sunlight';
  return createTheme({
    palette: {
      mode: 'light',
      primary: { main: c.teal, contrastText: c.onDark },
      secondary: { main: c.navy, contrastText: c.onDark },
      error: { main: c.coral, contrastText: c.onDark },
      info: { main: c.ocean, contrastText: c.onDark },
      background: { default: c.sand, paper: c.shell },
      text: { primary: c.ink, secondary: c.driftwood },
      divider: sunlight ? '#000000' : 'rgba(27, 38, 49, 0.16)',
    },
    shape: { borderRadius: 10 },
    typography: {
      fontFamily: 'Roboto, system-ui, sans-serif',
      // Glare washes out thin, small type: larger and heavier in sunlight.
      fontSize: sunlight ? 16 : 15,
      fontWeightRegular: sunlight ? 500 : 400,
      button: { textTransform: 'none', fontWeight: 700 },
    },
    components: {
      MuiAppBar: { defaultProps: { elevation: 0 }, styleOverrides: { root: { backgroundColor: c.navy, color: c.onDark } } },
      MuiButton: { styleOverrides: { root: { minHeight: TOUCH_TARGET } } },
      MuiIconButton: { styleOverrides: { root: { minWidth: TOUCH_TARGET, minHeight: TOUCH_TARGET } } },
      MuiListItemButton: { styleOverrides: { root: { minHeight: TOUCH_TARGET } } },
      MuiMenuItem: { styleOverrides: { root: { minHeight: TOUCH_TARGET } } },
      MuiBottomNavigation: { styleOverrides: { root: { height: 64 } } },
      MuiBottomNavigationAction: {
        styleOverrides: {
          root: { minWidth: 0, minHeight: TOUCH_TARGET, color: c.driftwood, '&.Mui-selected': { color: c.teal } },
          label: { fontSize: '0.8rem', '&.Mui-selected': { fontSize: '0.8rem', fontWeight: 700 } },
        },
      },
      MuiOutlinedInput: sunlight
        ? { styleOverrides: { notchedOutline: { borderColor: '#000000', borderWidth: 2 } } }
        : {},
      MuiSwitch: { styleOverrides: { root: { minHeight: TOUCH_TARGET } } },
    },
  });
}
