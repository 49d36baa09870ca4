import type { SetPassword } from '@upstroke/contracts';
import { useMutation } from '@tanstack/react-query';
import { z } from 'zod';
import { apiFetch } from '../../../lib/api-client';

export function setPassword(body: SetPassword) {
  return apiFetch('/auth/set-password', {
    method: 'POST',
    body,
    schema: z.object({ email: z.string() }),
  });
}

export function useSetPassword() {
  return useMutation({ mutationFn: setPassword });
}
