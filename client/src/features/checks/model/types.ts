import type { CheckItemEntry, KindFields } from '@breakline/sync-protocol';

export type TemplateFields = KindFields['checkTemplate'];
export type TemplateSection = TemplateFields['sections'][number];
export type TemplateItem = TemplateSection['items'][number];
export type CheckResults = KindFields['check']['results'];
export type { CheckItemEntry };

/** What the defects feature needs to report a failed item; the page passes a component for it. */
export interface FailedItem {
  checkId: string;
  boatId: string;
  motorId: string | null;
  itemId: string;
  itemLabel: string;
  /** A failed critical item stands the boat down; a minor one limits it. */
  critical: boolean;
  note?: string;
}
