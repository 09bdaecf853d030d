import { fieldLabel, type RecordKind } from '@breakline/sync-protocol';
import { clubTime, CHECK_TYPE_WORDS, DEFECT_STATUS_WORDS, INCIDENT_WORDS, PURPOSE_WORDS } from './format';

/** What turns ids and times into words: names from the desk, the club's zone, a check's item labels. */
export interface ValueContext {
  zone: string;
  boat(id: unknown): string;
  motor(id: unknown): string;
  member(id: unknown): string;
  /** A check item's label from its template, when this computer has the template. */
  itemLabel?(itemId: string): string | undefined;
}

const PERSON_FIELDS = new Set(['performedBy', 'signedOffBy', 'reportedBy', 'assignedTo', 'verifiedBy', 'driverId', 'authorId', 'by']);
const OUTCOME_WORDS: Record<string, string> = { pass: 'Passed', fail: 'Failed', na: 'Not applicable' };
const ENUM_WORDS: Record<string, Record<string, string>> = {
  purpose: PURPOSE_WORDS, checkType: CHECK_TYPE_WORDS, status: { ...DEFECT_STATUS_WORDS, 'in-progress': 'In progress', complete: 'Complete' },
  severity: { 'stand-down': 'Stand-down', limit: 'Limit', note: 'Note' },
};

const isObject = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v);

/** "Boat", "Signed off by", "Results: Hull and fittings" — a field's name as a heading. */
export function fieldHeading(kind: RecordKind, field: string, ctx: Pick<ValueContext, 'itemLabel'>): string {
  if (field === 'deleted') return 'Deleted or kept';
  const [top, item] = field.split(/\.(.*)/s, 2) as [string, string | undefined];
  if (top === 'results' && item !== undefined) return `Check item: ${ctx.itemLabel?.(item) ?? item}`;
  if (kind === 'incidentNote' && top === 'kind') return 'What happened';
  const words = fieldLabel([top]);
  return words.charAt(0).toUpperCase() + words.slice(1);
}

/** One check item's answer in words: "Failed · 17.5 · “slow leak at the valve”". */
export function itemResultText(v: unknown): string {
  if (v === null || v === undefined) return 'no answer';
  if (!isObject(v)) return String(v);
  const parts = [OUTCOME_WORDS[String(v.outcome)] ?? String(v.outcome ?? 'no outcome')];
  if (v.value !== undefined && v.value !== '') parts.push(String(v.value));
  if (typeof v.note === 'string' && v.note.trim()) parts.push(`“${v.note.trim()}”`);
  if (Array.isArray(v.photos) && v.photos.length > 0) parts.push(`${v.photos.length} photo${v.photos.length === 1 ? '' : 's'}`);
  return parts.join(' · ');
}

/** A field's value in words, for the history and the conflict cards. */
export function valueText(kind: RecordKind, field: string, value: unknown, ctx: ValueContext): string {
  const [top, item] = field.split(/\.(.*)/s, 2) as [string, string | undefined];
  if (value === undefined || value === null || value === '') return 'empty';
  if (field === 'deleted') return value === true ? 'Deleted' : 'Kept (not deleted)';
  if (top === 'results' && item !== undefined) return itemResultText(value);
  if (top === 'results' && isObject(value)) {
    const entries = Object.entries(value);
    return entries.length === 0 ? 'no answers' : entries.map(([id, r]) => `${ctx.itemLabel?.(id) ?? id}: ${itemResultText(r)}`).join('; ');
  }
  if (top === 'itemId' && typeof value === 'string') return ctx.itemLabel?.(value) ?? value;
  if ((top === 'checkId' || top === 'tripId') && typeof value === 'string') return `${top === 'checkId' ? 'check' : 'trip'} ending ${value.slice(-6)}`;
  if (top === 'boatId') return ctx.boat(value);
  if (top === 'motorId') return ctx.motor(value);
  if (PERSON_FIELDS.has(top)) return ctx.member(value);
  if (top === 'crewIds' && Array.isArray(value)) return value.length === 0 ? 'nobody' : value.map((id) => ctx.member(id)).join(', ');
  if (top === 'kind' && kind === 'incidentNote') return INCIDENT_WORDS[String(value)] ?? String(value);
  if (ENUM_WORDS[top] && typeof value === 'string') return ENUM_WORDS[top][value] ?? value;
  if (typeof value === 'boolean') return value ? 'Yes' : 'No';
  if (typeof value === 'string' && /At$/.test(top) && /^\d{4}-\d{2}-\d{2}T/.test(value)) return clubTime(value, ctx.zone);
  if (typeof value === 'string') return value;
  if (typeof value === 'number') return String(value);
  if (Array.isArray(value)) {
    if (value.length === 0) return 'none';
    if (top === 'photos') return `${value.length} photo${value.length === 1 ? '' : 's'}`;
    if (value.every((e) => isObject(e) && typeof e.text === 'string' && typeof e.at === 'string')) {
      return value.map((e) => `${clubTime(e.at, ctx.zone)}, ${ctx.member(e.by)}: ${String(e.text)}`).join(' | ');
    }
    return value.map((e) => (isObject(e) ? summary(e) : String(e))).join('; ');
  }
  return summary(value as Record<string, unknown>);
}

function summary(o: Record<string, unknown>): string {
  const name = o.name ?? o.item ?? o.label ?? o.title;
  if (typeof name === 'string') return name + (typeof o.count === 'number' ? ` × ${o.count}` : '');
  return JSON.stringify(o);
}

export interface FieldChange {
  field: string;
  from: unknown;
  to: unknown;
}

/** A change of a check's results becomes one line an item, so "what changed" names the item. */
export function expandChanges(changes: Record<string, { from?: unknown; to?: unknown }>): FieldChange[] {
  const out: FieldChange[] = [];
  for (const [field, c] of Object.entries(changes)) {
    if (field === 'results' && (isObject(c.from) || c.from == null) && isObject(c.to)) {
      const from = isObject(c.from) ? c.from : {};
      const to = c.to;
      for (const id of new Set([...Object.keys(from), ...Object.keys(to)])) {
        if (JSON.stringify(from[id]) !== JSON.stringify(to[id])) out.push({ field: `results.${id}`, from: from[id] ?? null, to: to[id] ?? null });
      }
      continue;
    }
    out.push({ field, from: c.from ?? null, to: c.to ?? null });
  }
  return out;
}
