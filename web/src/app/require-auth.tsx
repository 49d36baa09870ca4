import type { Role } from '@upstroke/contracts';
import type { ReactNode } from 'react';
import { Navigate, useLocation } from 'react-router-dom';
import { useAuth } from '../hooks/use-auth';
import { homeFor } from './nav';
import { ForbiddenPage } from './routes/not-found';

/** Sends signed-out users to Sign in, and refuses a screen the role may not use. */
export function RequireAuth({ roles, children }: { roles?: Role[]; children: ReactNode }) {
  const { user } = useAuth();
  const location = useLocation();
  if (!user) return <Navigate to="/sign-in" replace state={{ from: location.pathname }} />;
  if (roles && !roles.includes(user.role)) {
    if (location.pathname === '/') return <Navigate to={homeFor(user.role)} replace />;
    return <ForbiddenPage />;
  }
  return <>{children}</>;
}
