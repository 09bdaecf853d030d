import { useCallback, useEffect, useState } from 'react';
import type { TemplateDraft } from './template-draft';

export interface StoredDraft {
  /** The saved version the draft was started from (null: none yet). */
  baseId: string | null;
  draft: TemplateDraft;
}

function read(key: string): StoredDraft | null {
  try {
    const text = localStorage.getItem(key);
    const value = text ? (JSON.parse(text) as StoredDraft) : null;
    return value && Array.isArray(value.draft?.sections) ? value : null;
  } catch {
    return null;
  }
}

/**
 * Unsaved edits of a template, kept in this browser as they are typed, so a phone call, a reload
 * or a refused save never loses them. `clean` is the saved version's draft: equal means nothing to keep.
 */
export function useStoredDraft(key: string, baseId: string | null, clean: TemplateDraft) {
  const [stored, setStored] = useState<StoredDraft>(() => read(key) ?? { baseId, draft: clean });
  const dirty = JSON.stringify(stored.draft) !== JSON.stringify(clean);
  useEffect(() => {
    try {
      if (dirty) localStorage.setItem(key, JSON.stringify(stored));
      else localStorage.removeItem(key);
    } catch {
      // Storage full or refused (private mode): the draft still lives on this screen.
    }
  }, [key, stored, dirty]);
  const setDraft = useCallback((update: (d: TemplateDraft) => TemplateDraft) => setStored((s) => ({ ...s, draft: update(s.draft) })), []);
  /** Back to a saved version (after a save, or to throw the edits away). */
  const reset = useCallback((nextBase: string | null, next: TemplateDraft) => setStored({ baseId: nextBase, draft: next }), []);
  return { draft: stored.draft, baseId: stored.baseId, dirty, setDraft, reset };
}
