import type { ComponentType, ReactNode } from 'react';
import Alert from '@mui/material/Alert';
import Paper from '@mui/material/Paper';
import Typography from '@mui/material/Typography';
import type { CheckItemKind } from './item-kind';
import { useAnswer } from '../hooks/use-answer';
import { CountItem } from './count-item';
import type { ItemProps } from './item-props';
import { PassFailItem } from './pass-fail-item';
import { PhotoItem } from './photo-item';
import { ReadingItem } from './reading-item';
import { TextItem } from './text-item';

const BY_KIND: Record<CheckItemKind, ComponentType<ItemProps>> = {
  'pass-fail': PassFailItem,
  count: CountItem,
  reading: ReadingItem,
  text: TextItem,
  photo: PhotoItem,
};

type Props = Omit<ItemProps, 'save'> & { checkId: string; onFailed?: ReactNode };

/** One check item: what to look at, how to answer, and (when failed) the way to report it. */
export function ItemCard({ checkId, onFailed, ...props }: Props) {
  const { save, error } = useAnswer(checkId, props.item.id);
  const Answer = BY_KIND[props.item.kind];
  const failed = props.entry?.outcome === 'fail';
  return (
    <Paper component="section" aria-label={props.item.label} variant="outlined" sx={{ p: 2, display: 'grid', gap: 1.5, borderColor: failed ? 'error.main' : undefined, borderWidth: failed ? 2 : 1 }}>
      <Typography sx={{ fontWeight: 700, fontSize: '1.1rem' }}>{props.item.label}</Typography>
      {props.item.critical && <Typography variant="body2" sx={{ color: 'text.secondary' }}>Critical: a failure stands the boat down.</Typography>}
      <Answer {...props} save={save} />
      {error && <Alert severity="error">{error}</Alert>}
      {failed && onFailed}
    </Paper>
  );
}
