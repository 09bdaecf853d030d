import { useState } from 'react';
import { isLocalWriteError } from '@/db/write-error';

/** Runs a local write; a refusal this phone made is kept to show, anything else is rethrown. */
export function useLocalSave() {
  const [refusal, setRefusal] = useState<string | null>(null);
  const [saving, setSaving] = useState(false);
  async function run(write: () => Promise<void>): Promise<boolean> {
    setSaving(true);
    setRefusal(null);
    try {
      await write();
      return true;
    } catch (error) {
      if (!isLocalWriteError(error)) throw error;
      setRefusal(error.message);
      return false;
    } finally {
      setSaving(false);
    }
  }
  return { refusal, saving, run };
}
