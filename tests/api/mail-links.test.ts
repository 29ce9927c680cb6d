import { describe, expect, it } from 'vitest';
import { absoluteLinks } from '@api/mail/mail-transport';

describe('absoluteLinks', () => {
  it('turns app-relative mechanism links into full addresses and leaves other text alone', () => {
    const text = 'Open it in Cyclewright: /m/salt-lake/r/2\n\n/m/x/r/1\nSee a/m/b and /other/path.';
    expect(absoluteLinks(text, 'https://cw.example.test/')).toBe(
      'Open it in Cyclewright: https://cw.example.test/m/salt-lake/r/2\n\nhttps://cw.example.test/m/x/r/1\nSee a/m/b and /other/path.',
    );
  });

  it('keeps the text as it is without a public address', () => {
    expect(absoluteLinks('/m/a/r/1', undefined)).toBe('/m/a/r/1');
  });
});
