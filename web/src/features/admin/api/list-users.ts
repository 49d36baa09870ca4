import { adminUserSchema, listSchema } from '@upstroke/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '../../../lib/api-client';

export const usersKey = ['admin', 'users'] as const;

export function listUsers() {
  return apiFetch('/users', { schema: listSchema(adminUserSchema) });
}

export const usersQuery = () => queryOptions({ queryKey: usersKey, queryFn: listUsers });

export function useUsers() {
  return useQuery(usersQuery());
}
