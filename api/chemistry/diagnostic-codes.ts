import { diagnostic, PARSER_CODES, type Diagnostic, type Severity } from '@grammar/diagnostics';

interface CodeInfo {
  severity: Severity;
  /** What the code means, for documentation and the human report. */
  meaning: string;
}

/**
 * Every diagnostic code the checker reports, with its severity. Codes are stable kebab-case
 * names: clients and tests key on them.
 */
export const DIAGNOSTIC_CODES = {
  [PARSER_CODES.syntaxError]: { severity: 'error', meaning: 'the line does not follow the step notation' },
  [PARSER_CODES.unbalancedBrackets]: { severity: 'error', meaning: 'a bracket is not closed or closes nothing' },
  [PARSER_CODES.unknownDirective]: { severity: 'error', meaning: 'a %directive the notation does not define' },
  [PARSER_CODES.inputTooLarge]: { severity: 'error', meaning: 'the text exceeds the size limit' },
  [PARSER_CODES.lineTooLong]: { severity: 'error', meaning: 'a line exceeds the length limit' },
  'bad-directive': { severity: 'error', meaning: 'a directive value that cannot be read, or a species named both terminal and intermediate' },
  'directive-repeated': { severity: 'warning', meaning: 'a title, unit or condition set again to another value (the later one is used)' },
  'unknown-element': { severity: 'error', meaning: 'a symbol that is not one of the 118 elements' },
  'bad-count': { severity: 'error', meaning: 'a count, coefficient or charge that is zero, padded or not a whole number' },
  'undeclared-name': { severity: 'error', meaning: 'a word that is neither a formula nor a declared name' },
  'bad-declaration': { severity: 'error', meaning: 'a %species declaration that repeats or shadows a name' },
  'declared-after-use': { severity: 'warning', meaning: 'a declared name used above its %species line' },
  'opaque-species': { severity: 'info', meaning: 'a step with an opaque declared species is not element-balanced' },
  'unused-directive-species': { severity: 'warning', meaning: '%terminal or %intermediates names a species no step uses' },
  'intermediate-one-sided': { severity: 'warning', meaning: '%intermediates names a species that is only formed or only consumed' },
  'element-imbalance': { severity: 'error', meaning: 'an element is not conserved by a step' },
  'charge-imbalance': { severity: 'error', meaning: 'charge is not conserved by a step' },
  'site-imbalance': { severity: 'error', meaning: 'surface sites are not conserved by a step' },
  'photon-on-product-side': { severity: 'error', meaning: 'hν may only be a reactant' },
  'reversible-photolysis': { severity: 'warning', meaning: 'a reversible step that absorbs hν (its reverse would give off light)' },
  'third-body-unpaired': { severity: 'error', meaning: 'M must appear once on each side' },
  'molecularity-above-three': { severity: 'warning', meaning: 'more than three reactant particles: not elementary' },
  'not-elementary': { severity: 'info', meaning: 'non-integer coefficients (a lumped step)' },
  'odd-electrons-unmarked': { severity: 'warning', meaning: 'an odd-electron species written without a radical mark' },
  'even-electrons-marked': { severity: 'warning', meaning: 'a radical mark on an even-electron species without a state tag' },
  'triplet-unmarked': { severity: 'info', meaning: 'a triplet state (O(3P)) without radical marks, so not counted as a radical' },
  'radical-marks-parity': { severity: 'warning', meaning: 'an even number of radical marks on an odd-electron species (OH••)' },
  'species-two-spellings': { severity: 'warning', meaning: 'one species written two ways (O and O(3P)), which the routes keep apart' },
  'step-class': { severity: 'info', meaning: 'a step that starts, branches or ends radical chains' },
  'duplicate-label': { severity: 'error', meaning: 'two steps share a label' },
  'step-changes-nothing': { severity: 'warning', meaning: 'a step with the same species in the same amounts on both sides' },
  'duplicate-step': { severity: 'warning', meaning: 'the same step is written twice' },
  'suggested-fix': { severity: 'info', meaning: 'a small change that balances an unbalanced step' },
  'no-steps': { severity: 'warning', meaning: 'the text has no steps to analyse' },
  'routes-too-large': { severity: 'warning', meaning: 'too many steps or intermediates for route analysis' },
  'direct-routes-skipped': { severity: 'info', meaning: 'too many steps to list direct routes' },
  'direct-routes-limit': { severity: 'warning', meaning: 'direct-route enumeration stopped at its work limit' },
  'no-productive-route': { severity: 'info', meaning: 'the routes are null cycles only' },
  'steps-left-out-of-routes': { severity: 'warning', meaning: 'steps with balance, hν, M or label errors are not used in routes' },
  'route-reverses-one-way-step': { severity: 'warning', meaning: 'a route runs a one-way step backwards (σ < 0), so it cannot occur as written' },
  'enthalpy-missing': { severity: 'info', meaning: 'species without an enthalpy of formation' },
  'rate-expression': { severity: 'error', meaning: 'a rate expression that cannot be evaluated (syntax, or a name or function not allowed)' },
  'rate-not-finite': { severity: 'error', meaning: 'a rate expression that is infinite or not a number at the mechanism\'s conditions' },
  'third-body-unknown': { severity: 'warning', meaning: 'a rate that reads [M] where [M] has no value (a surface unit without M in %conditions)' },
  'rate-negative': { severity: 'error', meaning: 'a rate expression that is negative at the mechanism\'s conditions' },
  'rate-count': { severity: 'warning', meaning: 'a reversible step with one rate, or a one-way step with two' },
  'rates-unchecked': { severity: 'info', meaning: 'too many steps to compile every rate expression while checking' },
} as const satisfies Record<string, CodeInfo>;

export type DiagnosticCode = keyof typeof DIAGNOSTIC_CODES;

/** Builds a diagnostic whose severity comes from its code. */
export function finding(
  code: DiagnosticCode,
  position: { line: number; column: number },
  message: string,
  extra: { found?: string; expected?: string[] } = {},
): Diagnostic {
  return diagnostic(DIAGNOSTIC_CODES[code].severity, code, position, message, extra);
}
