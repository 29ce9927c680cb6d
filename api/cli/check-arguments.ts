import { isUtf8 } from 'node:buffer';
import { readFileSync } from 'node:fs';

export const USAGE = 'usage: npm run -s check -- FILE.steps [--json]';

export type CheckArguments =
  | { kind: 'run'; file: string; json: boolean }
  | { kind: 'help' }
  | { kind: 'invalid'; json: boolean; message: string };

/** Reads the command line of `check`: one file, `--json`, `--help`; anything else is named. */
export function readArguments(args: readonly string[]): CheckArguments {
  const json = args.includes('--json');
  if (args.includes('--help') || args.includes('-h')) return { kind: 'help' };
  const unknown = args.find((arg) => arg.startsWith('-') && arg !== '--json' && arg !== '-');
  if (unknown) return { kind: 'invalid', json, message: `unknown option ${unknown}` };
  const files = args.filter((arg) => arg !== '--json');
  if (files.length === 0) return { kind: 'invalid', json, message: 'no file given' };
  if (files.length > 1) return { kind: 'invalid', json, message: `one file at a time; got ${files.length}: ${files.join(', ')}` };
  return { kind: 'run', file: files[0], json };
}

/**
 * The file's text, or why it cannot be read. Bytes that are not UTF-8 are refused here, with the
 * line and column of the first one, rather than turned into U+FFFD and reported as unknown symbols.
 */
export function readMechanismFile(file: string): { text: string } | { problem: string } {
  let bytes: Buffer;
  try {
    bytes = readFileSync(file);
  } catch (error) {
    return { problem: `cannot read ${file}: ${error instanceof Error ? error.message : String(error)}` };
  }
  const text = bytes.toString('utf8');
  if (isUtf8(bytes)) return { text };
  return { problem: `cannot read ${file}: it is not UTF-8 text (the first byte that is not UTF-8 is at ${placeOfFirstReplacement(text)})` };
}

/** Line and column of the first U+FFFD that decoding put in place of bytes that are not UTF-8. */
function placeOfFirstReplacement(text: string): string {
  const index = text.indexOf('\uFFFD');
  const before = text.slice(0, Math.max(index, 0));
  const line = before.split('\n').length;
  const column = index - before.lastIndexOf('\n');
  return `line ${line}, column ${column}`;
}
