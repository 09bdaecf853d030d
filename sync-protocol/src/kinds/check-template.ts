import { z } from 'zod';
import { checkTemplateRules } from './check-template-rules.js';
import { label, text } from './common.js';
import { defineKind } from './spec.js';
import { CHECK_ITEM_KINDS, CHECK_TYPES } from './values.js';

const item = z
  .strictObject({
    id: label(40),
    label: label(200),
    kind: z.enum(CHECK_ITEM_KINDS),
    /** A failed critical item stands the boat down. */
    critical: z.boolean(),
    /** How many must be there, for a count item. */
    required: z.number().int().min(1).optional(),
    unit: text(20).optional(),
    min: z.number().optional(),
    max: z.number().optional(),
    /** The boat's air chamber a pressure reading belongs to. */
    chamberId: text(40).optional(),
    /** A safety reminder shown with the item. */
    caution: text(500).optional(),
  })
  .superRefine((it, ctx) => {
    if (it.kind === 'count' && it.required === undefined) {
      ctx.addIssue({ code: 'custom', path: ['required'], message: 'is needed for a count item' });
    }
    if (it.min !== undefined && it.max !== undefined && it.min > it.max) {
      ctx.addIssue({ code: 'custom', path: ['min'], message: 'must not be above max' });
    }
  });

const section = z.strictObject({
  id: label(40),
  title: label(120),
  /** The boat system the section covers, e.g. hull, air chambers, fuel, motor, rescue gear. */
  system: label(40),
  items: z.array(item).min(1).max(100),
});

const checkTemplateSchema = z.strictObject({
  checkType: z.enum(CHECK_TYPES),
  name: label(80),
  templateVersion: z.number().int().min(1),
  sections: z.array(section).min(1).max(30),
  retired: z.boolean(),
});

/**
 * One version of a club's checklist. An edit is saved as a new record with the next
 * templateVersion; a saved version's content never changes, so a check keeps the meaning of the
 * template it was run against. Only `retired` may change afterwards.
 */
export const checkTemplateSpec = defineKind({ ...checkTemplateRules, schema: checkTemplateSchema });
export type CheckTemplateFields = z.infer<typeof checkTemplateSchema>;
export type CheckTemplateSection = CheckTemplateFields['sections'][number];
export type CheckTemplateItem = CheckTemplateSection['items'][number];
