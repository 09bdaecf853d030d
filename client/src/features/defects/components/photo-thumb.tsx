import { useEffect, useState } from 'react';
import Box from '@mui/material/Box';
import Typography from '@mui/material/Typography';
import { useLiveQuery } from 'dexie-react-hooks';
import { useReplica } from '@/db/hooks';
import { photoBlob } from '@/db/photos';

/** A photo by its hash, from this phone; one taken elsewhere shows as waiting until it is here. */
export function PhotoThumb({ sha256, size = 96 }: { sha256: string; size?: number }) {
  const { db } = useReplica();
  const row = useLiveQuery(() => db.photos.get(sha256), [db, sha256]);
  const [url, setUrl] = useState<string | null>(null);
  useEffect(() => {
    if (!row || typeof URL.createObjectURL !== 'function') return;
    const made = URL.createObjectURL(photoBlob(row));
    setUrl(made);
    return () => URL.revokeObjectURL(made);
  }, [row]);
  const frame = { width: size, height: size, borderRadius: 1, border: 1, borderColor: 'divider', objectFit: 'cover' } as const;
  if (url) return <Box component="img" src={url} alt="Defect photo" sx={frame} />;
  return (
    <Box sx={{ ...frame, display: 'grid', placeItems: 'center', p: 0.5 }}>
      <Typography variant="caption" sx={{ textAlign: 'center' }}>{row ? 'Photo' : 'Photo not on this phone yet'}</Typography>
    </Box>
  );
}
