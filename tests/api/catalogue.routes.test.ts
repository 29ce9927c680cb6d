import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { seedCatalogue } from '@api/catalogue/catalogue-seed';
import { THERMO_RECORDS } from '@api/chemistry/thermo-data';
import { seedPeople } from '@api/seed/seed-people';
import { csrfAgent, signedInAgent, type CsrfAgent } from '../helpers/agent';
import { startTestApp, type TestApp } from '../helpers/test-app';

const CURATOR = 'anouk.spartina@saltmarsh.example.test';
const AUTHOR = 'rosalind.samphire@saltmarsh.example.test';
const INSTRUCTOR = 'bram.sedge@saltmarsh.example.test';

let t: TestApp;
let curator: CsrfAgent;
let author: CsrfAgent;

beforeAll(async () => {
  t = await startTestApp();
  await seedPeople(t.db);
  await seedCatalogue(t.db);
  curator = await signedInAgent(t.url, CURATOR);
  author = await signedInAgent(t.url, AUTHOR);
});
afterAll(async () => t.close());

const ozoneId = async () => (await author.get('/api/catalogue?q=O3')).body.items[0].id as number;

describe('GET /api/catalogue', () => {
  it('answers 401 to a signed-out visitor', async () => {
    expect((await (await csrfAgent(t.url)).get('/api/catalogue')).status).toBe(401);
  });

  it('lists the seeded table and finds by formula, exact match first, and by name', async () => {
    const all = await author.get('/api/catalogue?pageSize=200');
    expect(all.body.total).toBe(THERMO_RECORDS.length);
    expect(all.body.total).toBeGreaterThanOrEqual(60); // the floor for the built-in table
    const byFormula = await author.get('/api/catalogue?q=O3');
    expect(byFormula.body.items[0]).toMatchObject({ formula: 'O3', name: 'ozone', charge: 0, state: null });
    const byName = await author.get('/api/catalogue?q=hydroperoxyl');
    expect(byName.body.items.map((e: { formula: string }) => e.formula)).toEqual(['HO2']);
  });

  it('finds entries whose structure holds a SMILES fragment (openchemlib substructure search)', async () => {
    // The O–O single bond: H2O2, HO2 and the peroxides hold it; O3 ([O-][O+]=O) too; O=O is a double bond.
    const res = await author.get(`/api/catalogue?substructure=${encodeURIComponent('OO')}&pageSize=200`);
    const formulas = res.body.items.map((e: { formula: string }) => e.formula);
    expect(formulas).toEqual(expect.arrayContaining(['H2O2', 'HO2', 'O3']));
    expect(formulas).not.toContain('O2');
    expect(formulas).not.toContain('H2O');
  });

  it('refuses a substructure that does not parse, naming the query field', async () => {
    const res = await author.get(`/api/catalogue?substructure=${encodeURIComponent('C(C')}`);
    expect(res.status).toBe(422);
    expect(res.body.error).toMatchObject({ code: 'SMILES_INVALID', details: { field: 'substructure' } });
  });
});

describe('GET /api/catalogue/:id', () => {
  // Ozone's Lewis structure O⁻–O⁺=O: formal charges −1, +1, 0 (Atkins & Jones, Chemical Principles,
  // formal-charge worked example for O3 — from memory).
  it('gives ozone formal charges −1, +1, 0 and no unpaired electrons', async () => {
    const res = await author.get(`/api/catalogue/${await ozoneId()}`);
    expect(res.body.structure.formalCharges.map((a: { charge: number }) => a.charge)).toEqual([-1, 1, 0]);
    expect(res.body.structure).toMatchObject({ formula: 'O3', charge: 0, unpairedElectrons: 0, oddElectrons: false });
  });

  it('serves a depiction as SVG that shows the charges', async () => {
    const res = await author.get(`/api/catalogue/${await ozoneId()}/depiction.svg`).responseType('blob');
    expect(res.headers['content-type']).toMatch(/^image\/svg\+xml/);
    const svg = (res.body as Buffer).toString('utf8');
    expect(svg).toMatch(/^<svg id="species-\d+"/);
    expect(svg).toMatch(/>\+<\/text>/);
  });

  it('answers 404 for a missing entry', async () => {
    expect((await author.get('/api/catalogue/999999')).status).toBe(404);
  });
});

describe('POST /api/catalogue', () => {
  const chlorite = { name: 'chlorite ion', formula: 'ClO2(aq)^-', smiles: '[O-][Cl]=O', dfH: -66.5, dfHUncertainty: null, dfHSource: 'NBS tables (1982) — from memory' };

  it('answers 403 to everyone but curators', async () => {
    for (const email of [AUTHOR, INSTRUCTOR]) {
      const res = await (await signedInAgent(t.url, email)).post('/api/catalogue', chlorite);
      expect(res.status).toBe(403);
    }
  });

  it('lets a curator add an entry, reads charge and state from the formula, and records it in the audit log', async () => {
    const res = await curator.post('/api/catalogue', chlorite);
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ formula: 'ClO2(aq)^-', charge: -1, state: 'aq', dfH: -66.5 });
    const audit = await t.db('audit_log').where({ subject_type: 'catalogue-entry', subject_id: String(res.body.id) });
    expect(audit.map((row) => row.action)).toEqual(['catalogue.entry-created']);
  });

  it.each([
    ['a SMILES that does not parse', { smiles: 'C(C' }, 'SMILES_INVALID', 'smiles'],
    ['a structure of another formula', { smiles: 'O=[Cl]O' }, 'STRUCTURE_MISMATCH', 'smiles'],
    ['a structure of another charge', { smiles: 'O=[Cl][O]' }, 'STRUCTURE_MISMATCH', 'smiles'],
    ['a formula the notation does not read', { formula: 'Xq2' }, 'PARSE_FAILED', 'formula'],
  ])('refuses %s with 422 naming the field', async (_what, change, code, field) => {
    const res = await curator.post('/api/catalogue', { ...chlorite, formula: 'ClO2^-', ...change });
    expect(res.status).toBe(422);
    expect(res.body.error).toMatchObject({ code, details: { field } });
    expect(res.body.error.message).toContain(field);
  });

  it('refuses an enthalpy without a source (400 naming dfHSource) and a species already there (409)', async () => {
    const noSource = await curator.post('/api/catalogue', { ...chlorite, formula: 'ClO2^-', dfHSource: null });
    expect(noSource.status).toBe(400);
    expect(noSource.body.error.details[0].path).toEqual(['dfHSource']);
    const twice = await curator.post('/api/catalogue', { name: 'ozone again', formula: 'O3' });
    expect(twice.status).toBe(409);
    expect(twice.body.error.details.field).toBe('formula');
  });
});

describe('PATCH /api/catalogue/:id and later analyses', () => {
  const text = 'B1: Br• + O3 -> BrO• + O2 @ 1.7e-11 * exp(-800 / T)\n';

  it('changes ΔH of later analyses, which record the catalogue value they used', async () => {
    const before = (await author.post('/api/analyse', { text })).body.steps[0];
    const id = await ozoneId();
    const res = await curator.patch(`/api/catalogue/${id}`, { dfH: 150, dfHSource: 'curator test value' });
    expect(res.status).toBe(200);
    const after = (await author.post('/api/analyse', { text })).body.steps[0];
    // ΔH = ΔfH(BrO) + ΔfH(O2) − ΔfH(Br) − ΔfH(O3): raising ΔfH(O3) by δ lowers ΔH by δ.
    expect(after.dH).toBeCloseTo(before.dH - (150 - 142.674), 6);
    const ozone = after.usedEnthalpies.find((entry: { key: string }) => entry.key === 'O3');
    expect(ozone).toMatchObject({ dfH: 150, source: `curator test value [catalogue entry ${id}]` });
    const audit = await t.db('audit_log').where({ subject_type: 'catalogue-entry', subject_id: String(id) });
    expect(audit[0].details).toEqual({ before: { dfH: 142.674, dfHSource: expect.any(String) }, after: { dfH: 150, dfHSource: 'curator test value' } });
  });

  it('uses the catalogue for saved revisions too', async () => {
    const created = await author.post('/api/mechanisms', { title: 'Catalogue check', source: text });
    const revision = await author.get(`/api/mechanisms/${created.body.slug}/revisions/1`);
    expect(revision.body.analysis.steps[0].usedEnthalpies.find((e: { key: string }) => e.key === 'O3').dfH).toBe(150);
  });

  it('checks the structure again when the formula changes', async () => {
    const res = await curator.patch(`/api/catalogue/${await ozoneId()}`, { formula: 'O2' });
    expect(res.status).toBe(422);
    expect(res.body.error).toMatchObject({ code: 'STRUCTURE_MISMATCH', details: { field: 'smiles' } });
  });

  it('answers 403 to an author', async () => {
    expect((await author.patch(`/api/catalogue/${await ozoneId()}`, { notes: 'mine' })).status).toBe(403);
  });
});
