import { adminUserSchema, type InviteUser } from '@upstroke/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '../../../lib/api-client';

export function inviteUser(body: InviteUser) {
  return apiFetch('/users', { method: 'POST', body, schema: adminUserSchema });
}

export function useInviteUser() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: inviteUser,
    onSuccess: () => client.invalidateQueries({ queryKey: ['admin'] }),
  });
}
