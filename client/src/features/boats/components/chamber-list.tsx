import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import Typography from '@mui/material/Typography';
import { formatPressure, type AirChamber, type PressureUnit } from '@breakline/sync-protocol';

/** The boat's air chambers and the working range of each, in the club's unit. */
export function ChamberList({ chambers, unit }: { chambers: readonly AirChamber[]; unit: PressureUnit }) {
  if (chambers.length === 0) {
    return <Typography sx={{ color: 'text.secondary' }}>No air chambers recorded. A supervisor adds them with their working ranges.</Typography>;
  }
  return (
    <Table size="small" aria-label="Air chambers">
      <TableHead>
        <TableRow>
          <TableCell>Air chamber</TableCell>
          <TableCell>Valve</TableCell>
          <TableCell>Working range</TableCell>
        </TableRow>
      </TableHead>
      <TableBody>
        {chambers.map((c) => (
          <TableRow key={c.id}>
            <TableCell>{c.name}</TableCell>
            <TableCell>{c.valve || '—'}</TableCell>
            <TableCell>
              {formatPressure(c.minKpa, unit)} to {formatPressure(c.maxKpa, unit)}
            </TableCell>
          </TableRow>
        ))}
      </TableBody>
    </Table>
  );
}
