import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signedInAgent, type CsrfAgent } from '../helpers/agent';
import { BROMINE_R1, startReviewApp, WHO, type ReviewApp } from './review-helpers';

let t: ReviewApp;
let kofi: CsrfAgent;
let roundId: number;

beforeAll(async () => {
  t = await startReviewApp();
  const [owner, curator] = await Promise.all([WHO.owner, WHO.curator].map((email) => signedInAgent(t.url, email)));
  kofi = await signedInAgent(t.url, WHO.reviewer);
  const { slug } = (await owner.post('/api/mechanisms', { title: 'Remarks', source: BROMINE_R1 })).body;
  roundId = (await owner.post(`/api/mechanisms/${slug}/rounds`, {})).body.id;
  await curator.post(`/api/rounds/${roundId}/reviewers`, { userId: t.ids.get(WHO.reviewer) });
});
afterAll(async () => t.close());

describe('POST /api/rounds/:id/remarks', () => {
  it('answers 422 with the steps there are for a step that does not exist', async () => {
    const res = await kofi.post(`/api/rounds/${roundId}/remarks`, { step: 'B9', body: 'Where?' });
    expect(res.status).toBe(422);
    expect(res.body.error.details.available).toEqual(['B1', 'B2', 'B3', 'B4', 'B5']);
  });

  it('renders script injection inert and keeps only http, https and mailto links', async () => {
    const body = [
      '<script>alert(1)</script>',
      '<img src=x onerror="alert(2)">',
      '[click](javascript:alert(3)) [data](data:text/html;base64,PHNjcmlwdD4=) [ok](https://example.test/rates)',
      '[mail](mailto:kofi.glasswort@saltmarsh.example.test)',
    ].join('\n\n');
    const res = await kofi.post(`/api/rounds/${roundId}/remarks`, { step: 'B1', body });
    expect(res.status).toBe(201);
    const html: string = res.body.bodyHtml;
    expect(html).not.toMatch(/<script|<img|href="javascript|href="data:/i);
    expect(html).toContain('&lt;script&gt;alert(1)&lt;/script&gt;');
    expect(html).toContain('<a href="https://example.test/rates" rel="nofollow noopener noreferrer">ok</a>');
    expect(html).toContain('href="mailto:kofi.glasswort@saltmarsh.example.test"');
    expect(res.body.body).toBe(body);
  });

  it('accepts malformed Markdown and renders what it can', async () => {
    const res = await kofi.post(`/api/rounds/${roundId}/remarks`, { step: 'B3', body: '**unclosed [link](\n\n```\nno closing fence' });
    expect(res.status).toBe(201);
    expect(res.body.bodyHtml).toContain('**unclosed [link](');
    expect(res.body.bodyHtml).toContain('<code>no closing fence');
  });

  it('refuses an empty remark with 400 naming the field', async () => {
    const res = await kofi.post(`/api/rounds/${roundId}/remarks`, { step: 'B1', body: '   ' });
    expect(res.status).toBe(400);
    expect(res.body.error.details[0].path).toEqual(['body']);
  });
});
