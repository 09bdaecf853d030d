import Box from '@mui/material/Box';
import Typography from '@mui/material/Typography';
import type { LocalRecord } from '@/db/types';
import type { PatrolContext } from '../hooks/use-patrol-context';
import { signOnVerdict } from '../model/sign-on-check';
import { ROLE_WORDS } from '../model/words';

/** Who is signed on for the session, with a word where their award needs attention. */
export function SignedOnList({ on, date, p }: { on: readonly LocalRecord<'signOn'>[]; date: string; p: PatrolContext }) {
  if (on.length === 0) return <Typography sx={{ color: 'text.secondary' }}>Nobody signed on today.</Typography>;
  return (
    <Box component="ul" aria-label="Signed on today" sx={{ m: 0, pl: 0, listStyle: 'none', display: 'grid', gap: 0.5 }}>
      {on.map((s) => {
        const name = p.nameOf(s.fields.memberId);
        const v = signOnVerdict(p.cards.get(s.fields.memberId), name, s.fields.role, date, 'warn');
        const note = v.level === 'lapsing' ? 'award lapsing' : v.level === 'warn' ? 'no current award' : null;
        return (
          <Typography component="li" key={s.id}>
            <Box component="span" sx={{ fontWeight: 700 }}>{ROLE_WORDS[s.fields.role]}</Box>: {name === 'you' ? 'You' : name}
            {note && <Box component="span" sx={{ color: v.level === 'warn' ? 'error.main' : '#7A5200', fontWeight: 700 }}> · {note}</Box>}
          </Typography>
        );
      })}
    </Box>
  );
}
