import type { ReactNode } from 'react';
import { Navigate, useLocation } from 'react-router-dom';
import { useAuthState } from '@/features/auth/use-auth';
import { paths } from './paths';

/** Sends a visitor with no stored session to sign-in, remembering where they were going. */
export function RequireAuth({ children }: { children: ReactNode }) {
  const { session } = useAuthState();
  const { pathname, search } = useLocation();
  if (!session) return <Navigate to={paths.signIn.href(pathname + search)} replace />;
  return children;
}
