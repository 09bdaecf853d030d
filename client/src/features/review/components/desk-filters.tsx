import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import MenuItem from '@mui/material/MenuItem';
import TextField from '@mui/material/TextField';
import type { Names } from '../hooks/use-names';
import {
  dateRangeProblem, hasFilters, SEVERITY_OPTIONS, STATE_OPTIONS, TYPE_OPTIONS, type DeskFilters, type DeskTab,
} from '../model/desk-query';

interface Props {
  tab: DeskTab;
  filters: DeskFilters;
  names: Names;
  onChange: (change: Partial<DeskFilters>) => void;
}

const PERSON_LABEL: Record<DeskTab, string> = {
  checks: 'Done by', trips: 'Driver or crew', defects: 'Reported by or assigned to', incidentNotes: 'Written by',
};

function Choice(props: { label: string; value: string | undefined; options: { value: string; label: string }[]; onChange: (v: string | undefined) => void; anyLabel: string }) {
  return (
    <TextField
      select size="small" label={props.label} value={props.value ?? ''} sx={{ minWidth: 170 }}
      onChange={(e) => props.onChange(e.target.value || undefined)}
    >
      <MenuItem value="">{props.anyLabel}</MenuItem>
      {props.options.map((o) => <MenuItem key={o.value} value={o.value}>{o.label}</MenuItem>)}
    </TextField>
  );
}

/** The filters over a desk table; every change goes to the server, which filters the whole season. */
export function DeskFiltersBar({ tab, filters, names, onChange }: Props) {
  const rangeProblem = dateRangeProblem(filters);
  return (
    <Box component="form" role="search" aria-label="Filter the table" onSubmit={(e) => e.preventDefault()}
      sx={{ display: 'flex', flexWrap: 'wrap', gap: 1.5, alignItems: 'flex-start', mb: 2 }}>
      <TextField
        size="small" type="date" label="From" value={filters.from ?? ''} slotProps={{ inputLabel: { shrink: true } }}
        onChange={(e) => onChange({ from: e.target.value || undefined })} error={Boolean(rangeProblem)}
      />
      <TextField
        size="small" type="date" label="To" value={filters.to ?? ''} slotProps={{ inputLabel: { shrink: true } }}
        onChange={(e) => onChange({ to: e.target.value || undefined })} error={Boolean(rangeProblem)} helperText={rangeProblem ?? undefined}
      />
      <Choice label="Boat" anyLabel="Every boat" value={filters.boatId} onChange={(boatId) => onChange({ boatId })}
        options={names.boats.map((b) => ({ value: b.id, label: b.label }))} />
      {tab !== 'incidentNotes' && (
        <Choice label="Motor" anyLabel="Every motor" value={filters.motorId} onChange={(motorId) => onChange({ motorId })}
          options={names.motors.map((m) => ({ value: m.id, label: m.label }))} />
      )}
      <Choice label={PERSON_LABEL[tab]} anyLabel="Anyone" value={filters.memberId} onChange={(memberId) => onChange({ memberId })}
        options={names.members.map((m) => ({ value: m.userId, label: m.displayName }))} />
      {TYPE_OPTIONS[tab] && (
        <Choice label={TYPE_OPTIONS[tab].label} anyLabel="Any" value={filters.type} onChange={(type) => onChange({ type })}
          options={[...TYPE_OPTIONS[tab].options]} />
      )}
      {STATE_OPTIONS[tab].length > 0 && (
        <Choice label="State" anyLabel="Any state" value={filters.state} onChange={(state) => onChange({ state })}
          options={[...STATE_OPTIONS[tab]]} />
      )}
      {tab === 'defects' && (
        <Choice label="Severity" anyLabel="Any severity" value={filters.severity} onChange={(severity) => onChange({ severity })}
          options={[...SEVERITY_OPTIONS]} />
      )}
      {hasFilters(filters) && (
        <Button onClick={() => onChange({ from: undefined, to: undefined, boatId: undefined, motorId: undefined, memberId: undefined, state: undefined, severity: undefined, type: undefined })}>
          Clear filters
        </Button>
      )}
    </Box>
  );
}
