import { basename } from 'node:path';
import { analyseMechanism } from '@api/chemistry/analyse';
import { formatReport } from '@api/chemistry/report-text';
import { readArguments, readMechanismFile, USAGE } from './check-arguments';

/**
 * `npm run -s check -- FILE.steps [--json]`: prints the readable report, or exactly one JSON
 * document (analysis.md). Exit 0 without error diagnostics, 1 with one, 2 when the file cannot be
 * read (or the command line is wrong); with `--json` that case prints `{ "error": "…" }` too.
 */
function main(args: string[]): number {
  const parsed = readArguments(args);
  if (parsed.kind === 'help') {
    process.stdout.write(`${USAGE}\n`);
    return 0;
  }
  if (parsed.kind === 'invalid') return refuse(`${parsed.message}\n${USAGE}`, parsed.json);
  const read = readMechanismFile(parsed.file);
  if ('problem' in read) return refuse(read.problem, parsed.json);
  const analysis = analyseMechanism(read.text);
  process.stdout.write(parsed.json ? `${JSON.stringify(analysis, null, 2)}\n` : `${formatReport(analysis, basename(parsed.file))}\n`);
  return analysis.diagnostics.some((item) => item.severity === 'error') ? 1 : 0;
}

function refuse(problem: string, json: boolean): number {
  process.stderr.write(`check: ${problem}\n`);
  if (json) process.stdout.write(`${JSON.stringify({ error: problem.split('\n')[0] })}\n`);
  return 2;
}

process.exitCode = main(process.argv.slice(2));
