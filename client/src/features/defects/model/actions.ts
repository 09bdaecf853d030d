import { canUpdate, type DefectStatus, type KindFields, type Role } from '@breakline/sync-protocol';

export type DefectAction = 'assign' | 'repair' | 'verify' | 'reject' | 'reopen';

type Defect = KindFields['defect'];

// Where on the path each step may be taken; who may take it is the shared permission rules' call.
const FROM: Record<DefectAction, readonly DefectStatus[]> = {
  assign: ['open', 'assigned'],
  repair: ['open', 'assigned'],
  verify: ['repaired'],
  reject: ['open', 'assigned', 'repaired'],
  reopen: ['verified', 'rejected'],
};

/** The change each step makes, as the permission check weighs it (text boxes stand in with a placeholder). */
function samplePatch(action: DefectAction, userId: string, now: string): Partial<Defect> {
  switch (action) {
    case 'assign': return { status: 'assigned', assignedTo: userId };
    case 'repair': return { status: 'repaired', actionTaken: '…', repairedAt: now };
    case 'verify': return { status: 'verified', verifiedBy: userId, verifiedAt: now };
    case 'reject': return { status: 'rejected', rejectedReason: '…' };
    case 'reopen': return { status: 'open' };
  }
}

/** The steps this person may take on this defect now, in the order the path runs. */
export function availableActions(defect: Defect, role: Role, userId: string, now = new Date().toISOString()): DefectAction[] {
  return (Object.keys(FROM) as DefectAction[]).filter(
    (a) => FROM[a].includes(defect.status) && canUpdate('defect', role, samplePatch(a, userId, now), defect, userId),
  );
}
