import Button from '@mui/material/Button';
import Alert from '@mui/material/Alert';
import { utcToLocal } from '@breakline/sync-protocol';
import { useNavigate } from 'react-router-dom';
import { paths } from '@/app/paths';
import { useReplica } from '@/db/hooks';
import type { LocalRecord } from '@/db/types';
import { useLocalSave } from '@/lib/use-local-save';
import { startCheck } from '../model/writes';
import { CHECK_NAMES } from './check-names';

interface Props {
  boat: LocalRecord<'boat'>;
  motorId: string | null;
  template: LocalRecord<'checkTemplate'>;
  resumable: LocalRecord<'check'> | undefined;
  zone: string;
}

/** Carry on with today's unfinished check of the boat, or start one from the club's template. */
export function StartPanel({ boat, motorId, template, resumable, zone }: Props) {
  const ctx = useReplica();
  const navigate = useNavigate();
  const { refusal, saving, run } = useLocalSave();
  const name = CHECK_NAMES[template.fields.checkType];
  if (resumable) {
    return (
      <Button variant="contained" size="large" sx={{ minHeight: 56 }} onClick={() => navigate(paths.checkRun.href(resumable.id))}>
        Carry on with the {name.toLowerCase()} begun at {utcToLocal(resumable.fields.startedAt, zone).time}
      </Button>
    );
  }
  const start = () =>
    run(async () => {
      const id = await startCheck(ctx, boat.id, motorId, template);
      navigate(paths.checkRun.href(id, 1));
    });
  return (
    <>
      <Button variant="contained" size="large" sx={{ minHeight: 56 }} disabled={saving} onClick={start}>
        Start {name.toLowerCase()} on {boat.fields.name}
      </Button>
      {refusal && <Alert severity="error">{refusal}</Alert>}
    </>
  );
}
