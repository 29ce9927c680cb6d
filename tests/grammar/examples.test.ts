import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { analyseMechanism } from '@api/chemistry/analyse';
import { parseMechanism } from '@grammar/parse';
import { exampleFiles } from '../helpers/examples';

// Golden files are written by `UPDATE_GOLDEN=1 npx vitest run tests/grammar/examples.test.ts`
// and reviewed by hand before they are committed; the textbook checks of these examples live
// in tests/chemistry/textbook-mechanisms.test.ts.
const examples = exampleFiles();

describe('examples/', () => {
  it('holds at least eight mechanisms, each with a golden JSON', () => {
    expect(examples.length).toBeGreaterThanOrEqual(8);
    for (const example of examples) expect(existsSync(example.goldenPath) || process.env.UPDATE_GOLDEN === '1').toBe(true);
  });

  it.each(examples)('$name analyses to its golden JSON', ({ text, goldenPath }) => {
    const analysis = JSON.parse(JSON.stringify(analyseMechanism(text)));
    if (process.env.UPDATE_GOLDEN === '1') writeFileSync(goldenPath, `${JSON.stringify(analysis, null, 2)}\n`);
    expect(analysis).toEqual(JSON.parse(readFileSync(goldenPath, 'utf8')));
  });

  it.each(examples.filter((example) => example.name !== 'faulty.steps'))('$name has no syntax errors', ({ text }) => {
    expect(parseMechanism(text).diagnostics).toEqual([]);
  });
});
