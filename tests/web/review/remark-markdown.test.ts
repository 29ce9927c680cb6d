import { describe, expect, it } from 'vitest';
import { renderMarkdown } from '@api/reviews/markdown';
import { previewMarkdown } from '@web/components/review/remarkMarkdown';

// The writer's preview must show what the server will store (the server's renderer is the reference).
const samples = [
  'Rate for **N1**: see [the evaluation](https://example.test/jpl) and `k(T)`.',
  '<script>alert(1)</script> and <img src=x onerror=alert(1)>',
  '[click](javascript:alert(1)) or [mail](mailto:kofi.glasswort@example.test)',
  '- first\n- second\n\n1. one\n2. two',
  'Bare link https://example.test/data and an unclosed **bold',
];

describe('previewMarkdown', () => {
  it.each(samples)('renders %j exactly as the server does', (text) => {
    expect(previewMarkdown(text)).toBe(renderMarkdown(text));
  });

  it('shows raw HTML as text and drops script links', () => {
    const html = previewMarkdown('<script>alert(1)</script> [x](javascript:alert(1))');
    expect(html).not.toContain('<script>');
    expect(html).toContain('&lt;script&gt;');
    expect(html).not.toContain('href="javascript:');
  });
});
