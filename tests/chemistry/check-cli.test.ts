import { execFile } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { promisify } from 'node:util';
import { describe, expect, it } from 'vitest';
import { analyseMechanism } from '@api/chemistry/analyse';
import { EXAMPLES_DIR, exampleText } from '../helpers/examples';

const run = promisify(execFile);
const ROOT = join(EXAMPLES_DIR, '..');

async function check(...args: string[]): Promise<{ code: number; stdout: string; stderr: string }> {
  try {
    const { stdout, stderr } = await run('npx', ['tsx', 'api/cli/check.ts', ...args], { cwd: ROOT });
    return { code: 0, stdout, stderr };
  } catch (error) {
    const failed = error as { code: number; stdout: string; stderr: string };
    return { code: failed.code, stdout: failed.stdout, stderr: failed.stderr };
  }
}

describe('npm run -s check -- FILE.steps [--json]', () => {
  it('prints exactly the analysis JSON and exits 0 for a mechanism without errors', async () => {
    const result = await check('examples/clo-dimer.steps', '--json');
    expect(result.code).toBe(0);
    expect(JSON.parse(result.stdout)).toEqual(JSON.parse(JSON.stringify(analyseMechanism(exampleText('clo-dimer.steps')))));
  });

  it('prints a readable report with routes and roles, and exits 1 when there is an error', async () => {
    const result = await check('examples/faulty.steps');
    expect(result.code).toBe(1);
    expect(result.stdout).toContain('faulty.steps:12:26 error [syntax-error]');
    expect(result.stdout).toMatch(/Roles: /);
  });

  it('exits 2 with a message when the file cannot be read, and with --json prints one JSON document naming why', async () => {
    const result = await check('examples/no-such-file.steps', '--json');
    expect(result.code).toBe(2);
    expect(JSON.parse(result.stdout).error).toContain('cannot read examples/no-such-file.steps');
    expect(result.stderr).toContain('cannot read examples/no-such-file.steps');
  });

  it('refuses a file that is not UTF-8 with exit 2 and the place of the first bad byte', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'check-'));
    const file = join(dir, 'latin1.steps');
    writeFileSync(file, Buffer.concat([Buffer.from('A1: O3 -> O2 + O(3P)\nA2: Cl'), Buffer.from([0xb0]), Buffer.from(' + O3 -> ClO + O2\n')]));
    const result = await check(file);
    expect(result.code).toBe(2);
    expect(result.stdout).toBe('');
    expect(result.stderr).toContain('not UTF-8 text');
    expect(result.stderr).toContain('line 2, column 7');
  });

  it('names an unknown option, and --help prints the usage with exit 0', async () => {
    const unknown = await check('examples/clo-dimer.steps', '--verbose');
    expect(unknown.code).toBe(2);
    expect(unknown.stderr).toContain('unknown option --verbose');
    const help = await check('--help');
    expect(help.code).toBe(0);
    expect(help.stdout).toContain('usage: npm run -s check -- FILE.steps [--json]');
  });
});
