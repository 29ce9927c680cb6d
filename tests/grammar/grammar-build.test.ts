import { execFile } from 'node:child_process';
import { mkdtempSync, readdirSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { promisify } from 'node:util';
import { describe, expect, it } from 'vitest';

const ROOT = join(import.meta.dirname, '..', '..');
const run = promisify(execFile);

describe('grammar/', () => {
  it('steps.generated.ts is exactly what `npm run grammar:build` makes from steps.ne', async () => {
    const out = join(mkdtempSync(join(tmpdir(), 'grammar-')), 'steps.generated.ts');
    await run('npx', ['nearleyc', 'grammar/steps.ne', '-o', out], { cwd: ROOT });
    const generated = readFileSync(join(ROOT, 'grammar', 'steps.generated.ts'), 'utf8');
    expect(generated.startsWith('// Generated automatically by nearley')).toBe(true);
    expect(readFileSync(out, 'utf8')).toBe(generated);
  });

  it('imports no node:* module, so the web can use the parser', () => {
    for (const file of readdirSync(join(ROOT, 'grammar')).filter((name) => name.endsWith('.ts'))) {
      expect(readFileSync(join(ROOT, 'grammar', file), 'utf8')).not.toMatch(/from ['"](?:node:|fs|path)/);
    }
  });
});
