import Box from '@mui/material/Box';
import Button from '@mui/material/Button';

/** Back and Next, at the thumb, the width of the screen. */
export function RunnerNav({ index, total, go }: { index: number; total: number; go: (index: number) => void }) {
  return (
    <Box sx={{ display: 'grid', gridTemplateColumns: '1fr 1.4fr', gap: 1 }}>
      <Button variant="outlined" size="large" disabled={index === 0} onClick={() => go(index - 1)} sx={{ minHeight: 56 }}>
        Back
      </Button>
      {index < total && (
        <Button variant="contained" size="large" onClick={() => go(index + 1)} sx={{ minHeight: 56 }}>
          {index === total - 1 ? 'Review' : 'Next'}
        </Button>
      )}
    </Box>
  );
}
