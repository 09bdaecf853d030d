import type { CHECK_ITEM_KINDS } from '@breakline/sync-protocol';

export type CheckItemKind = (typeof CHECK_ITEM_KINDS)[number];
