import Typography from '@mui/material/Typography';
import { utcToLocal } from '@breakline/sync-protocol';
import type { KindFields } from '@breakline/sync-protocol';
import { useMemberName } from '../api/members';

/** What was done about the defect, in the order it happened: what the next crew reads. */
export function DefectHistory({ d, zone }: { d: KindFields['defect']; zone: string }) {
  const name = useMemberName();
  const when = (iso: string) => {
    const l = utcToLocal(iso, zone);
    return `${l.date} ${l.time}`;
  };
  const lines: string[] = [`Reported ${when(d.reportedAt)} by ${name(d.reportedBy)}.`];
  if (d.assignedTo) lines.push(`Assigned to ${name(d.assignedTo)}.`);
  if (d.actionTaken) lines.push(`Action taken${d.repairedAt ? ` (${when(d.repairedAt)})` : ''}: ${d.actionTaken}`);
  if (d.status === 'verified' && d.verifiedAt) lines.push(`Verified ${when(d.verifiedAt)} by ${name(d.verifiedBy)}: back in service.`);
  if (d.status === 'rejected') lines.push(`Rejected: ${d.rejectedReason ?? ''}`);
  for (const n of d.notes) lines.push(`Note ${when(n.at)}, ${name(n.by)}: ${n.text}`);
  return (
    <Typography component="ul" sx={{ m: 0, pl: 2.5 }}>
      {lines.map((l, i) => <li key={i}>{l}</li>)}
    </Typography>
  );
}
