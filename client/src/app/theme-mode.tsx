import { createContext, useContext, useMemo, useState, type ReactNode } from 'react';
import CssBaseline from '@mui/material/CssBaseline';
import { ThemeProvider } from '@mui/material/styles';
import { createAppTheme, type ThemeMode } from './theme';

export const THEME_STORAGE_KEY = 'breakline.theme';

function storedMode(): ThemeMode {
  try {
    return localStorage.getItem(THEME_STORAGE_KEY) === 'sunlight' ? 'sunlight' : 'standard';
  } catch {
    return 'standard';
  }
}

interface ThemeModeValue {
  mode: ThemeMode;
  setMode: (mode: ThemeMode) => void;
}

const ThemeModeContext = createContext<ThemeModeValue | null>(null);

export function ThemeModeProvider({ children }: { children: ReactNode }) {
  const [mode, setModeState] = useState<ThemeMode>(storedMode);
  const theme = useMemo(() => createAppTheme(mode), [mode]);
  const value = useMemo<ThemeModeValue>(
    () => ({
      mode,
      setMode: (next) => {
        setModeState(next);
        try {
          localStorage.setItem(THEME_STORAGE_KEY, next);
        } catch {
          // Not remembered, but still applied for this visit.
        }
      },
    }),
    [mode],
  );
  return (
    <ThemeModeContext.Provider value={value}>
      <ThemeProvider theme={theme}>
        <CssBaseline />
        {children}
      </ThemeProvider>
    </ThemeModeContext.Provider>
  );
}

export function useThemeMode(): ThemeModeValue {
  const value = useContext(ThemeModeContext);
  if (!value) throw new Error('useThemeMode needs a ThemeModeProvider above it.');
  return value;
}
