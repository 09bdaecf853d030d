import { useState } from 'react';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import FormControlLabel from '@mui/material/FormControlLabel';
import Link from '@mui/material/Link';
import MenuItem from '@mui/material/MenuItem';
import Paper from '@mui/material/Paper';
import Radio from '@mui/material/Radio';
import RadioGroup from '@mui/material/RadioGroup';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import type { ConflictRecord, ConflictSide } from '@breakline/sync-protocol';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '@/app/paths';
import { ProblemAlert } from '@/components/problem-alert';
import { useRecord } from '@/db/hooks';
import { useSettleConflict, type SettleChoice } from '../api/conflicts';
import { useValueContext } from '../hooks/use-value-context';
import { clubTime, deviceText, hlcTime } from '../model/format';
import { KIND_WORDS, recordTitle } from '../model/record-title';
import { draftOf, parseDraft, valueShape } from '../model/third-value';
import { fieldHeading, valueText, type ValueContext } from '../model/values';

type Choice = 'kept' | 'overruled' | 'other';

function Side(props: { title: string; hint: string; value: string; side: ConflictSide; ctx: ValueContext; deviceId?: string; selected: boolean }) {
  const { side, ctx } = props;
  return (
    <Paper
      variant="outlined"
      sx={{ p: 2, flex: 1, minWidth: 0, borderWidth: props.selected ? 2 : 1, borderColor: props.selected ? 'primary.main' : 'divider' }}
    >
      <Typography variant="overline" sx={{ lineHeight: 1.5 }}>{props.title}</Typography>
      <Typography variant="body2" color="text.secondary" gutterBottom>{props.hint}</Typography>
      <Typography sx={{ fontSize: '1.1rem', fontWeight: 500, whiteSpace: 'pre-wrap', overflowWrap: 'anywhere', my: 1 }}>{props.value}</Typography>
      <Typography variant="body2">Written by <b>{ctx.member(side.userId)}</b></Typography>
      <Typography variant="body2">{hlcTime(side.hlc, ctx.zone)}</Typography>
      <Typography variant="body2" color="text.secondary">on {deviceText(side.deviceId, props.deviceId)}</Typography>
    </Paper>
  );
}

/** One conflict: both devices' values side by side, and the supervisor's decision with a note. */
export function ConflictCard({ c, deviceId }: { c: ConflictRecord; deviceId?: string }) {
  const record = useRecord(c.kind, c.recordId);
  const fields = (record?.fields ?? {}) as Record<string, unknown>;
  const ctx = useValueContext(fields.templateId);
  const settle = useSettleConflict();
  const shape = valueShape(c.field, c.keptValue, c.overruledValue);
  const [pick, setPick] = useState<Choice | null>(null);
  const [draft, setDraft] = useState(() => draftOf(shape, c.keptValue));
  const [outcome, setOutcome] = useState<string>(() => String((c.keptValue as { outcome?: string } | null)?.outcome ?? ''));
  const [itemNote, setItemNote] = useState('');
  const [note, setNote] = useState('');
  const [problem, setProblem] = useState<string | null>(null);
  const heading = fieldHeading(c.kind, c.field, ctx);
  const title = record ? recordTitle(c.kind, fields, ctx) : `${KIND_WORDS[c.kind] ?? c.kind} (not on this computer yet)`;
  const settled = c.status === 'settled';

  function submit() {
    setProblem(null);
    if (!pick) return setProblem('Choose which value the record keeps.');
    if (!note.trim()) return setProblem('Write a note saying why, for the club\'s records.');
    let body: SettleChoice;
    if (pick === 'other') {
      const parsed = parseDraft(shape, draft, outcome, itemNote);
      if (!parsed.ok) return setProblem(parsed.message);
      body = { choice: 'other', value: parsed.value, note };
    } else body = { choice: pick, note };
    settle.mutate({ id: c.id, settle: body });
  }

  return (
    <Paper component="article" variant="outlined" sx={{ p: 2 }} aria-label={`Conflict: ${heading} of ${title}`}>
      <Typography variant="h6" component="h2">{heading}</Typography>
      <Typography color="text.secondary" gutterBottom>
        Record:{' '}
        <Link component={RouterLink} to={paths.deskRecord.href(c.kind, c.recordId)}>{title}</Link>
        {' '}· the conflict arose {clubTime(c.createdAt, ctx.zone)}
      </Typography>
      <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2} sx={{ my: 2 }}>
        <Side
          title="Value A: shown now" hint="The automatic rule chose this one for the screens until you decide."
          value={valueText(c.kind, c.field, c.keptValue, ctx)} side={c.kept} ctx={ctx} deviceId={deviceId} selected={pick === 'kept'}
        />
        <Side
          title="Value B: set aside" hint="Kept here so it is not lost."
          value={valueText(c.kind, c.field, c.overruledValue, ctx)} side={c.overruled} ctx={ctx} deviceId={deviceId} selected={pick === 'overruled'}
        />
      </Stack>
      {settled ? (
        <Box>
          <Typography>
            Settled by <b>{ctx.member(c.settledBy)}</b>, {clubTime(c.settledAt, ctx.zone)}: the record keeps{' '}
            <b>{valueText(c.kind, c.field, c.settledValue, ctx)}</b>.
          </Typography>
          {c.note && <Typography color="text.secondary">Note: {c.note}</Typography>}
        </Box>
      ) : (
        <Stack spacing={1.5}>
          <RadioGroup
            aria-label={`Which value ${heading.toLowerCase()} keeps`}
            value={pick ?? ''}
            onChange={(e) => setPick(e.target.value as Choice)}
          >
            <FormControlLabel value="kept" control={<Radio />} label="Keep value A" />
            <FormControlLabel value="overruled" control={<Radio />} label="Use value B instead" />
            <FormControlLabel value="other" control={<Radio />} label="Write another value" />
          </RadioGroup>
          {pick === 'other' && shape === 'yes-no' && (
            <TextField select label="New value" value={draft} onChange={(e) => setDraft(e.target.value)} sx={{ maxWidth: 240 }}>
              <MenuItem value="true">Yes</MenuItem>
              <MenuItem value="false">No</MenuItem>
            </TextField>
          )}
          {pick === 'other' && shape === 'item-result' && (
            <Stack direction={{ xs: 'column', sm: 'row' }} spacing={1.5}>
              <TextField select label="Outcome" value={outcome} onChange={(e) => setOutcome(e.target.value)} sx={{ minWidth: 200 }}>
                <MenuItem value="pass">Passed</MenuItem>
                <MenuItem value="fail">Failed</MenuItem>
                <MenuItem value="na">Not applicable</MenuItem>
              </TextField>
              <TextField label="Reading or count (if any)" value={draft} onChange={(e) => setDraft(e.target.value)} />
              <TextField label="Item note (if any)" value={itemNote} onChange={(e) => setItemNote(e.target.value)} sx={{ flex: 1 }} />
            </Stack>
          )}
          {pick === 'other' && (shape === 'text' || shape === 'number' || shape === 'json') && (
            <TextField
              label="New value" value={draft} onChange={(e) => setDraft(e.target.value)} multiline={shape !== 'number'} minRows={shape === 'json' ? 4 : 2}
              slotProps={{ htmlInput: shape === 'number' ? { inputMode: 'decimal' } : undefined }}
            />
          )}
          <TextField
            label="Note: why this value (kept with the decision)" value={note} onChange={(e) => setNote(e.target.value)} multiline minRows={2}
            slotProps={{ htmlInput: { maxLength: 2000 } }}
          />
          {problem && <Typography color="error" role="alert">{problem}</Typography>}
          {settle.error && <ProblemAlert title="The conflict was not settled" error={settle.error} onRetry={submit} />}
          <Box>
            <Button variant="contained" onClick={submit} disabled={settle.isPending}>
              {settle.isPending ? 'Settling…' : 'Settle this conflict'}
            </Button>
          </Box>
        </Stack>
      )}
    </Paper>
  );
}
