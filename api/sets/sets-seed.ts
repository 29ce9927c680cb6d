import type { Knex } from 'knex';
import * as mechanisms from '../mechanisms/mechanisms.queries';
import * as users from '../users/users.queries';
import * as sets from './sets.queries';
import { createSet } from './sets.service';

const TEACHING_UNIT = 'bram.sedge@saltmarsh.example.test';
export const DEMO_SET_TITLE = 'Radical chains and catalytic cycles';

/** The teaching unit's course order: a catalytic cycle, a dimer cycle, then a chain reaction. */
const DEMO_ITEMS = [
  { slug: 'stratospheric-nox', note: 'Start here: find the route that destroys odd oxygen and name the catalyst.' },
  { slug: 'clo-dimer', note: 'Compare with the NOx cycle: which species plays the catalyst now?' },
  { slug: 'hydrogen-bromine-chain', note: 'Classify each step (initiation, propagation, termination) before looking at the routes.' },
];

/**
 * The teaching unit's demo set, built by Bram Sedge from the demo mechanisms that exist (their
 * latest revisions). Left alone when he already has a set of that title; skipped without them.
 */
export async function seedDemoSet(db: Knex): Promise<void> {
  const instructor = await users.findByEmail(db, TEACHING_UNIT);
  if (!instructor) return;
  if (await sets.findByOwnerAndTitle(db, instructor.id, DEMO_SET_TITLE)) return;
  const items = [];
  for (const item of DEMO_ITEMS) {
    const mechanism = await mechanisms.findBySlug(db, item.slug);
    if (mechanism) items.push({ mechanism: item.slug, revision: mechanism.latestRevisionNumber, note: item.note });
  }
  if (items.length === 0) return;
  await createSet(db, instructor, { title: DEMO_SET_TITLE, audience: 'Short professional course, Saltmarsh teaching unit', items });
}
