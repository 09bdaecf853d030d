import type { CheckTemplateFields } from './check-template.js';
import type { KindRules } from './spec.js';

/** A saved version's content is fixed (an edit is a new version); only `retired` may change. */
export const checkTemplateRules: KindRules<CheckTemplateFields> = {
  label: 'a check template',
  immutable: ['checkType', 'name', 'templateVersion', 'sections'],
  // Club set-up is the admin's; supervisors run the checks and defects made from it.
  access: { create: 'admin', update: 'admin', delete: 'admin' },
  recordChecks: (t) => {
    const ids = t.sections.flatMap((s) => s.items.map((i) => i.id));
    const dup = ids.find((id, i) => ids.indexOf(id) !== i);
    return dup === undefined ? [] : [{ field: 'sections', message: `Item id "${dup}" is used twice.` }];
  },
};
