import { useRef, useState } from 'react';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Typography from '@mui/material/Typography';
import { useReplica } from '@/db/hooks';
import { savePhoto } from '@/db/photos';
import { preparePhoto } from '@/lib/photo';
import { PhotoThumb } from './photo-thumb';

/** Takes a photo, downscales it on the phone and keeps it by its hash; `onAdd` gets the hash. */
export function usePhotoTaker(onAdd: (sha256: string) => void) {
  const { db, clubId } = useReplica();
  const input = useRef<HTMLInputElement>(null);
  const [problem, setProblem] = useState<string | null>(null);
  async function take(file: File | undefined) {
    if (!file) return;
    try {
      const photo = await preparePhoto(file);
      onAdd(await savePhoto(db, clubId, photo.bytes, photo.type));
      setProblem(null);
    } catch (e) {
      setProblem((e as Error).message);
    }
  }
  const field = <input ref={input} hidden type="file" accept="image/*" capture="environment" aria-label="Photo" onChange={(e) => void take(e.target.files?.[0])} />;
  return { field, open: () => input.current?.click(), problem };
}

export function PhotoPicker({ photos, onChange }: { photos: string[]; onChange: (photos: string[]) => void }) {
  const taker = usePhotoTaker((sha) => onChange([...photos.filter((p) => p !== sha), sha]));
  return (
    <Box sx={{ display: 'grid', gap: 1 }}>
      {taker.field}
      <Button variant="outlined" size="large" onClick={taker.open}>{photos.length ? 'Add another photo' : 'Add a photo'}</Button>
      {photos.length > 0 && (
        <Box sx={{ display: 'flex', gap: 1, flexWrap: 'wrap' }}>
          {photos.map((sha) => <PhotoThumb key={sha} sha256={sha} />)}
        </Box>
      )}
      {taker.problem && <Typography sx={{ color: 'error.main' }}>{taker.problem}</Typography>}
    </Box>
  );
}
