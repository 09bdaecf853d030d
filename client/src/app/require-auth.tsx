import type { ReactNode } from 'react';
import { Navigate, useLocation } from 'react-router-dom';
import { anyoneByPin } from '@/features/auth/members/roster';
import { useAuthState } from '@/features/auth/use-auth';
import { paths } from './paths';

/** Sends a visitor with no stored session to sign-in (or Switch member), remembering where they were going. */
export function RequireAuth({ children }: { children: ReactNode }) {
  const { session } = useAuthState();
  const { pathname, search } = useLocation();
  // On a shared device the next person picks their name and PIN rather than typing a password.
  if (!session) return <Navigate to={(anyoneByPin() ? paths.members : paths.signIn).href(pathname + search)} replace />;
  return children;
}
