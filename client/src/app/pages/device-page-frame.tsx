import type { ReactNode } from 'react';
import Box from '@mui/material/Box';
import Paper from '@mui/material/Paper';
import Typography from '@mui/material/Typography';

/** The frame of the screens outside the app shell (sign-in, Switch member): the product and one card. */
export function DevicePageFrame({ title, children }: { title: string; children: ReactNode }) {
  return (
    <Box sx={{ minHeight: '100dvh', display: 'grid', placeItems: 'center', p: 2 }}>
      <Paper component="main" sx={{ p: { xs: 2.5, sm: 4 }, width: '100%', maxWidth: 480 }}>
        <Box sx={{ display: 'flex', alignItems: 'center', gap: 1.5, mb: 2 }}>
          <Box component="img" src="/icon.svg" alt="" sx={{ width: 40, height: 40, borderRadius: 1.5 }} />
          <Typography variant="h4" component="h1" sx={{ fontWeight: 700 }}>
            {title}
          </Typography>
        </Box>
        {children}
      </Paper>
    </Box>
  );
}
