import { apiFetch } from './api-client';
import { authStore } from './auth-store';

/**
 * Signs out on this tablet at once; the API is told so the sign-out is audited. Offline or
 * refused, the tablet is signed out all the same.
 */
export function signOut(): void {
  apiFetch('/auth/logout', { method: 'POST' }).catch(() => undefined);
  authStore.clear();
}
