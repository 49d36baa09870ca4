import {
  type CreateProfileVersion,
  type ProtocolProfile,
  protocolProfileSchema,
} from '@upstroke/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '../../../lib/api-client';

export function createProfile(body: CreateProfileVersion) {
  return apiFetch('/protocol-profiles', { method: 'POST', body, schema: protocolProfileSchema });
}

/**
 * `onSaved` runs with the mutation, not the form: the refetch that follows remounts the form
 * on the new version, and a callback given to `mutate` would be dropped with it.
 */
export function useCreateProfile(onSaved?: (p: ProtocolProfile) => void) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: createProfile,
    onSuccess: (saved) => {
      onSaved?.(saved);
      return client.invalidateQueries({ queryKey: ['admin'] });
    },
  });
}
