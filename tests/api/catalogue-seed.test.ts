import { MF } from 'mf-parser';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { seedCatalogue } from '@api/catalogue/catalogue-seed';
import * as catalogue from '@api/catalogue/catalogue.queries';
import { getEntry } from '@api/catalogue/catalogue.service';
import { checkStructureMatches, parseSmiles } from '@api/chemistry/structure';
import { THERMO_RECORDS } from '@api/chemistry/thermo-data';
import { parseThermoKey } from '@api/chemistry/thermo-key';
import { DEMO_SET_TITLE } from '@api/sets/sets-seed';
import { seedDemo } from '@api/seed/seed-demo';
import { startTestApp, type TestApp } from '../helpers/test-app';

let t: TestApp;
let rows: catalogue.CatalogueRow[];

beforeAll(async () => {
  t = await startTestApp();
  await seedDemo(t.db);
  await seedDemo(t.db);
  rows = await catalogue.search(t.db, undefined);
});
afterAll(async () => t.close());

/** Elements of a written formula counted by mf-parser (an outside formula library), and the written charge. */
function writtenElements(formula: string): { elements: Record<string, number>; charge: number } {
  const parts = parseThermoKey(formula)!;
  const match = /^(\d*)([+-])$/.exec(parts.charge);
  const charge = match ? (match[2] === '-' ? -1 : 1) * Number(match[1] || 1) : 0;
  return { elements: new MF(parts.formula).getInfo().atoms as Record<string, number>, charge };
}

describe('the seeded catalogue', () => {
  it('holds every built-in record once, even when seeded twice', async () => {
    expect(rows).toHaveLength(THERMO_RECORDS.length);
    expect(await seedCatalogue(t.db)).toBe(0);
  });

  it('keeps each value and its source', () => {
    for (const record of THERMO_RECORDS) {
      const row = rows.find((r) => r.formula === record.key)!;
      expect([row.name, row.dfH, row.dfHUncertainty, row.dfHSource]).toEqual([record.name, record.dfH, record.uncertainty, record.source]);
    }
  });

  it('has structures that openchemlib reads with the formula (mf-parser) and charge written for each entry', () => {
    const withStructure = rows.filter((row) => row.smiles !== null);
    expect(withStructure.length).toBeGreaterThan(90);
    for (const row of withStructure) {
      const { elements, charge } = writtenElements(row.formula);
      expect(checkStructureMatches(row.smiles!, elements, charge), `${row.formula} ${row.smiles}`).toEqual([]);
      expect(row.charge, row.formula).toBe(charge);
    }
  });

  // Radicals have an odd electron count (common practice); openchemlib counts Σ Z − charge.
  it('marks the radicals of the table as odd-electron structures', () => {
    const radicals = rows.filter((r) => ['OH', 'HO2', 'NO', 'NO2', 'ClO', 'BrO', 'CH3O2'].includes(r.formula) && r.smiles);
    expect(radicals.length).toBeGreaterThanOrEqual(6);
    for (const row of radicals) expect(parseSmiles(row.smiles!).oddElectrons, row.formula).toBe(true);
  });

  // Formal charges of Lewis structures: ozone O⁻–O⁺=O and nitrate (one N⁺, two O⁻) — Atkins & Jones,
  // Chemical Principles, formal-charge examples; nitrous oxide N⁻=N⁺=O — Housecroft & Sharpe,
  // Inorganic Chemistry, resonance structures of N2O (all from memory).
  it.each([
    ['O3', [-1, 1, 0]],
    ['N2O', [-1, 1, 0]],
    ['NO3(aq)^-', [-1, 1, 0, -1]],
  ])('gives %s the textbook formal charges %j', async (formula, charges) => {
    const row = rows.find((r) => r.formula === formula)!;
    const entry = await getEntry(t.db, row.id);
    expect(entry.structure!.formalCharges.map((atom) => atom.charge)).toEqual(charges);
  });
});

describe('the demo set', () => {
  it('is built once by the teaching unit from the demo mechanisms, in course order', async () => {
    const sets = await t.db('mechanism_sets as s').join('users as u', 'u.id', 's.owner_id').select('s.id', 's.title', 'u.email');
    expect(sets.map(({ title, email }) => ({ title, email }))).toEqual([{ title: DEMO_SET_TITLE, email: 'bram.sedge@saltmarsh.example.test' }]);
    const items = await t.db('mechanism_set_items as i').join('mechanisms as m', 'm.id', 'i.mechanism_id').where('i.set_id', sets[0].id).orderBy('i.position').pluck('m.slug');
    expect(items).toEqual(['stratospheric-nox', 'clo-dimer', 'hydrogen-bromine-chain']);
  });
});
