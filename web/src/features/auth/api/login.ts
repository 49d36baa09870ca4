import { type LoginRequest, loginResponseSchema } from '@upstroke/contracts';
import { useMutation } from '@tanstack/react-query';
import { apiFetch } from '../../../lib/api-client';
import { authStore } from '../../../lib/auth-store';

export function login(body: LoginRequest) {
  return apiFetch('/auth/login', { method: 'POST', body, schema: loginResponseSchema });
}

export function useLogin() {
  return useMutation({ mutationFn: login, onSuccess: (session) => authStore.set(session) });
}
