import { type CreateProfileVersion, protocolProfileSchema } from '@upstroke/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '../../../lib/api-client';

export function createProfile(body: CreateProfileVersion) {
  return apiFetch('/protocol-profiles', { method: 'POST', body, schema: protocolProfileSchema });
}

export function useCreateProfile() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: createProfile,
    onSuccess: () => client.invalidateQueries({ queryKey: ['admin'] }),
  });
}
