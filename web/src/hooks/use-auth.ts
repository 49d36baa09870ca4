import type { Role, User } from '@upstroke/contracts';
import { useSyncExternalStore } from 'react';
import { authStore } from '../lib/auth-store';
import { signOut } from '../lib/sign-out';

export interface Auth {
  user: User | null;
  signOut: () => void;
  hasRole: (...roles: Role[]) => boolean;
}

/** The signed-in user (or null), re-rendering on sign-in and sign-out. */
export function useAuth(): Auth {
  const session = useSyncExternalStore(authStore.subscribe, authStore.get);
  const user = session?.user ?? null;
  return {
    user,
    signOut,
    hasRole: (...roles) => Boolean(user && roles.includes(user.role)),
  };
}
