import { readFileSync } from 'node:fs';
import { basename } from 'node:path';
import { analyseMechanism } from '@api/chemistry/analyse';
import { formatReport } from '@api/chemistry/report-text';

/**
 * `npm run -s check -- FILE.steps [--json]`: prints the readable report, or exactly one JSON
 * document (analysis.md). Exit 0 without error diagnostics, 1 with one, 2 when the file cannot be read.
 */
function main(args: string[]): number {
  const json = args.includes('--json');
  const files = args.filter((arg) => arg !== '--json');
  if (files.length !== 1) {
    process.stderr.write('usage: npm run -s check -- FILE.steps [--json]\n');
    return 2;
  }
  let text: string;
  try {
    text = readFileSync(files[0], 'utf8');
  } catch (error) {
    process.stderr.write(`check: cannot read ${files[0]}: ${error instanceof Error ? error.message : String(error)}\n`);
    return 2;
  }
  const analysis = analyseMechanism(text);
  process.stdout.write(json ? `${JSON.stringify(analysis, null, 2)}\n` : `${formatReport(analysis, basename(files[0]))}\n`);
  return analysis.diagnostics.some((item) => item.severity === 'error') ? 1 : 0;
}

process.exitCode = main(process.argv.slice(2));
