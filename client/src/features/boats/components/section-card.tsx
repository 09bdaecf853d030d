import type { ReactNode } from 'react';
import Paper from '@mui/material/Paper';
import Typography from '@mui/material/Typography';

/** One titled part of a boat file. */
export function SectionCard({ title, children }: { title: string; children: ReactNode }) {
  return (
    <Paper component="section" aria-label={title} variant="outlined" sx={{ p: 2, display: 'grid', gap: 1 }}>
      <Typography variant="h6" component="h2" sx={{ fontWeight: 700 }}>
        {title}
      </Typography>
      {children}
    </Paper>
  );
}
