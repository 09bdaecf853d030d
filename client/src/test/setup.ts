import '@testing-library/jest-dom/vitest';
import 'fake-indexeddb/auto';
import { cleanup } from '@testing-library/react';
import { afterEach } from 'vitest';
import { tokenStore } from '@/features/auth/token-store';

afterEach(() => {
  cleanup();
  localStorage.clear();
  tokenStore.clear();
});
