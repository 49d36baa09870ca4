import { PLAUSIBLE } from '@upstroke/contracts';
import { badRequest } from '../../common/errors';

/** Says which header is at fault, so the tablet can tell a wrong clock from a bad item. */
export const CLOCK_OFFSET_HEADER = 'X-Clock-Offset-Ms';

/**
 * The tablet's clock minus the server's (ms), as the tablet measured it. Beyond a day the
 * tablet's date or time is wrong: the batch is refused whole (nothing stored) so the tablet
 * keeps its entries and asks the recorder to check its clock.
 */
export function clockOffsetOf(header: string | undefined): number | undefined {
  if (header === undefined || header === '') return undefined;
  const value = /^[+-]?\d{1,15}(\.\d+)?$/.test(header.trim()) ? Number(header) : NaN;
  const max = PLAUSIBLE.clockOffsetMs;
  if (!Number.isFinite(value) || Math.abs(value) > max) {
    const message = `the tablet's clock differs from the server's by more than 24 h (or the value is not a number of ms): check the tablet's date and time`;
    throw badRequest(`${CLOCK_OFFSET_HEADER}: ${message}`, [
      { path: CLOCK_OFFSET_HEADER, message },
    ]);
  }
  return Math.round(value);
}
