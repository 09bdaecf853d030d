import type { ReactNode } from 'react';
import SvgIcon, { type SvgIconProps } from '@mui/material/SvgIcon';
import type { BoatState } from '@breakline/sync-protocol';

// Breakline's own state marks, drawn as strokes so they read on a cracked, wet screen.
const stroke = { fill: 'none', stroke: 'currentColor', strokeWidth: 2, strokeLinecap: 'round', strokeLinejoin: 'round' } as const;

const marks: Record<BoatState, ReactNode> = {
  unchecked: <circle cx="12" cy="12" r="9" {...stroke} strokeDasharray="3.2 2.9" />,
  fit: (
    <>
      <circle cx="12" cy="12" r="9" {...stroke} />
      <path d="M7.6 12.4l3 3 5.8-6.4" {...stroke} strokeWidth={2.4} />
    </>
  ),
  limited: (
    <>
      <circle cx="12" cy="12" r="9" {...stroke} strokeWidth={1.2} />
      <path d="M12 3a9 9 0 0 0 0 18z" fill="currentColor" />
    </>
  ),
  'stood-down': (
    <>
      <circle cx="12" cy="12" r="9" {...stroke} strokeWidth={2.2} />
      <path d="M6.5 12h11" {...stroke} strokeWidth={3.4} />
    </>
  ),
  afloat: (
    <>
      <path d="M2.5 10c2.4 0 2.4-2 4.8-2s2.4 2 4.7 2 2.4-2 4.7-2 2.4 2 4.8 2" {...stroke} />
      <path d="M2.5 15.5c2.4 0 2.4-2 4.8-2s2.4 2 4.7 2 2.4-2 4.7-2 2.4 2 4.8 2" {...stroke} />
    </>
  ),
  stowed: (
    <>
      <circle cx="12" cy="4.8" r="1.9" {...stroke} />
      <path d="M12 6.7V20.5M8.2 10h7.6M4.8 13.8a7.2 7.2 0 0 0 14.4 0" {...stroke} />
    </>
  ),
};

/** The mark of a boat state; always shown beside the state's word, never alone. */
export function StateIcon({ state, ...props }: { state: BoatState } & SvgIconProps) {
  return (
    <SvgIcon aria-hidden {...props} viewBox="0 0 24 24" data-state-icon={state}>
      {marks[state]}
    </SvgIcon>
  );
}
