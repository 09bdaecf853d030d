import { useState } from 'react';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Link from '@mui/material/Link';
import CircularProgress from '@mui/material/CircularProgress';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import Typography from '@mui/material/Typography';
import ArrowBack from '@mui/icons-material/ArrowBack';
import { isRecordKind, type RecordKind } from '@breakline/sync-protocol';
import { Link as RouterLink, useNavigate } from 'react-router-dom';
import { paths } from '@/app/paths';
import { EmptyState } from '@/components/empty-state';
import { ProblemAlert } from '@/components/problem-alert';
import { useRecord, useReplica } from '@/db/hooks';
import type { LocalRecord } from '@/db/types';
import { isLocalWriteError } from '@/db/write-error';
import { useLiveQuery } from 'dexie-react-hooks';
import { useConflicts } from '../api/conflicts';
import { fieldsFromVersions, useRecordHistory, type RecordVersion } from '../api/history';
import { useValueContext } from '../hooks/use-value-context';
import { clubTimeExact, deviceText } from '../model/format';
import { KEY_FIELDS, KIND_WORDS, recordTitle, VERSION_STATUS_WORDS } from '../model/record-title';
import { signOffBlock, signOffCheck } from '../model/sign-off';
import { expandChanges, fieldHeading, valueText, type ValueContext } from '../model/values';

function useDeviceId(): string | undefined {
  const { db } = useReplica();
  return useLiveQuery(async () => {
    const row = await db.syncState.get('replica');
    return row && 'deviceId' in row ? row.deviceId : undefined;
  }, [db]);
}

const isEmpty = (v: unknown) => v === null || v === undefined || v === '' || (Array.isArray(v) && v.length === 0);

/** The fields worth reading first, then the rest; empty ones are left out of a list of what a record holds. */
export function fieldOrder(kind: RecordKind, fields: readonly string[]): string[] {
  const first = KEY_FIELDS[kind] ?? [];
  return [...first.filter((f) => fields.includes(f)), ...fields.filter((f) => !first.includes(f)).sort()];
}

/** Ids of other records become links to their pages on the desk. */
function LinkedValue({ kind, field, value, ctx }: { kind: RecordKind; field: string; value: unknown; ctx: ValueContext }) {
  const other = field === 'checkId' ? 'check' : field === 'tripId' ? 'trip' : null;
  if (other && typeof value === 'string') {
    return <Link component={RouterLink} to={paths.deskRecord.href(other, value)}>Open the {other === 'check' ? 'check' : 'trip'} it came from</Link>;
  }
  return <>{valueText(kind, field, value, ctx)}</>;
}

function FieldList({ kind, fields, ctx }: { kind: RecordKind; fields: Record<string, unknown>; ctx: ValueContext }) {
  const order = fieldOrder(kind, Object.keys(fields).filter((f) => !isEmpty(fields[f])));
  return (
    <Box component="dl" sx={{ display: 'grid', gridTemplateColumns: { xs: '1fr', sm: 'minmax(160px, 220px) 1fr' }, columnGap: 2, rowGap: 0.75, m: 0 }}>
      {order.map((f) => (
        <Box key={f} sx={{ display: 'contents' }}>
          <Typography component="dt" color="text.secondary">{fieldHeading(kind, f, ctx)}</Typography>
          <Typography component="dd" sx={{ m: 0, whiteSpace: 'pre-wrap', overflowWrap: 'anywhere' }}><LinkedValue kind={kind} field={f} value={fields[f]} ctx={ctx} /></Typography>
        </Box>
      ))}
    </Box>
  );
}

function VersionCard({ kind, v, ctx, deviceId }: { kind: RecordKind; v: RecordVersion; ctx: ValueContext; deviceId: string | undefined }) {
  // A record's first version lists what it was made with; empty starting values say nothing.
  const all = expandChanges(v.changes).filter((c) => v.version > 1 || !isEmpty(c.to));
  const order = fieldOrder(kind, all.map((c) => c.field));
  const changes = order.map((f) => all.find((c) => c.field === f)!);
  const how = VERSION_STATUS_WORDS[v.status] ?? v.status;
  return (
    <Paper variant="outlined" component="li" sx={{ p: 2, listStyle: 'none' }} aria-label={`Version ${v.version}`}>
      <Typography sx={{ fontWeight: 700 }}>
        Version {v.version}: {v.version === 1 ? 'created' : 'changed'} by {v.user.name}
      </Typography>
      <Typography color="text.secondary" variant="body2" gutterBottom>
        {clubTimeExact(v.at, ctx.zone)} · from {deviceText(v.deviceId, deviceId)}{how ? ` · ${how}` : ''}
      </Typography>
      {changes.length === 0 ? (
        <Typography variant="body2">No field changed (the record was only touched).</Typography>
      ) : (
        <Table size="small" aria-label={`What version ${v.version} changed`}>
          <TableHead>
            <TableRow>
              <TableCell sx={{ width: '26%' }}>What</TableCell>
              {v.version > 1 && <TableCell sx={{ width: '37%' }}>Before</TableCell>}
              <TableCell>{v.version > 1 ? 'After' : 'Value'}</TableCell>
            </TableRow>
          </TableHead>
          <TableBody>
            {changes.map((c) => (
              <TableRow key={c.field}>
                <TableCell>{fieldHeading(kind, c.field, ctx)}</TableCell>
                {v.version > 1 && <TableCell sx={{ color: 'text.secondary', overflowWrap: 'anywhere' }}>{valueText(kind, c.field, c.from, ctx)}</TableCell>}
                <TableCell sx={{ overflowWrap: 'anywhere' }}><LinkedValue kind={kind} field={c.field} value={c.to} ctx={ctx} /></TableCell>
              </TableRow>
            ))}
          </TableBody>
        </Table>
      )}
    </Paper>
  );
}

function CheckSignOff({ check }: { check: LocalRecord<'check'> | null | undefined }) {
  const ctx = useReplica();
  const [refusal, setRefusal] = useState<string | null>(null);
  if (check?.fields.signedOffAt) return null;
  const block = signOffBlock(check ?? undefined);
  return (
    <Stack spacing={1} sx={{ alignItems: 'flex-start' }}>
      <Button
        variant="contained" disabled={Boolean(block)}
        onClick={async () => {
          setRefusal(null);
          try {
            await signOffCheck(ctx, check ?? undefined);
          } catch (e) {
            if (!isLocalWriteError(e)) throw e;
            setRefusal(e.message);
          }
        }}
      >
        Sign off this check
      </Button>
      {block && <Typography variant="body2" color="text.secondary">{block}</Typography>}
      {refusal && <Alert severity="warning">{refusal}</Alert>}
    </Stack>
  );
}

/** A record's page on the desk: what it holds now and every version — who, when, which device, what changed. */
export function RecordView({ kind: kindParam, id }: { kind: string; id: string }) {
  if (!isRecordKind(kindParam)) {
    return <EmptyState title="Not a kind of record Breakline keeps">Go back to the Review desk and open the record from its table.</EmptyState>;
  }
  return <KnownRecord kind={kindParam} id={id} />;
}

function KnownRecord({ kind, id }: { kind: RecordKind; id: string }) {
  const navigate = useNavigate();
  const history = useRecordHistory(kind, id);
  const local = useRecord(kind, id);
  const versions = history.data ?? [];
  const fromServer = fieldsFromVersions(versions);
  const fields = (local?.fields ?? fromServer.fields) as Record<string, unknown>;
  // A defect raised from a check names the check's item: its label comes from that check's template.
  const sourceCheck = useRecord('check', kind === 'defect' && typeof fields.checkId === 'string' ? fields.checkId : undefined);
  const ctx = useValueContext(fields.templateId ?? sourceCheck?.fields.templateId);
  const deviceId = useDeviceId();
  const conflicts = useConflicts('open');
  const mine = (conflicts.data ?? []).filter((c) => c.recordId === id);
  const known = Boolean(local) || versions.length > 0;
  return (
    <Stack spacing={2}>
      <Box>
        <Button startIcon={<ArrowBack />} onClick={() => navigate(-1)}>Back</Button>
      </Box>
      <Box>
        <Typography variant="overline" color="text.secondary">{KIND_WORDS[kind] ?? kind}</Typography>
        <Typography variant="h5" component="h1" sx={{ fontWeight: 700 }}>
          {known ? recordTitle(kind, fields, ctx) : 'Record'}
        </Typography>
      </Box>
      {kind === 'incidentNote' && (
        <Alert severity="info">
          Incident notes can hold health information: read only what your role needs, and do not copy it elsewhere. These
          notes do not replace the report your governing body requires.
        </Alert>
      )}
      {mine.length > 0 && (
        <Alert severity="warning" action={<Button color="inherit" component={RouterLink} to={paths.deskConflicts.href()}>Settle</Button>}>
          {mine.length === 1 ? 'One field of this record has' : `${mine.length} fields of this record have`} two devices' values waiting to be settled.
        </Alert>
      )}
      {fromServer.deleted && !local && <Alert severity="info">This record was deleted. Its versions are kept for the club's records.</Alert>}
      {local && local.waiting > 0 && (
        <Alert severity="info">Changes made on this computer are waiting to sync; they show here already.</Alert>
      )}
      {history.error && <ProblemAlert title="The versions of this record could not be loaded" error={history.error} onRetry={() => void history.refetch()} />}
      {history.isPending && !local && <CircularProgress aria-label="Loading the record" />}
      {known && (
        <Paper variant="outlined" sx={{ p: 2 }}>
          <Typography variant="h6" component="h2" gutterBottom>Now</Typography>
          <FieldList kind={kind} fields={fields} ctx={ctx} />
        </Paper>
      )}
      {kind === 'check' && known && <CheckSignOff check={local as LocalRecord<'check'> | null | undefined} />}
      {kind === 'defect' && local && (
        <Box>
          <Button variant="outlined" component={RouterLink} to={paths.defectFile.href(id)}>
            Assign, record the repair or verify this defect
          </Button>
        </Box>
      )}
      {!history.isPending && !known && !history.error && (
        <EmptyState title="Nothing known about this record">It is not on the server or on this computer. It may belong to another club.</EmptyState>
      )}
      {versions.length > 0 && (
        <Box>
          <Typography variant="h6" component="h2" gutterBottom>Every version, newest first</Typography>
          <Stack component="ol" spacing={1.5} sx={{ p: 0, m: 0 }}>
            {[...versions].reverse().map((v) => <VersionCard key={v.version} kind={kind} v={v} ctx={ctx} deviceId={deviceId} />)}
          </Stack>
        </Box>
      )}
    </Stack>
  );
}
