import { type PipeTransform } from '@nestjs/common';
import type { z } from 'zod';
import { badRequest } from './errors';

export function issuesToDetails(error: z.ZodError): { path: string; message: string }[] {
  return error.issues.map((i) => ({
    path: i.path.map(String).join('.') || '(body)',
    message: i.message,
  }));
}

/** Validates a body or query with a shared schema from @upstroke/contracts. */
export class ZodPipe<S extends z.ZodType> implements PipeTransform<unknown, z.infer<S>> {
  constructor(private readonly schema: S) {}

  transform(value: unknown): z.infer<S> {
    const result = this.schema.safeParse(value);
    if (result.success) return result.data;
    const details = issuesToDetails(result.error);
    const first = details[0];
    throw badRequest(first ? `${first.path}: ${first.message}` : 'Invalid request', details);
  }
}
