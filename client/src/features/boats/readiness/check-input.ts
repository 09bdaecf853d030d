import type { CheckInput, CheckItemResult, KindFields } from '@breakline/sync-protocol';
import type { LocalRecord } from '@/db/types';

type Template = KindFields['checkTemplate'];
type Item = Template['sections'][number]['items'][number];

function itemsOf(template: Template | undefined): Map<string, Item> {
  return new Map((template?.sections ?? []).flatMap((s) => s.items.map((i) => [i.id, i] as const)));
}

/** A pressure reading is stored in kPa against one of the boat's air chambers. */
function pressureOf(item: Item | undefined, value: number | string | undefined): number | undefined {
  return item?.kind === 'reading' && item.chamberId && typeof value === 'number' ? value : undefined;
}

/**
 * One check as the state derivation reads it. The results only name item ids; labels and the
 * critical flag come from the template. An item this phone has no template for counts as
 * critical: a failure nobody can weigh must not let the boat launch.
 */
export function toCheckInput(check: KindFields['check'], template: Template | undefined): CheckInput {
  const items = itemsOf(template);
  const results: CheckItemResult[] = Object.entries(check.results).map(([itemId, r]) => {
    const item = items.get(itemId);
    const result: CheckItemResult = { label: item?.label ?? `Check item "${itemId}"`, outcome: r.outcome, critical: item?.critical ?? true };
    const kpa = pressureOf(item, r.value);
    if (kpa !== undefined && item?.chamberId) Object.assign(result, { chamber: item.chamberId, pressureKpa: kpa });
    if (r.note) result.note = r.note;
    return result;
  });
  return { type: check.checkType, status: check.status, completedAt: check.completedAt, results };
}

/** The boat's latest check of a type, by when it was started: a check begun again replaces the last. */
export function latestCheck(
  checks: readonly LocalRecord<'check'>[], boatId: string, type: 'launch' | 'stow',
): LocalRecord<'check'> | undefined {
  return checks
    .filter((c) => c.fields.boatId === boatId && c.fields.checkType === type)
    .reduce<LocalRecord<'check'> | undefined>((best, c) => {
      if (!best) return c;
      const a = Date.parse(c.fields.startedAt), b = Date.parse(best.fields.startedAt);
      return a > b || (a === b && c.id > best.id) ? c : best;
    }, undefined);
}

export function templateFor(templates: readonly LocalRecord<'checkTemplate'>[], check: KindFields['check']): Template | undefined {
  return templates.find((t) => t.id === check.templateId)?.fields;
}
