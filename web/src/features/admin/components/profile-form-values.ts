import { zodResolver } from '@hookform/resolvers/zod';
import {
  type CreateProfileVersion,
  createProfileVersionSchema,
  needsConfirmation,
  type ProtocolProfile,
  type Thresholds,
  thresholdDefaults,
  thresholdKeys,
} from '@upstroke/contracts';
import type { Resolver } from 'react-hook-form';

/** The form's values: confirmations are kept for every field, ticked or not. */
export interface ProfileFormValues {
  siteId: string;
  name: string;
  thresholds: Thresholds;
  confirmations: Partial<Record<keyof Thresholds, { confirmed?: boolean; reason?: string }>>;
}

/** The body to send: confirmations only for values that need one (far from the default). */
export function profileBody(v: ProfileFormValues): CreateProfileVersion {
  const confirmations: Record<string, unknown> = {};
  for (const key of thresholdKeys) {
    const c = v.confirmations[key];
    if (c && needsConfirmation(key, v.thresholds[key]))
      confirmations[key] = {
        confirmed: c.confirmed === true ? true : c.confirmed,
        reason: c.reason ?? '',
      };
  }
  return { ...v, confirmations } as CreateProfileVersion;
}

const zod = zodResolver(createProfileVersionSchema);

/** The shared schema, applied to the body the form would send. */
export const profileResolver: Resolver<ProfileFormValues> = async (values, context, options) => {
  const result = await zod(profileBody(values), context, options as never);
  return result as unknown as Awaited<ReturnType<Resolver<ProfileFormValues>>>;
};

/** Starting values: the version the admin edits (with its reasons), or the guideline defaults. */
export function initialValues(siteId: string, basis: ProtocolProfile | null): ProfileFormValues {
  const confirmations: ProfileFormValues['confirmations'] = {};
  for (const [key, reason] of Object.entries(basis?.localSources ?? {}))
    confirmations[key as keyof Thresholds] = { confirmed: true, reason };
  return {
    siteId,
    name: basis?.name ?? 'Guideline defaults',
    thresholds: basis?.thresholds ?? thresholdDefaults,
    confirmations,
  };
}
