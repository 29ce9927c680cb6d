import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import type { Knex } from 'knex';
import * as mechanisms from '../mechanisms/mechanisms.queries';
import { createMechanism } from '../mechanisms/mechanisms.service';
import { assignReviewer, openRound } from '../reviews/rounds.service';
import * as users from '../users/users.queries';

const examplesDir = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..', 'examples');
const FIELD_STATION = 'rosalind.samphire@saltmarsh.example.test';
const CATALYSIS_GROUP = 'mei.tidewell@saltmarsh.example.test';
const REVIEWER = 'kofi.glasswort@saltmarsh.example.test';
const CURATOR = 'anouk.spartina@saltmarsh.example.test';
/** The mechanism the demo shows under review. */
const UNDER_REVIEW = 'salt-lake-bromine';

interface Example {
  slug: string;
  title: string;
  summary: string;
  tags: string[];
  ownerEmail: string;
  source: string;
}

function readExample(file: string): Example {
  const source = readFileSync(path.join(examplesDir, file), 'utf8');
  const summary = /^#\s*(.+)$/m.exec(source)?.[1] ?? '';
  const slug = file.replace(/\.steps$/, '');
  const tags = [['teaching', 'teaching'], ['field station', 'field-station'], ['catalysis', 'catalysis']]
    .filter(([word]) => summary.toLowerCase().includes(word)).map(([, tag]) => tag);
  return {
    slug, summary, tags, source,
    title: /^%title\s+(.+)$/m.exec(source)?.[1].trim() ?? slug,
    ownerEmail: tags.includes('catalysis') ? CATALYSIS_GROUP : FIELD_STATION,
  };
}

/** The example files as demo mechanisms (the deliberately faulty one left out); existing slugs are left alone. */
export async function seedMechanisms(db: Knex): Promise<void> {
  const files = readdirSync(examplesDir).filter((name) => name.endsWith('.steps') && name !== 'faulty.steps').sort();
  for (const example of files.map(readExample)) {
    if (await mechanisms.findBySlug(db, example.slug)) continue;
    const owner = (await users.findByEmail(db, example.ownerEmail))!;
    await createMechanism(db, owner, { ...example, visibility: 'public', changeNote: 'imported from the examples' });
    if (example.slug === UNDER_REVIEW) await openDemoRound(db, owner, example.slug);
  }
}

async function openDemoRound(db: Knex, owner: users.StoredUser, slug: string): Promise<void> {
  const curator = (await users.findByEmail(db, CURATOR))!;
  const reviewer = (await users.findByEmail(db, REVIEWER))!;
  const round = await openRound(db, owner, slug, undefined, 2);
  await assignReviewer(db, curator, round.id, reviewer.id);
}
