import { Injectable } from '@nestjs/common';
import { type AuthUser, canSeeSite } from '../../common/auth.decorators';
import { badRequest, conflict, forbidden, notFound } from '../../common/errors';
import { type ResuscitationRow, ResuscitationsRepository } from './resuscitations.repository';

/** Who may read or write one record: site scope, role, ownership and the signature lock. */
@Injectable()
export class ResuscitationAccess {
  constructor(private readonly records: ResuscitationsRepository) {}

  async readable(user: AuthUser, id: string): Promise<ResuscitationRow> {
    const record = await this.records.findById(id);
    // A record on another site is reported as absent: its existence is not disclosed.
    if (!record || !canSeeSite(user, record.siteId)) throw notFound('Resuscitation');
    return record;
  }

  /** Clinical writes: leads on their sites; recorders on records they started. */
  async writable(user: AuthUser, id: string): Promise<ResuscitationRow> {
    const record = await this.readable(user, id);
    if (user.role !== 'lead' && user.role !== 'recorder')
      throw forbidden('Your role cannot change clinical records');
    if (user.role === 'recorder' && record.createdBy !== user.id && record.status !== 'open') {
      throw forbidden('Recorders can change only the records they started, or records still open');
    }
    if (record.status === 'signed')
      throw conflict('This record is signed and locked; add an amendment instead');
    return record;
  }

  /**
   * The site a discard of refused entries belongs to: the record's own, or (for a record the
   * server never received, its start having been refused) the site the tablet names, which
   * must be one of the user's. A record of another site stays absent (404).
   */
  async discardSite(
    user: AuthUser,
    id: string,
    siteId?: string,
  ): Promise<{ siteId: string; onServer: boolean }> {
    const record = await this.records.findById(id);
    if (record) {
      if (!canSeeSite(user, record.siteId)) throw notFound('Resuscitation');
      return { siteId: record.siteId, onServer: true };
    }
    if (!siteId) throw badRequest('siteId: required for a record the server never received');
    if (!canSeeSite(user, siteId)) throw forbidden('siteId: not one of your sites');
    return { siteId, onServer: false };
  }
}
