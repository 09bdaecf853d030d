import Box from '@mui/material/Box';
import Button from '@mui/material/Button';

/** Up, Down and Remove for one entry of a list, each a full-size target with its own name. */
export function MoveButtons(props: { what: string; index: number; count: number; onMove: (by: -1 | 1) => void; onRemove: () => void }) {
  const { what, index, count } = props;
  const sx = { minWidth: 0, minHeight: 48, px: 1.5 };
  return (
    <Box sx={{ display: 'flex', gap: 0.5, flexWrap: 'wrap' }}>
      <Button variant="outlined" size="small" sx={sx} disabled={index === 0} aria-label={`Move ${what} up`} onClick={() => props.onMove(-1)}>Up</Button>
      <Button variant="outlined" size="small" sx={sx} disabled={index === count - 1} aria-label={`Move ${what} down`} onClick={() => props.onMove(1)}>Down</Button>
      <Button variant="outlined" size="small" color="error" sx={sx} aria-label={`Remove ${what}`} onClick={props.onRemove}>Remove</Button>
    </Box>
  );
}
