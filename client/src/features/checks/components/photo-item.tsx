import { useRef, useState } from 'react';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Typography from '@mui/material/Typography';
import { useReplica } from '@/db/hooks';
import { savePhoto } from '@/db/photos';
import { preparePhoto } from '@/lib/photo';
import type { ItemProps } from './item-props';

/** A photo the template asks for; kept on the phone and sent with the check when there is signal. */
export function PhotoItem({ entry, readOnly, save }: ItemProps) {
  const { db, clubId } = useReplica();
  const input = useRef<HTMLInputElement>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const photos = entry?.photos ?? [];
  async function take(file: File | undefined) {
    if (!file) return;
    try {
      const photo = await preparePhoto(file);
      const sha = await savePhoto(db, clubId, photo.bytes, photo.type);
      setProblem(null);
      await save({ outcome: 'pass', photos: [...photos.filter((p) => p !== sha), sha] });
    } catch (e) {
      setProblem((e as Error).message);
    }
  }
  return (
    <Box sx={{ display: 'grid', gap: 1 }}>
      <input ref={input} hidden type="file" accept="image/*" capture="environment" aria-label="Photo" onChange={(e) => void take(e.target.files?.[0])} />
      <Button variant="contained" size="large" disabled={readOnly} onClick={() => input.current?.click()}>
        {photos.length ? 'Take another photo' : 'Take a photo'}
      </Button>
      {photos.length > 0 && <Typography>{photos.length === 1 ? '1 photo saved' : `${photos.length} photos saved`}</Typography>}
      <Button variant={entry?.outcome === 'na' ? 'contained' : 'outlined'} color="inherit" aria-pressed={entry?.outcome === 'na'} disabled={readOnly} onClick={() => save({ outcome: 'na' })}>N/A</Button>
      {problem && <Typography sx={{ color: 'error.main' }}>{problem}</Typography>}
    </Box>
  );
}
