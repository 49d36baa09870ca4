import { type PipeTransform } from '@nestjs/common';
import { jsonProblem } from '@upstroke/contracts';
import type { z } from 'zod';
import { badRequest } from './errors';

export function issuesToDetails(error: z.ZodError): { path: string; message: string }[] {
  return error.issues.map((i) => ({
    path: i.path.map(String).join('.') || '(body)',
    message: i.message,
  }));
}

/**
 * Validates a body or query with a shared schema from @upstroke/contracts. Anything the
 * database cannot store (NUL, lone surrogates, nesting deeper than 20) is refused first,
 * except in batches (`perItem`), whose items are checked and refused one by one.
 */
export class ZodPipe<S extends z.ZodType> implements PipeTransform<unknown, z.infer<S>> {
  constructor(
    private readonly schema: S,
    private readonly options: { perItem?: boolean } = {},
  ) {}

  transform(value: unknown): z.infer<S> {
    const unsafe = this.options.perItem ? null : jsonProblem(value);
    if (unsafe) throw badRequest(unsafe, [{ path: unsafe.split(':')[0], message: unsafe }]);
    const result = this.schema.safeParse(value);
    if (result.success) return result.data;
    const details = issuesToDetails(result.error);
    const first = details[0];
    throw badRequest(first ? `${first.path}: ${first.message}` : 'Invalid request', details);
  }
}
