import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signedInAgent, type CsrfAgent } from '../helpers/agent';
import { BROMINE_R1, startReviewApp, WHO, type ReviewApp } from './review-helpers';

let t: ReviewApp;
let rosalind: CsrfAgent;
let mei: CsrfAgent;
let curator: CsrfAgent;

const IODIDE = `I1: H2O2 + I^- -> H2O + IO^-
I2: H2O2 + IO^- -> H2O + O2 + I^-
`;
const CO_ON_PT = `S1: CO + * -> CO*
S2: O2 + 2 * -> 2 O*
S3: CO* + O* -> CO2 + 2 *
`;

const slugsOf = async (client: CsrfAgent, query: string) =>
  (await client.get(`/api/mechanisms${query}`)).body.items.map((m: { slug: string }) => m.slug);

beforeAll(async () => {
  t = await startReviewApp();
  [rosalind, mei, curator] = await Promise.all([WHO.owner, WHO.secondReviewer, WHO.curator].map((email) => signedInAgent(t.url, email)));
  await rosalind.post('/api/mechanisms', { title: 'Salt-lake bromine cycle', summary: 'Bromine explosion over a salt lake at sunrise.', tags: ['halogens', 'field-station'], source: BROMINE_R1 });
  await mei.post('/api/mechanisms', { title: 'Iodide-catalysed peroxide decomposition', summary: 'Hydrogen peroxide decomposes; iodide is regenerated.', tags: ['aqueous', 'teaching'], source: IODIDE });
  await mei.post('/api/mechanisms', { title: 'CO oxidation on a platinum-group surface', summary: 'Langmuir–Hinshelwood steps on surface sites.', tags: ['surface'], visibility: 'private', source: CO_ON_PT });
  await rosalind.post('/api/mechanisms/salt-lake-bromine-cycle/rounds', {});
});
afterAll(async () => t.close());

describe('GET /api/people', () => {
  it('finds people by name and role, without their e-mail addresses', async () => {
    const res = await rosalind.get('/api/people?q=ti&role=reviewer');
    expect(res.body).toEqual([{ id: t.ids.get(WHO.secondReviewer), name: 'Mei Tidewell', roles: ['author', 'reviewer'] }]);
    expect((await rosalind.get('/api/people?role=owner')).status).toBe(400);
  });
});

describe('GET /api/mechanisms', () => {
  it('searches titles and summaries with PostgreSQL text search (stemmed words)', async () => {
    expect(await slugsOf(rosalind, '?q=decomposes')).toEqual(['iodide-catalysed-peroxide-decomposition']);
    expect(await slugsOf(rosalind, '?q=explosions')).toEqual(['salt-lake-bromine-cycle']);
    expect(await slugsOf(rosalind, '?q=surface')).toEqual([]);
    expect(await slugsOf(curator, '?q=surface')).toEqual(['co-oxidation-on-a-platinum-group-surface']);
  });

  it('finds the mechanisms that contain a species, by its canonical key', async () => {
    expect(await slugsOf(rosalind, `?species=${encodeURIComponent('I^-')}`)).toEqual(['iodide-catalysed-peroxide-decomposition']);
    expect(await slugsOf(rosalind, `?species=${encodeURIComponent('Br•')}`)).toEqual(['salt-lake-bromine-cycle']);
    expect(await slugsOf(rosalind, '?species=BrO.')).toEqual(['salt-lake-bromine-cycle']);
    expect(await slugsOf(mei, '?species=CO*')).toEqual(['co-oxidation-on-a-platinum-group-surface']);
    expect(await slugsOf(rosalind, '?species=CO*')).toEqual([]);
  });

  it('finds by plain words a species or a step label of the latest revision, as the header box promises', async () => {
    expect(await slugsOf(rosalind, `?q=${encodeURIComponent('BrO•')}`)).toEqual(['salt-lake-bromine-cycle']);
    expect(await slugsOf(rosalind, '?q=Br.')).toEqual(['salt-lake-bromine-cycle']);
    expect(await slugsOf(rosalind, `?q=${encodeURIComponent('IO^-')}`)).toEqual(['iodide-catalysed-peroxide-decomposition']);
    expect(await slugsOf(rosalind, '?q=i2')).toEqual(['iodide-catalysed-peroxide-decomposition']);
    // A private mechanism's species stays hidden from someone who cannot see it.
    expect(await slugsOf(rosalind, '?q=CO*')).toEqual([]);
    expect(await slugsOf(mei, '?q=CO*')).toEqual(['co-oxidation-on-a-platinum-group-surface']);
    expect(await slugsOf(rosalind, '?q=Xq')).toEqual([]);
  });

  it('filters by tag, author, visibility and round state', async () => {
    expect(await slugsOf(curator, '?tag=teaching')).toEqual(['iodide-catalysed-peroxide-decomposition']);
    expect((await slugsOf(curator, `?author=${t.ids.get(WHO.secondReviewer)}`)).sort()).toEqual(['co-oxidation-on-a-platinum-group-surface', 'iodide-catalysed-peroxide-decomposition']);
    expect(await slugsOf(curator, '?visibility=private')).toEqual(['co-oxidation-on-a-platinum-group-surface']);
    expect(await slugsOf(curator, '?state=open')).toEqual(['salt-lake-bromine-cycle']);
    expect((await slugsOf(curator, '?state=none')).length).toBe(2);
  });

  it('sorts and pages, and reports the total', async () => {
    const byTitle = await curator.get('/api/mechanisms?sort=title&pageSize=2');
    expect(byTitle.body).toMatchObject({ total: 3, page: 1, pageSize: 2 });
    expect(byTitle.body.items.map((m: { title: string }) => m.title)).toEqual(['CO oxidation on a platinum-group surface', 'Iodide-catalysed peroxide decomposition']);
    const page2 = await curator.get('/api/mechanisms?sort=title&pageSize=2&page=2');
    expect(page2.body.items.map((m: { title: string }) => m.title)).toEqual(['Salt-lake bromine cycle']);
    const reversed = await slugsOf(curator, '?sort=title&order=desc');
    expect(reversed[0]).toBe('salt-lake-bromine-cycle');
  });

  it('gives each item its step and species counts from the latest revision', async () => {
    const [item] = (await curator.get('/api/mechanisms?tag=teaching')).body.items;
    // I1, I2 over H2O2, I^-, H2O, IO^-, O2.
    expect(item).toMatchObject({ stepCount: 2, speciesCount: 5, roundState: null, referenceRevision: null });
  });

  it('rejects a bad filter with 400 naming it', async () => {
    const res = await curator.get('/api/mechanisms?state=pending&pageSize=1000');
    expect(res.status).toBe(400);
    expect(res.body.error.details.map((d: { path: string[] }) => d.path[0]).sort()).toEqual(['pageSize', 'state']);
  });
});
