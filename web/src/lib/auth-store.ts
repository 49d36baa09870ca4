import type { LoginResponse } from '@upstroke/contracts';

const key = 'upstroke.auth';
type Listener = () => void;
const listeners = new Set<Listener>();

function read(): LoginResponse | null {
  try {
    const raw = localStorage.getItem(key);
    return raw ? (JSON.parse(raw) as LoginResponse) : null;
  } catch {
    return null;
  }
}

let current = read();

/**
 * The signed-in session, kept in localStorage so that a tablet reopened offline still knows
 * who is recording. Subscribers (React, the sync engine) hear every change.
 */
export const authStore = {
  get: () => current,
  set(session: LoginResponse) {
    current = session;
    localStorage.setItem(key, JSON.stringify(session));
    listeners.forEach((l) => l());
  },
  clear() {
    current = null;
    localStorage.removeItem(key);
    listeners.forEach((l) => l());
  },
  subscribe(listener: Listener) {
    listeners.add(listener);
    return () => {
      listeners.delete(listener);
    };
  },
};
