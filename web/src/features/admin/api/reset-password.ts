import { adminUserSchema } from '@upstroke/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '../../../lib/api-client';

export function resetPassword(id: string) {
  return apiFetch(`/users/${id}/reset-password`, { method: 'POST', schema: adminUserSchema });
}

export function useResetPassword() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: resetPassword,
    onSuccess: () => client.invalidateQueries({ queryKey: ['admin'] }),
  });
}
