import { describe, expect, it } from 'vitest';
import { DEFAULT_LAUNCH_TEMPLATE, DEFAULT_STOW_TEMPLATE, validateRecord } from '@breakline/sync-protocol';
import { buildTemplate, draftOf, errorPlace, moved, newItem, newSection, sameContent, slugId } from './template-draft';

describe('template drafts', () => {
  it('round-trip the default templates unchanged', () => {
    for (const t of [DEFAULT_LAUNCH_TEMPLATE, DEFAULT_STOW_TEMPLATE]) {
      const built = buildTemplate(draftOf(t), 1);
      expect(built).toEqual({ ok: true, fields: t });
    }
  });

  it('build as the next version, valid by the shared rules', () => {
    const built = buildTemplate(draftOf(DEFAULT_LAUNCH_TEMPLATE), 4);
    expect(built.ok && built.fields.templateVersion).toBe(4);
    expect(built.ok && validateRecord('checkTemplate', built.fields).ok).toBe(true);
    expect(built.ok && sameContent(built.fields, DEFAULT_LAUNCH_TEMPLATE)).toBe(true);
  });

  it('keep the ids of saved items through a rename, and give new ones ids unlike the others', () => {
    const d = draftOf(DEFAULT_LAUNCH_TEMPLATE);
    d.sections[0]!.items[1] = { ...d.sections[0]!.items[1]!, label: 'Bungs in' };
    d.sections[4]!.items.push({ ...newItem(), label: 'Knife', kind: 'count', required: '1' });
    d.sections.push({ ...newSection(), title: 'Hull', system: 'hull', items: [{ ...newItem(), label: 'Tow bar' }] });
    const built = buildTemplate(d, 2);
    if (!built.ok) throw new Error(JSON.stringify(built.errors));
    expect(built.fields.sections[0]!.items[1]).toMatchObject({ id: 'drain-bungs', label: 'Bungs in' });
    expect(built.fields.sections[4]!.items.at(-1)).toMatchObject({ id: 'knife-2', label: 'Knife', required: 1 });
    expect(built.fields.sections.at(-1)).toMatchObject({ id: 'hull-2', items: [{ id: 'tow-bar' }] });
    expect(validateRecord('checkTemplate', built.fields).ok).toBe(true);
  });

  it('store a chamber pressure in kPa against the boat, and a plain reading in its own unit and range', () => {
    const d = draftOf(DEFAULT_LAUNCH_TEMPLATE);
    d.sections[1]!.items.push({ ...newItem(), label: 'Spare chamber', kind: 'reading', chamberId: 'keel', unit: 'psi', min: '1' });
    d.sections[2]!.items.push({ ...newItem(), label: 'Fuel', kind: 'reading', unit: ' L ', min: '5,5', max: '' });
    const built = buildTemplate(d, 2);
    if (!built.ok) throw new Error(JSON.stringify(built.errors));
    expect(built.fields.sections[1]!.items.at(-1)).toEqual({ id: 'spare-chamber', label: 'Spare chamber', kind: 'reading', critical: false, unit: 'kPa', chamberId: 'keel' });
    expect(built.fields.sections[2]!.items.at(-1)).toEqual({ id: 'fuel', label: 'Fuel', kind: 'reading', critical: false, unit: 'L', min: 5.5 });
  });

  it('say what is wrong and where, one message a box', () => {
    const d = draftOf(DEFAULT_LAUNCH_TEMPLATE);
    d.name = ' ';
    d.sections[0]!.items[0]!.label = '';
    d.sections[4]!.items[1]!.required = '1.5';
    d.sections[3]!.items.push({ ...newItem(), label: 'Volts', kind: 'reading', unit: '', min: 'x', max: '' });
    d.sections[2]!.items = [];
    d.sections[1]!.title = 'T'.repeat(121);
    const built = buildTemplate(d, 2);
    expect(built.ok).toBe(false);
    if (built.ok) return;
    expect(built.errors).toEqual({
      name: 'Give the check a name, e.g. "Launch check".',
      'sections.0.items.0.label': 'Say what to check, e.g. "Drain bungs in and secure".',
      'sections.1.title': 'Keep it to 120 characters (it is 121 now).',
      'sections.2': 'A section needs at least one item: add one, or remove the section.',
      'sections.3.items.5.unit': 'Enter the unit the reading is taken in, e.g. "V" or "L".',
      'sections.3.items.5.min': 'Enter the lowest acceptable reading as a number, or leave it blank.',
      'sections.4.items.1.required': 'Enter how many must be in the boat, a whole number from 1.',
    });
    expect(errorPlace(d, 'sections.4.items.1.required')).toBe('Section 5 (Carried rescue equipment), item 2 (Paddles)');
    expect(errorPlace(d, 'sections.2')).toBe('Section 3 (Fuel system)');
    expect(errorPlace(d, 'name')).toBe('Name of the check');
  });

  it('need at least one section', () => {
    const built = buildTemplate({ ...draftOf(DEFAULT_STOW_TEMPLATE), sections: [] }, 2);
    expect(built).toEqual({ ok: false, errors: { sections: 'A check needs at least one section: add one.' } });
  });

  it('move an entry within its list, never past the ends', () => {
    expect(moved(['a', 'b', 'c'], 1, -1)).toEqual(['b', 'a', 'c']);
    expect(moved(['a', 'b', 'c'], 2, 1)).toEqual(['a', 'b', 'c']);
    expect(moved(['a', 'b', 'c'], 0, -1)).toEqual(['a', 'b', 'c']);
  });

  it('make ids from names', () => {
    expect(slugId('Fuel line: clips & bulb', new Set(), 'item')).toBe('fuel-line-clips-bulb');
    expect(slugId('!!!', new Set(['item']), 'item')).toBe('item-2');
  });
});
