import Papa from 'papaparse';
import { TRIP_PURPOSES } from '@breakline/sync-protocol';
import type { SeasonReportView } from '../api/season';
import { boatLabel, tenth } from './chart-data';

/** The figures on the page as a spreadsheet: one line a figure, with what it counts. */
export function figuresCsv(f: SeasonReportView, nameOf: (id: string) => string): string {
  const rows: { figure: string; of: string; week: string; value: number | string }[] = [
    ...TRIP_PURPOSES.map((p) => ({ figure: 'trips', of: p, week: '', value: f.trips.byPurpose[p] })),
    { figure: 'trips not yet retrieved', of: '', week: '', value: f.trips.open },
    { figure: 'hours on the water', of: 'all boats', week: '', value: tenth(f.hoursOnWater.total) },
    ...f.hoursOnWater.byBoat.map((b) => ({ figure: 'hours on the water', of: boatLabel(b, nameOf), week: '', value: tenth(b.totalHours) })),
    ...f.hoursOnWater.byBoat.flatMap((b) => f.weeks.map((w, i) => ({ figure: 'hours on the water', of: boatLabel(b, nameOf), week: w, value: tenth(b.weekly[i] ?? 0) }))),
    { figure: 'rescues', of: 'incidents', week: '', value: f.rescues.incidents },
    { figure: 'rescues', of: 'people', week: '', value: f.rescues.persons },
    { figure: 'assists', of: 'incidents', week: '', value: f.assists.incidents },
    { figure: 'assists', of: 'people', week: '', value: f.assists.persons },
    { figure: 'defects raised', of: '', week: '', value: f.defects.raised },
    { figure: 'defects closed', of: '', week: '', value: f.defects.closed },
    ...f.defects.weekly.flatMap((w) => [
      { figure: 'defects raised', of: '', week: w.week, value: w.raised },
      { figure: 'defects returned to service', of: '', week: w.week, value: w.returnedToService },
    ]),
    { figure: 'median hours from report to repair', of: `${f.defects.repairedCount} repaired`, week: '', value: f.defects.medianHoursToRepair === null ? '' : tenth(f.defects.medianHoursToRepair) },
  ];
  // escapeFormulae: a boat named "=..." stays text in a spreadsheet.
  return Papa.unparse(rows, { header: true, escapeFormulae: true });
}
