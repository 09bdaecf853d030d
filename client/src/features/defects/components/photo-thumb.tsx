import Box from '@mui/material/Box';
import Typography from '@mui/material/Typography';
import { useReplica } from '@/db/hooks';
import { usePhoto } from '@/sync/use-photo';

/** A photo by its hash: from this phone, or fetched from the club when another phone took it. */
export function PhotoThumb({ sha256, size = 96 }: { sha256: string; size?: number }) {
  const { db } = useReplica();
  const view = usePhoto(db, sha256);
  const frame = { width: size, height: size, borderRadius: 1, border: 1, borderColor: 'divider', objectFit: 'cover' } as const;
  if (view.status === 'shown') return <Box component="img" src={view.url} alt="Defect photo" sx={frame} />;
  return (
    <Box role="img" aria-label={view.detail} title={view.detail} sx={{ ...frame, display: 'grid', placeItems: 'center', p: 0.5 }}>
      <Typography variant="caption" sx={{ textAlign: 'center' }}>{view.text}</Typography>
    </Box>
  );
}
