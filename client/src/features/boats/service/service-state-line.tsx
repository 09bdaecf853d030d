import Box from '@mui/material/Box';
import SvgIcon from '@mui/material/SvgIcon';
import Typography from '@mui/material/Typography';
import type { ServiceState } from '@breakline/sync-protocol';
import { STATE_WORDS } from './service-words';

const stroke = { fill: 'none', stroke: 'currentColor', strokeWidth: 2, strokeLinecap: 'round', strokeLinejoin: 'round' } as const;

// Breakline's own service marks: a meter dial whose needle climbs; overdue adds a bar across.
const marks: Record<ServiceState, React.ReactNode> = {
  ok: (
    <>
      <path d="M4 17a8 8 0 1 1 16 0" {...stroke} />
      <path d="M12 17l-4-4" {...stroke} />
    </>
  ),
  'due-soon': (
    <>
      <path d="M4 17a8 8 0 1 1 16 0" {...stroke} />
      <path d="M12 17l4-4" {...stroke} strokeWidth={2.4} />
    </>
  ),
  overdue: (
    <>
      <path d="M4 17a8 8 0 1 1 16 0" {...stroke} />
      <path d="M12 17l6-2" {...stroke} strokeWidth={2.4} />
      <path d="M3 21h18" {...stroke} strokeWidth={3} />
    </>
  ),
};

const colour: Record<ServiceState, string> = { ok: 'text.primary', 'due-soon': 'warning.dark', overdue: 'error.main' };

/** A motor's service state: always the word and the mark, the colour only adds to them. */
export function ServiceStateLine({ status, component = 'div' }: { status: ServiceState; component?: 'div' | 'span' }) {
  return (
    <Box component={component} sx={{ display: 'flex', alignItems: 'center', gap: 0.75, color: colour[status] }}>
      <SvgIcon fontSize="small" data-service-icon={status} aria-hidden>{marks[status]}</SvgIcon>
      <Typography variant="body2" component="span" sx={{ fontWeight: 700 }}>{STATE_WORDS[status]}</Typography>
    </Box>
  );
}
