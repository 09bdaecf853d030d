import type { ReactElement } from 'react';
import SvgIcon, { type SvgIconProps } from '@mui/material/SvgIcon';
import type { DefectSeverity } from '@breakline/sync-protocol';

const ring = { fill: 'none', stroke: 'currentColor', strokeWidth: 2 } as const;

// Our own marks: the bar of a stood-down boat, the half of a limited one, a dot for a note.
const marks: Record<DefectSeverity, ReactElement> = {
  'stand-down': (<><circle cx="12" cy="12" r="9" {...ring} /><path d="M6.5 12h11" stroke="currentColor" strokeWidth={3.4} strokeLinecap="round" /></>),
  limit: (<><circle cx="12" cy="12" r="9" {...ring} strokeWidth={1.2} /><path d="M12 3a9 9 0 0 0 0 18z" fill="currentColor" /></>),
  note: (<><circle cx="12" cy="12" r="9" {...ring} /><circle cx="12" cy="12" r="2.6" fill="currentColor" /></>),
};

export function SeverityIcon({ severity, ...props }: { severity: DefectSeverity } & SvgIconProps) {
  return (
    <SvgIcon aria-hidden viewBox="0 0 24 24" {...props}>
      {marks[severity]}
    </SvgIcon>
  );
}
