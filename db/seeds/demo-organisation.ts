import bcrypt from 'bcryptjs';
import type { Knex } from 'knex';
import { thresholdDefaults } from '@upstroke/contracts';
import { stableId } from '../src/ids';

/** Invented demo organisation: Kestrel Bay Regional Hospital (no real people or data). */
export const demoPassword = 'upstroke-demo';
export const demoSiteId = stableId('site:kestrel-bay');
export const demoUnits = ['Emergency', 'ICU North', 'Ward 6B'].map((name) => ({
  id: stableId(`unit:${name}`),
  name,
}));
export const demoUsers = [
  { email: 'recorder@kestrel.test', name: 'Rowan Tally (RN)', role: 'recorder' },
  { email: 'lead@kestrel.test', name: 'Dr Imogen Caskey', role: 'lead' },
  { email: 'quality@kestrel.test', name: 'Priya Marwood (Resuscitation Officer)', role: 'quality' },
  { email: 'admin@kestrel.test', name: 'Theo Brannigan (Clinical Systems)', role: 'admin' },
].map((u) => ({ ...u, id: stableId(`user:${u.email}`) }));
export const demoProfileId = stableId('profile:kestrel-bay:1');

/** Inserts the organisation when absent; never overwrites what an admin has changed. */
export async function seedOrganisation(knex: Knex): Promise<void> {
  await knex('sites')
    .insert({
      id: demoSiteId,
      name: 'Kestrel Bay Regional Hospital',
      etco2_unit: 'mmHg',
      paper_size: 'A4',
      locale: 'en-GB',
      time_zone: 'Europe/London',
      clock: '24h',
      mail_domains: ['kestrel.test'],
    })
    .onConflict('id')
    .ignore();
  await knex('units')
    .insert(demoUnits.map((u) => ({ ...u, site_id: demoSiteId })))
    .onConflict('id')
    .ignore();
  const hash = await bcrypt.hash(demoPassword, 10);
  await knex('users')
    .insert(demoUsers.map((u) => ({ ...u, password_hash: hash })))
    .onConflict('id')
    .ignore();
  await knex('user_sites')
    .insert(demoUsers.map((u) => ({ user_id: u.id, site_id: demoSiteId })))
    .onConflict(['user_id', 'site_id'])
    .ignore();
  await knex('protocol_profiles')
    .insert({
      id: demoProfileId,
      site_id: demoSiteId,
      version: 1,
      name: 'Guideline defaults',
      thresholds: JSON.stringify(thresholdDefaults),
    })
    .onConflict('id')
    .ignore();
}
