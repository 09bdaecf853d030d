import { CHECK_ITEM_KINDS, deepEqual, type KindFields } from '@breakline/sync-protocol';

type Template = KindFields['checkTemplate'];
type Section = Template['sections'][number];
type Item = Section['items'][number];
export type ItemKind = (typeof CHECK_ITEM_KINDS)[number];

/**
 * What the editor holds while a person types: every box as text, so a half-typed number is kept
 * as typed, and values of another item kind are kept when the kind is switched back.
 */
export interface ItemDraft {
  /** React's key; stays with the item while it is moved. */
  key: string;
  /** The id results are stored by; set once saved, kept through renames so the item keeps its meaning. */
  id?: string;
  label: string;
  kind: ItemKind;
  critical: boolean;
  required: string;
  unit: string;
  min: string;
  max: string;
  /** The boat's air chamber a pressure reading reads ('' for a reading in its own unit). */
  chamberId: string;
  caution: string;
}

export interface SectionDraft {
  key: string;
  id?: string;
  title: string;
  system: string;
  items: ItemDraft[];
}

export interface TemplateDraft {
  checkType: Template['checkType'];
  name: string;
  sections: SectionDraft[];
}

/** Field path → what to do about it, e.g. "sections.1.items.0.required". */
export type TemplateErrors = Record<string, string>;

let made = 0;
export const newKey = () => `new-${Date.now().toString(36)}-${(made++).toString(36)}`;
const num = (n: number | undefined) => (n === undefined ? '' : String(n));

export function itemDraftOf(i: Item): ItemDraft {
  return {
    key: `item-${i.id}`, id: i.id, label: i.label, kind: i.kind, critical: i.critical, required: num(i.required), unit: i.unit ?? '',
    min: num(i.min), max: num(i.max), chamberId: i.chamberId ?? '', caution: i.caution ?? '',
  };
}

export function draftOf(t: Template): TemplateDraft {
  return {
    checkType: t.checkType,
    name: t.name,
    sections: t.sections.map((s) => ({ key: `section-${s.id}`, id: s.id, title: s.title, system: s.system, items: s.items.map(itemDraftOf) })),
  };
}

export function newItem(): ItemDraft {
  return { key: newKey(), label: '', kind: 'pass-fail', critical: false, required: '1', unit: '', min: '', max: '', chamberId: '', caution: '' };
}

export function newSection(): SectionDraft {
  return { key: newKey(), title: '', system: '', items: [newItem()] };
}

/** An id from a name, unlike those taken: "Fuel line clips" → "fuel-line-clips". */
export function slugId(name: string, taken: ReadonlySet<string>, fallback: string): string {
  const base = name.toLowerCase().replace(/[^a-z0-9]+/g, '-').replace(/^-|-$/g, '').slice(0, 32) || fallback;
  let id = base;
  for (let n = 2; taken.has(id); n++) id = `${base}-${n}`;
  return id;
}

const LIMITS = { name: 80, title: 120, system: 40, label: 200, unit: 20, caution: 500 } as const;
const MAX_SECTIONS = 30;
const MAX_ITEMS = 100;

function tooLong(text: string, max: number): string | null {
  return text.trim().length > max ? `Keep it to ${max} characters (it is ${text.trim().length} now).` : null;
}

/** A number box: blank is undefined; a decimal comma is fine; anything else is an error. */
function parseNumber(text: string): number | undefined | 'bad' {
  const clean = text.trim().replace(',', '.');
  if (clean === '') return undefined;
  const n = Number(clean);
  return Number.isFinite(n) ? n : 'bad';
}

function buildItem(d: ItemDraft, at: string, e: TemplateErrors): Omit<Item, 'id'> {
  const label = d.label.trim();
  if (!label) e[`${at}.label`] = 'Say what to check, e.g. "Drain bungs in and secure".';
  else if (tooLong(label, LIMITS.label)) e[`${at}.label`] = tooLong(label, LIMITS.label)!;
  const item: Omit<Item, 'id'> = { label, kind: d.kind, critical: d.critical };
  if (d.kind === 'count') {
    const required = parseNumber(d.required);
    if (required === undefined || required === 'bad' || !Number.isInteger(required) || required < 1) {
      e[`${at}.required`] = 'Enter how many must be in the boat, a whole number from 1.';
    } else item.required = required;
  }
  if (d.kind === 'reading' && d.chamberId) {
    // A chamber's range is the boat's own (its maker's figure); the reading is stored in kPa.
    Object.assign(item, { unit: 'kPa', chamberId: d.chamberId });
  } else if (d.kind === 'reading') {
    const unit = d.unit.trim();
    if (!unit) e[`${at}.unit`] = 'Enter the unit the reading is taken in, e.g. "V" or "L".';
    else if (tooLong(unit, LIMITS.unit)) e[`${at}.unit`] = tooLong(unit, LIMITS.unit)!;
    else item.unit = unit;
    const min = parseNumber(d.min), max = parseNumber(d.max);
    if (min === 'bad') e[`${at}.min`] = 'Enter the lowest acceptable reading as a number, or leave it blank.';
    if (max === 'bad') e[`${at}.max`] = 'Enter the highest acceptable reading as a number, or leave it blank.';
    if (typeof min === 'number') item.min = min;
    if (typeof max === 'number') item.max = max;
    if (typeof min === 'number' && typeof max === 'number' && min > max) e[`${at}.min`] = 'The lowest must not be above the highest.';
  }
  const caution = d.caution.trim();
  if (caution) {
    if (tooLong(caution, LIMITS.caution)) e[`${at}.caution`] = tooLong(caution, LIMITS.caution)!;
    item.caution = caution;
  }
  return item;
}

/**
 * The template as it would be saved as `version`, or what must be fixed first. Ids of saved
 * sections and items are kept; new ones get an id from their name, unlike any other in the template.
 */
export function buildTemplate(d: TemplateDraft, version: number): { ok: true; fields: Template } | { ok: false; errors: TemplateErrors } {
  const e: TemplateErrors = {};
  const name = d.name.trim();
  if (!name) e.name = 'Give the check a name, e.g. "Launch check".';
  else if (tooLong(name, LIMITS.name)) e.name = tooLong(name, LIMITS.name)!;
  if (d.sections.length === 0) e.sections = 'A check needs at least one section: add one.';
  if (d.sections.length > MAX_SECTIONS) e.sections = `A check can have up to ${MAX_SECTIONS} sections; join or remove some.`;
  const sectionIds = new Set(d.sections.flatMap((s) => (s.id ? [s.id] : [])));
  const itemIds = new Set(d.sections.flatMap((s) => s.items.flatMap((i) => (i.id ? [i.id] : []))));
  const sections: Section[] = d.sections.map((s, si) => {
    const at = `sections.${si}`;
    const title = s.title.trim(), system = s.system.trim();
    if (!title) e[`${at}.title`] = 'Give the section a title, e.g. "Fuel system".';
    else if (tooLong(title, LIMITS.title)) e[`${at}.title`] = tooLong(title, LIMITS.title)!;
    if (!system) e[`${at}.system`] = 'Say which part of the boat this covers, e.g. "fuel" or "motor".';
    else if (tooLong(system, LIMITS.system)) e[`${at}.system`] = tooLong(system, LIMITS.system)!;
    if (s.items.length === 0) e[at] = 'A section needs at least one item: add one, or remove the section.';
    if (s.items.length > MAX_ITEMS) e[at] = `A section can have up to ${MAX_ITEMS} items; split it in two.`;
    const id = s.id ?? slugId(title, sectionIds, 'section');
    sectionIds.add(id);
    const items = s.items.map((i, ii) => {
      const built = buildItem(i, `${at}.items.${ii}`, e);
      const itemId = i.id ?? slugId(built.label, itemIds, 'item');
      itemIds.add(itemId);
      return { id: itemId, ...built };
    });
    return { id, title, system, items };
  });
  if (Object.keys(e).length > 0) return { ok: false, errors: e };
  return { ok: true, fields: { checkType: d.checkType, name, templateVersion: version, sections, retired: false } };
}

/** Where an error is, in words: "Section 2 (Fuel system), item 3 (Fuel line)". */
export function errorPlace(d: TemplateDraft, path: string): string {
  const m = /^sections\.(\d+)(?:\.items\.(\d+))?/.exec(path);
  if (!m) return path === 'name' ? 'Name of the check' : 'The check';
  const s = d.sections[Number(m[1])];
  const section = `Section ${Number(m[1]) + 1}${s?.title.trim() ? ` (${s.title.trim()})` : ''}`;
  if (m[2] === undefined) return section;
  const i = s?.items[Number(m[2])];
  const label = i?.label.trim();
  return `${section}, item ${Number(m[2]) + 1}${label ? ` (${label.length > 40 ? `${label.slice(0, 39)}…` : label})` : ''}`;
}

/** The draft's item and section by a path, for scrolling to an error. */
export function keyAt(d: TemplateDraft, path: string): string | undefined {
  const m = /^sections\.(\d+)(?:\.items\.(\d+))?/.exec(path);
  if (!m) return undefined;
  const s = d.sections[Number(m[1])];
  return m[2] === undefined ? s?.key : s?.items[Number(m[2])]?.key;
}

/** The list with the entry at `from` moved by `by` places (kept inside the list). */
export function moved<T>(list: readonly T[], from: number, by: -1 | 1): T[] {
  const to = from + by;
  if (from < 0 || from >= list.length || to < 0 || to >= list.length) return [...list];
  const next = [...list];
  [next[from], next[to]] = [next[to]!, next[from]!];
  return next;
}

/** Whether the saved content (everything but the version number) would be the same. */
export function sameContent(a: Template, b: Template): boolean {
  const strip = ({ templateVersion: _v, retired: _r, ...rest }: Template) => rest;
  return deepEqual(strip(a), strip(b));
}

/** One edit of the draft; the editor's boxes and buttons send these. */
export type DraftAction =
  | { type: 'name'; name: string }
  | { type: 'section'; si: number; change: Partial<Omit<SectionDraft, 'items' | 'key' | 'id'>> }
  | { type: 'item'; si: number; ii: number; change: Partial<Omit<ItemDraft, 'key' | 'id'>> }
  | { type: 'move-section'; si: number; by: -1 | 1 }
  | { type: 'move-item'; si: number; ii: number; by: -1 | 1 }
  | { type: 'remove-section'; si: number }
  | { type: 'remove-item'; si: number; ii: number }
  | { type: 'add-section'; section?: SectionDraft }
  | { type: 'add-item'; si: number };

const mapAt = <T>(list: readonly T[], at: number, f: (x: T) => T) => list.map((x, i) => (i === at ? f(x) : x));

export function applyAction(d: TemplateDraft, a: DraftAction): TemplateDraft {
  const sections = (f: (s: SectionDraft[]) => SectionDraft[]) => ({ ...d, sections: f(d.sections) });
  const items = (si: number, f: (i: ItemDraft[]) => ItemDraft[]) => sections((ss) => mapAt(ss, si, (s) => ({ ...s, items: f(s.items) })));
  switch (a.type) {
    case 'name': return { ...d, name: a.name };
    case 'section': return sections((ss) => mapAt(ss, a.si, (s) => ({ ...s, ...a.change })));
    case 'item': return items(a.si, (is) => mapAt(is, a.ii, (i) => ({ ...i, ...a.change })));
    case 'move-section': return sections((ss) => moved(ss, a.si, a.by));
    case 'move-item': return items(a.si, (is) => moved(is, a.ii, a.by));
    case 'remove-section': return sections((ss) => ss.filter((_, i) => i !== a.si));
    case 'remove-item': return items(a.si, (is) => is.filter((_, i) => i !== a.ii));
    case 'add-section': return sections((ss) => [...ss, a.section ?? newSection()]);
    case 'add-item': return items(a.si, (is) => [...is, newItem()]);
  }
}
