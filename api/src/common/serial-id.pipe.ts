import { type PipeTransform } from '@nestjs/common';
import { badRequest } from './errors';

/**
 * A numeric path id (a `bigserial` key): digits within JavaScript's safe integers, else a
 * 400. Nest's ParseIntPipe lets `123456789012345678901234567890` through as 1.2e29, which
 * PostgreSQL then refuses with a 500.
 */
export class SerialIdPipe implements PipeTransform<string, number> {
  transform(value: string): number {
    const n = /^[1-9]\d{0,15}$/.test(value) ? Number(value) : NaN;
    if (!Number.isSafeInteger(n))
      throw badRequest(`id: must be a whole number from 1 to ${Number.MAX_SAFE_INTEGER}`, [
        { path: 'id', message: 'must be a whole number' },
      ]);
    return n;
  }
}
