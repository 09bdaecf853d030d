import '@testing-library/jest-dom/vitest';
import 'fake-indexeddb/auto';
import { cleanup, configure } from '@testing-library/react';
import { afterEach } from 'vitest';
import { roster } from '@/features/auth/members/roster';
import { tokenStore } from '@/features/auth/token-store';

// Screens other than Today load on demand; on a busy machine the first import of a page's code
// takes longer than the library's default second.
configure({ asyncUtilTimeout: 5000 });

afterEach(() => {
  cleanup();
  localStorage.clear();
  tokenStore.clear();
  roster.reload();
});
