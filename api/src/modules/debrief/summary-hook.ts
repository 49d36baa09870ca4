import { Injectable } from '@nestjs/common';
import type { Db } from '../../db/knex';

/**
 * Writes the per-record summary row (trends read it instead of raw samples) inside the
 * signing or amending transaction. Delegates to the summaries module once it exists.
 */
@Injectable()
export class SummaryHook {
  async write(_resuscitationId: string, _trx?: Db): Promise<void> {
    // Not wired yet: SummariesModule (issue 7) has not landed.
  }
}
