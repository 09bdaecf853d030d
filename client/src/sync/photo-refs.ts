import type { Fields } from '@breakline/sync-protocol';

const SHA256 = /^[0-9a-f]{64}$/;

/**
 * The photos a change refers to: every hash in a `photos` list anywhere in the patch (a defect's
 * own list, or a check item's inside `results`), so a new kind with photos needs no change here.
 */
export function photoRefs(patch: Fields): string[] {
  const found = new Set<string>();
  const walk = (value: unknown): void => {
    if (Array.isArray(value)) {
      value.forEach(walk);
      return;
    }
    if (typeof value !== 'object' || value === null) return;
    for (const [key, inner] of Object.entries(value)) {
      if (key === 'photos' && Array.isArray(inner)) {
        for (const p of inner) if (typeof p === 'string' && SHA256.test(p)) found.add(p);
      } else {
        walk(inner);
      }
    }
  };
  walk(patch);
  return [...found];
}
