// Breakline's own sand-and-ocean colours. Each text/background pair is checked for contrast
// in palette.test.ts; the sunlight set is for glare on the beach.
export const standardColours = {
  navy: '#0E2A47', // app bar
  sand: '#F4EBDD', // page background
  shell: '#FFFBF4', // cards and sheets
  teal: '#0B6E6A', // primary actions
  coral: '#B93A2B', // stand-down, errors
  ocean: '#1F6FB2', // afloat
  ink: '#1B2631', // body text
  driftwood: '#4F5863', // secondary text
  onDark: '#FFFFFF',
} as const;

export const sunlightColours = {
  navy: '#000000',
  sand: '#FFFFFF',
  shell: '#FFFFFF',
  teal: '#004D4A',
  coral: '#9E2A1C',
  ocean: '#0B4A80',
  ink: '#000000',
  driftwood: '#1B1B1B',
  onDark: '#FFFFFF',
} as const;

export type Colours = { [K in keyof typeof standardColours]: string };
