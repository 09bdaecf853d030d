import Box from '@mui/material/Box';
import LinearProgress from '@mui/material/LinearProgress';
import Typography from '@mui/material/Typography';

/** Where the person is in the check: the screen number and how much is answered. */
export function RunnerProgress({ index, total, answered, items }: { index: number; total: number; answered: number; items: number }) {
  const onReview = index >= total;
  return (
    <Box sx={{ display: 'grid', gap: 0.5 }}>
      <Typography sx={{ fontWeight: 700 }}>{onReview ? 'Review and finish' : `${index + 1} of ${total}`}</Typography>
      <LinearProgress variant="determinate" value={items ? (answered / items) * 100 : 0} aria-label={`${answered} of ${items} items answered`} sx={{ height: 8, borderRadius: 4 }} />
    </Box>
  );
}
