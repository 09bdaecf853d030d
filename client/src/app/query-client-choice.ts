import { createContext } from 'react';
import type { QueryClient } from '@tanstack/react-query';

/**
 * A query client chosen above the screens (a test's fresh one); null for the app's own. A plain
 * context, so that choosing one loads no query code with the entry.
 */
export const QueryClientChoice = createContext<QueryClient | null>(null);
