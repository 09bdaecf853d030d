import Box from '@mui/material/Box';
import ListItemButton from '@mui/material/ListItemButton';
import Typography from '@mui/material/Typography';
import { utcToLocal } from '@breakline/sync-protocol';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '@/app/paths';
import type { LocalRecord } from '@/db/types';
import { STATUS_WORDS } from '../model/words';
import { SeverityLabel } from './severity-label';

/** One defect in a list: how serious, which boat, what, where it is on its path. */
export function DefectRow({ defect, boatName, zone }: { defect: LocalRecord<'defect'>; boatName: string | undefined; zone: string }) {
  const d = defect.fields;
  const line = d.description.split('\n')[0];
  return (
    <ListItemButton component={RouterLink} to={paths.defectFile.href(defect.id)} sx={{ display: 'grid', gap: 0.25, py: 1.25 }}>
      <Box sx={{ display: 'flex', gap: 1, alignItems: 'center', flexWrap: 'wrap' }}>
        <SeverityLabel severity={d.severity} />
        <Typography variant="body2" sx={{ color: 'text.secondary' }}>{boatName ?? 'A boat not on this phone'}</Typography>
      </Box>
      <Typography>{line}</Typography>
      <Typography variant="body2" sx={{ color: 'text.secondary' }}>
        {STATUS_WORDS[d.status]} · reported {utcToLocal(d.reportedAt, zone).date}
        {d.photos.length ? ` · ${d.photos.length === 1 ? '1 photo' : `${d.photos.length} photos`}` : ''}
        {defect.waiting ? ' · waiting to sync' : ''}
      </Typography>
    </ListItemButton>
  );
}
