import { adminUserSchema, type UpdateUser } from '@upstroke/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '../../../lib/api-client';
import { usersKey } from './list-users';

export function updateUser({ id, ...body }: UpdateUser & { id: string }) {
  return apiFetch(`/users/${id}`, { method: 'PATCH', body, schema: adminUserSchema });
}

export function useUpdateUser() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: updateUser,
    onSuccess: () => client.invalidateQueries({ queryKey: usersKey }),
  });
}
