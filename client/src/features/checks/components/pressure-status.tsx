import Typography from '@mui/material/Typography';
import { formatPressure, pressureStatus, type AirChamber, type PressureUnit } from '@breakline/sync-protocol';
import { STATUS_WORDS } from '../model/answers';

/** In range or out, as the person types, against the boat's working range in the club's unit. */
export function PressureStatus({ kpa, chamber, unit }: { kpa: number | null; chamber: AirChamber | undefined; unit: PressureUnit }) {
  if (!chamber) {
    return (
      <Typography sx={{ color: 'error.main', fontWeight: 700 }}>
        This boat's file has no working range for this chamber. Judge the reading against the maker's plate, mark Pass or Fail, and
        tell a supervisor.
      </Typography>
    );
  }
  const range = `${formatPressure(chamber.minKpa, unit)} to ${formatPressure(chamber.maxKpa, unit)}`;
  if (kpa === null) return <Typography>Working range: {range}</Typography>;
  const status = pressureStatus(kpa, chamber.minKpa, chamber.maxKpa);
  return (
    <Typography role="status" sx={{ color: status === 'in-range' ? 'primary.main' : 'error.main', fontWeight: 700 }}>
      {STATUS_WORDS[status]}: {formatPressure(kpa, unit)} (working range {range})
    </Typography>
  );
}
