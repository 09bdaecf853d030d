import { describe, expect, it } from 'vitest';
import { requestPersistentStorage } from './persist';

const storage = (persisted: boolean, grants: boolean) =>
  ({ persisted: async () => persisted, persist: async () => grants }) as unknown as StorageManager;

describe('persistent storage', () => {
  it('asks only when not yet granted, and reports a refusal', async () => {
    expect(await requestPersistentStorage(storage(true, false))).toBe('persisted');
    expect(await requestPersistentStorage(storage(false, true))).toBe('persisted');
    expect(await requestPersistentStorage(storage(false, false))).toBe('refused');
    expect(await requestPersistentStorage(undefined)).toBe('unsupported');
  });
});
