/** How serious a finding is: an error makes `check` exit 1; warnings and infos never do. */
export type Severity = 'error' | 'warning' | 'info';

/** One finding about the text, positioned at a 1-based line and column. */
export interface Diagnostic {
  severity: Severity;
  line: number;
  column: number;
  code: string;
  message: string;
  /** What the checker found at that place (a token, a species, a count). */
  found?: string;
  /** What would have been accepted there. */
  expected?: string[];
}

/** Codes the parser itself reports (the engine adds its own in api/chemistry/diagnostic-codes.ts). */
export const PARSER_CODES = {
  syntaxError: 'syntax-error',
  unbalancedBrackets: 'unbalanced-brackets',
  unknownDirective: 'unknown-directive',
  inputTooLarge: 'input-too-large',
  lineTooLong: 'line-too-long',
} as const;

/** Builds a diagnostic; `extra` carries `found` / `expected` when known. */
export function diagnostic(
  severity: Severity,
  code: string,
  position: { line: number; column: number },
  message: string,
  extra: { found?: string; expected?: string[] } = {},
): Diagnostic {
  // Optional fields only when known, without a spread: large texts produce tens of thousands of these.
  const built: Diagnostic = { severity, line: position.line, column: position.column, code, message };
  if (extra.found !== undefined) built.found = extra.found;
  if (extra.expected !== undefined) built.expected = extra.expected;
  return built;
}
