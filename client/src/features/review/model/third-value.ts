/** How the "write another value" box reads what the supervisor typed, by the kind of value in conflict. */
export type ValueShape = 'text' | 'number' | 'yes-no' | 'item-result' | 'json';

const isObject = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v);

export function valueShape(field: string, a: unknown, b: unknown): ValueShape {
  if (field.startsWith('results.')) return 'item-result';
  const sample = [a, b].find((v) => v !== null && v !== undefined);
  if (sample === undefined || typeof sample === 'string') return 'text';
  if (typeof sample === 'number') return 'number';
  if (typeof sample === 'boolean') return 'yes-no';
  return 'json';
}

/** A starting point for the box: the value kept for now, in the box's own form. */
export function draftOf(shape: ValueShape, value: unknown): string {
  if (value === null || value === undefined) return '';
  if (shape === 'json') return JSON.stringify(value, null, 2);
  if (shape === 'item-result') return isObject(value) && typeof value.value !== 'undefined' ? String(value.value) : '';
  return String(value);
}

export type Parsed = { ok: true; value: unknown } | { ok: false; message: string };

/** The typed text as the value to save, or what is wrong with it in words. */
export function parseDraft(shape: ValueShape, text: string, itemOutcome?: string, itemNote?: string): Parsed {
  switch (shape) {
    case 'text':
      return { ok: true, value: text };
    case 'number': {
      const n = Number(text.trim().replace(',', '.'));
      return text.trim() !== '' && Number.isFinite(n) ? { ok: true, value: n } : { ok: false, message: 'Type a number, such as 12.5.' };
    }
    case 'yes-no':
      return text === 'true' || text === 'false' ? { ok: true, value: text === 'true' } : { ok: false, message: 'Choose yes or no.' };
    case 'item-result': {
      if (itemOutcome !== 'pass' && itemOutcome !== 'fail' && itemOutcome !== 'na') return { ok: false, message: 'Choose passed, failed or not applicable.' };
      const result: Record<string, unknown> = { outcome: itemOutcome };
      const t = text.trim();
      if (t !== '') result.value = Number.isFinite(Number(t)) ? Number(t) : t;
      if (itemNote?.trim()) result.note = itemNote.trim();
      return { ok: true, value: result };
    }
    case 'json':
      try {
        return { ok: true, value: JSON.parse(text) };
      } catch {
        return { ok: false, message: 'This value is a list or a group of fields: write it as JSON, as in the box when it opened.' };
      }
  }
}
