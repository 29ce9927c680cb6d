import { describe, expect, it } from 'vitest';
import { firstLineOf, summariseRemark } from '@web/components/review/remarkSummary';
import { demoRemark } from './review-fixtures';

const reply = { id: 1, remarkId: 21, body: 'ok', bodyHtml: '<p>ok</p>', authorId: 1, authorName: 'Rosalind Samphire', createdAt: '2026-11-21T09:00:00.000Z' };

describe('firstLineOf', () => {
  it.each([
    ['<p>Check the <strong>rate</strong> here</p>\n<p>Second</p>\n', 'Check the rate here'],
    ['<p>First line\nsame paragraph</p>\n', 'First line'],
    ['<h2>Heading</h2>\n<p>Body</p>', 'Heading'],
    ['<ul>\n<li>one</li>\n<li>two</li>\n</ul>\n', 'one'],
    ['<p>before<br>\nafter</p>', 'before'],
    ['<p><code>B2: Br• -&gt; 2 Br</code></p>', 'B2: Br• -> 2 Br'],
    ['', ''],
  ])('reads %j as %j', (html, expected) => {
    expect(firstLineOf(html)).toBe(expected);
  });

  it('runs nothing the HTML holds (an inert template)', () => {
    const before = document.body.innerHTML;
    expect(firstLineOf('<p>x<img src="nowhere" onerror="document.body.dataset.ran = \'yes\'"></p>')).toBe('x');
    expect(document.body.dataset.ran).toBeUndefined();
    expect(document.body.innerHTML).toBe(before);
  });
});

describe('summariseRemark', () => {
  it('counts replies in words and keeps the whole first line for the tooltip', () => {
    expect(summariseRemark(demoRemark()).replies).toBe('0 replies');
    expect(summariseRemark(demoRemark({ replies: [reply] })).replies).toBe('1 reply');
    const summary = summariseRemark(demoRemark({ state: 'settled', replies: [reply, { ...reply, id: 2 }] }));
    expect(summary).toMatchObject({ id: 21, author: 'Kofi Glasswort', firstLine: 'Check the rate', replies: '2 replies', state: 'settled' });
    expect(summary.hint).toBe('Check the rate\n(opens the thread in the Remarks section)');
  });
});
