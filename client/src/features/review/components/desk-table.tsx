import { useMemo, useState } from 'react';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import FileDownloadOutlined from '@mui/icons-material/FileDownloadOutlined';
import { DataGrid, type GridSortModel } from '@mui/x-data-grid';
import { useNavigate, useSearchParams } from 'react-router-dom';
import { paths } from '@/app/paths';
import { ProblemAlert } from '@/components/problem-alert';
import { useReplica } from '@/db/hooks';
import type { LocalRecord } from '@/db/types';
import { isLocalWriteError } from '@/db/write-error';
import { useSession } from '@/features/auth/use-auth';
import { useCsvExport } from '../api/csv';
import { useDeskList, type DeskRow } from '../api/desk-list';
import { useLocalCopies } from '../hooks/use-local-copies';
import { useNames } from '../hooks/use-names';
import {
  dateRangeProblem, deskSearch, hasFilters, PAGE_SIZES, parseDeskQuery, TAB_KIND, TAB_LABELS, tabsFor, withFilters,
  type DeskQuery,
} from '../model/desk-query';
import { signOffBlock, signOffCheck } from '../model/sign-off';
import { deskColumns } from './columns';
import { DeskFiltersBar } from './desk-filters';

/** A check as this computer shows it: a sign-off made here is on screen before the server has it. */
function overlay(row: DeskRow, local: LocalRecord<'check'> | undefined): DeskRow {
  if (!local || local.waiting === 0) return row;
  const f = local.fields;
  return { ...row, status: f.status, signedOffBy: f.signedOffBy, signedOffAt: f.signedOffAt, waiting: local.waiting };
}

/** One of the desk's four tables, paged, sorted and filtered by the server. */
export function DeskTable() {
  const { activeClub } = useSession();
  const [search, setSearch] = useSearchParams();
  const navigate = useNavigate();
  const q = parseDeskQuery(search, tabsFor(activeClub.role));
  const set = (next: DeskQuery) => setSearch(deskSearch(next), { replace: true });
  const rangeProblem = dateRangeProblem(q);
  const list = useDeskList(q, !rangeProblem);
  const names = useNames();
  const ctx = useReplica();
  const csv = useCsvExport();
  const [refusal, setRefusal] = useState<string | null>(null);
  const serverRows = list.data?.rows ?? [];
  const locals = useLocalCopies('check', q.tab === 'checks' ? serverRows.map((r) => r.id) : []);
  const rows = q.tab === 'checks' ? serverRows.map((r) => overlay(r, locals?.get(r.id))) : serverRows;

  const columns = useMemo(() => deskColumns(q.tab, {
    names, zone: activeClub.timeZone,
    signOff: q.tab === 'checks'
      ? (row) => {
          if (row.signedOffAt || row.status !== 'complete') return null;
          const local = locals?.get(row.id);
          return (
            <Button
              size="small" variant="outlined" sx={{ minHeight: 32 }}
              title={signOffBlock(local) ?? 'Sign off this check with your name and the time'}
              onClick={async (e) => {
                e.stopPropagation();
                setRefusal(null);
                try {
                  await signOffCheck(ctx, local);
                } catch (error) {
                  if (!isLocalWriteError(error)) throw error;
                  setRefusal(error.message);
                }
              }}
            >
              Sign off
            </Button>
          );
        }
      : undefined,
  }), [q.tab, names, activeClub.timeZone, locals, ctx]);

  const sortModel: GridSortModel = q.sort ? [{ field: q.sort, sort: q.dir ?? 'desc' }] : [];
  const label = TAB_LABELS[q.tab];
  return (
    <Box>
      <DeskFiltersBar tab={q.tab} filters={q} names={names} onChange={(change) => set(withFilters(q, change))} />
      <Stack direction="row" spacing={2} sx={{ alignItems: 'center', mb: 1 }}>
        <Typography aria-live="polite" sx={{ flexGrow: 1 }} color="text.secondary">
          {list.data ? `${list.data.total} ${label.toLowerCase()}${hasFilters(q) ? ' match the filters' : ' in all'}` : ' '}
        </Typography>
        <Button
          variant="outlined" startIcon={<FileDownloadOutlined />} disabled={csv.isPending || Boolean(rangeProblem)}
          onClick={() => csv.mutate(q)}
        >
          {csv.isPending ? 'Preparing CSV…' : `Export ${label.toLowerCase()} as CSV`}
        </Button>
      </Stack>
      {csv.error && <Box sx={{ mb: 1 }}><ProblemAlert title="The CSV file could not be made" error={csv.error} onRetry={() => csv.mutate(q)} /></Box>}
      {refusal && <Alert severity="warning" sx={{ mb: 1 }} onClose={() => setRefusal(null)}>{refusal}</Alert>}
      {list.error && <Box sx={{ mb: 1 }}><ProblemAlert title={`The ${label.toLowerCase()} could not be loaded`} error={list.error} onRetry={() => void list.refetch()} /></Box>}
      <DataGrid
        label={label}
        rows={rows}
        columns={columns}
        rowCount={list.data?.total ?? 0}
        loading={list.isFetching}
        paginationMode="server"
        sortingMode="server"
        filterMode="server"
        disableColumnFilter
        disableRowSelectionOnClick
        autoHeight
        rowHeight={56}
        paginationModel={{ page: q.page, pageSize: q.pageSize }}
        onPaginationModelChange={(m) => set({ ...q, page: m.pageSize === q.pageSize ? m.page : 0, pageSize: m.pageSize })}
        pageSizeOptions={[...PAGE_SIZES]}
        sortModel={sortModel}
        onSortModelChange={(m) => {
          const first = m[0];
          set({ ...q, page: 0, sort: first?.field, dir: first?.sort ?? undefined });
        }}
        onRowClick={(p) => navigate(paths.deskRecord.href(TAB_KIND[q.tab], String(p.id)))}
        localeText={{
          noRowsLabel: hasFilters(q) ? `No ${label.toLowerCase()} match these filters. Widen the dates or clear a filter.` : `No ${label.toLowerCase()} have reached the server yet.`,
          paginationRowsPerPage: 'Rows a page',
        }}
        sx={{ bgcolor: 'background.paper', '& .MuiDataGrid-row': { cursor: 'pointer' } }}
      />
    </Box>
  );
}
