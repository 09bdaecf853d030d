import type { ReactNode } from 'react';
import Chip from '@mui/material/Chip';
import Link from '@mui/material/Link';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import BlockOutlined from '@mui/icons-material/BlockOutlined';
import CheckCircleOutline from '@mui/icons-material/CheckCircleOutlined';
import InfoOutlined from '@mui/icons-material/InfoOutlined';
import PendingOutlined from '@mui/icons-material/PendingOutlined';
import RemoveCircleOutline from '@mui/icons-material/RemoveCircleOutlined';
import TaskAltOutlined from '@mui/icons-material/TaskAltOutlined';
import WavesOutlined from '@mui/icons-material/WavesOutlined';
import type { GridColDef } from '@mui/x-data-grid';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '@/app/paths';
import type { DeskRow } from '../api/desk-list';
import { CHECK_TYPE_WORDS, clockTime, DEFECT_STATUS_WORDS, duration, INCIDENT_WORDS, PURPOSE_WORDS, sameClubDay, tableTime } from '../model/format';
import { TAB_KIND, type DeskTab } from '../model/desk-query';
import type { Names } from '../hooks/use-names';

export interface ColumnContext {
  names: Names;
  zone: string;
  /** The sign-off button of a check row, or null where there is none. */
  signOff?: (row: DeskRow) => ReactNode;
}

type Col = GridColDef<DeskRow>;

const text = (v: unknown) => (typeof v === 'string' ? v : '');

/** The record's time, as the link that opens its page with every version (the whole row opens it too). */
function openingTime(tab: DeskTab, field: string, headerName: string, ctx: ColumnContext): Col {
  return {
    field, headerName, width: 150,
    renderCell: ({ row }) => (
      <Link
        component={RouterLink} to={paths.deskRecord.href(TAB_KIND[tab], row.id)} underline="always"
        aria-label={`Open the record of ${tableTime(row[field], ctx.zone)}, with every version`}
        onClick={(e) => e.stopPropagation()}
      >
        {tableTime(row[field], ctx.zone)}
      </Link>
    ),
  };
}

/** The server sends each person's name beside the id (performedBy → performedByName); the desk's own names fill gaps. */
export const nameKey = (field: string) => `${field.replace(/Id$/, '')}Name`;

function personName(row: DeskRow, field: string, ctx: ColumnContext): string {
  const sent = row[nameKey(field)];
  if (!row[field]) return '—';
  return typeof sent === 'string' && sent !== '' ? sent : ctx.names.member(row[field]);
}

function personCol(field: string, headerName: string, ctx: ColumnContext, width = 150): Col {
  return { field, headerName, width, valueGetter: (_v, row) => personName(row, field, ctx) };
}

/** The server sends the boat's fleet number and name with each row; this computer's fleet fills gaps. */
function boatName(row: DeskRow, ctx: ColumnContext): string {
  if (!row.boatId) return '—';
  if (typeof row.boatName === 'string') return [row.boatFleetNumber, row.boatName].filter((p) => typeof p === 'string' && p).join(' ');
  return ctx.names.boat(row.boatId);
}

const boatCol = (ctx: ColumnContext): Col => ({ field: 'boatId', headerName: 'Boat', width: 135, valueGetter: (_v, row) => boatName(row, ctx) });

/** A state is a word and an icon, never a colour alone. */
function stateChip(label: string, icon: ReactNode, color: 'default' | 'primary' | 'error' | 'warning' | 'info' | 'success' = 'default') {
  return <Chip size="small" variant="outlined" icon={icon as React.ReactElement} label={label} color={color} />;
}

function checkState(row: DeskRow, ctx: ColumnContext): ReactNode {
  if (row.signedOffAt) {
    const by = row.waiting ? ctx.names.member(row.signedOffBy) : personName(row, 'signedOffBy', ctx);
    return stateChip(`Signed off by ${by}${row.waiting ? ' (waiting to sync)' : ''}`, <TaskAltOutlined />, 'primary');
  }
  if (row.status === 'complete') return stateChip('Complete, to sign off', <CheckCircleOutline />, 'info');
  return stateChip('In progress', <PendingOutlined />);
}

export function failedItems(row: DeskRow): number {
  if (typeof row.failedItems === 'number') return row.failedItems;
  const results = row.results;
  if (typeof results !== 'object' || results === null) return 0;
  return Object.values(results as Record<string, { outcome?: string }>).filter((r) => r?.outcome === 'fail').length;
}

const SEVERITY: Record<string, { word: string; icon: ReactNode; color: 'error' | 'warning' | 'default' }> = {
  'stand-down': { word: 'Stand-down', icon: <BlockOutlined />, color: 'error' },
  limit: { word: 'Limit', icon: <RemoveCircleOutline />, color: 'warning' },
  note: { word: 'Note', icon: <InfoOutlined />, color: 'default' },
};

export function deskColumns(tab: DeskTab, ctx: ColumnContext): Col[] {
  switch (tab) {
    case 'checks':
      return [
        openingTime(tab, 'startedAt', 'Started', ctx),
        boatCol(ctx),
        { field: 'checkType', headerName: 'Check', width: 115, valueFormatter: (v) => CHECK_TYPE_WORDS[text(v)] ?? text(v) },
        personCol('performedBy', 'Done by', ctx),
        {
          field: 'failedItems', headerName: 'Failed items', width: 115,
          renderCell: ({ row }) => {
            const n = failedItems(row);
            return n > 0
              ? <Typography component="span" sx={{ color: 'error.main', fontWeight: 700, fontSize: 'inherit' }}>{n} failed</Typography>
              : 'none';
          },
        },
        {
          field: 'status', headerName: 'State', minWidth: 300, flex: 1,
          renderCell: ({ row }) => (
            <Stack direction="row" spacing={1} sx={{ alignItems: 'center', height: '100%' }}>
              {checkState(row, ctx)}
              {ctx.signOff?.(row)}
            </Stack>
          ),
        },
      ];
    case 'trips':
      return [
        openingTime(tab, 'launchedAt', 'Launched', ctx),
        {
          field: 'retrievedAt', headerName: 'Retrieved', width: 120,
          renderCell: ({ row }) => (!row.retrievedAt
            ? stateChip('On the water', <WavesOutlined />, 'info')
            : sameClubDay(row.launchedAt, row.retrievedAt, ctx.zone) ? clockTime(row.retrievedAt, ctx.zone) : tableTime(row.retrievedAt, ctx.zone)),
        },
        boatCol(ctx),
        { field: 'purpose', headerName: 'Purpose', width: 140, valueFormatter: (v) => PURPOSE_WORDS[text(v)] ?? text(v) },
        personCol('driverId', 'Driver', ctx),
        {
          field: 'crewIds', headerName: 'Crew', minWidth: 150, flex: 1, sortable: false,
          valueGetter: (_v, row) => (Array.isArray(row.crewIds)
            ? row.crewIds.map((id, i) => (Array.isArray(row.crewNames) && typeof row.crewNames[i] === 'string' ? row.crewNames[i] : ctx.names.member(id))).join(', ')
            : ''),
        },
        {
          field: 'durationMinutes', headerName: 'On the water', width: 120,
          valueGetter: (_v, row) => duration(row.launchedAt, row.retrievedAt) ?? '—',
        },
      ];
    case 'defects':
      return [
        openingTime(tab, 'reportedAt', 'Reported', ctx),
        boatCol(ctx),
        {
          field: 'severity', headerName: 'Severity', width: 135,
          renderCell: ({ row }) => {
            const s = SEVERITY[text(row.severity)];
            return s ? stateChip(s.word, s.icon, s.color) : text(row.severity);
          },
        },
        { field: 'description', headerName: 'What is wrong', minWidth: 200, flex: 1, sortable: false },
        { field: 'status', headerName: 'Status', width: 180, valueFormatter: (v) => DEFECT_STATUS_WORDS[text(v)] ?? text(v) },
        personCol('reportedBy', 'Reported by', ctx, 140),
        personCol('assignedTo', 'Assigned to', ctx, 140),
      ];
    case 'incidentNotes':
      // What happened to whom stays on the note's own page: the table shows no health details.
      return [
        openingTime(tab, 'occurredAt', 'When', ctx),
        { field: 'kind', headerName: 'What happened', width: 170, valueFormatter: (v) => INCIDENT_WORDS[text(v)] ?? text(v) },
        boatCol(ctx),
        { field: 'peopleHelped', headerName: 'People helped', width: 130, type: 'number' },
        { ...personCol('authorId', 'Written by', ctx), flex: 1, minWidth: 150 },
      ];
  }
}
