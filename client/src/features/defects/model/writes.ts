import type { KindFields } from '@breakline/sync-protocol';
import { createRecord, updateRecord, type WriteContext } from '@/db/write';

type Defect = KindFields['defect'];
const nowIso = () => new Date().toISOString();

export interface NewDefect {
  boatId: string;
  motorId: string | null;
  checkId?: string | null;
  itemId?: string | null;
  severity: Defect['severity'];
  description: string;
  photos: string[];
}

export function raiseDefect(ctx: WriteContext, d: NewDefect): Promise<string> {
  return createRecord(ctx, 'defect', {
    boatId: d.boatId, motorId: d.motorId, checkId: d.checkId ?? null, itemId: d.itemId ?? null, severity: d.severity,
    description: d.description.trim(), photos: d.photos, status: 'open', reportedBy: ctx.userId, reportedAt: nowIso(),
    assignedTo: null, actionTaken: null, repairedAt: null, verifiedBy: null, verifiedAt: null, rejectedReason: null, notes: [],
  });
}

export const assignDefect = (ctx: WriteContext, id: string, memberId: string) =>
  updateRecord(ctx, 'defect', id, { status: 'assigned', assignedTo: memberId });

export const markRepaired = (ctx: WriteContext, id: string, actionTaken: string) =>
  updateRecord(ctx, 'defect', id, { status: 'repaired', actionTaken: actionTaken.trim(), repairedAt: nowIso() });

export const verifyDefect = (ctx: WriteContext, id: string) =>
  updateRecord(ctx, 'defect', id, { status: 'verified', verifiedBy: ctx.userId, verifiedAt: nowIso() });

export const rejectDefect = (ctx: WriteContext, id: string, reason: string) =>
  updateRecord(ctx, 'defect', id, { status: 'rejected', rejectedReason: reason.trim() });

export const reopenDefect = (ctx: WriteContext, id: string) => updateRecord(ctx, 'defect', id, { status: 'open' });

/** Notes merge by union, so two phones adding one each keep both. */
export const addDefectNote = (ctx: WriteContext, id: string, current: Defect, text: string) =>
  updateRecord(ctx, 'defect', id, { notes: [...current.notes, { at: nowIso(), by: ctx.userId, text: text.trim() }] });
