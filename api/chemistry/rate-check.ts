import type { Diagnostic } from '@grammar/diagnostics';
import { finding } from './diagnostic-codes';
import type { MechanismSettings } from './directives';
import { rateScopeAt } from './kinetics/build-system';
import { compileRateExpression, type CompiledRate, type RateScope } from './kinetics/expressions/compile-rate';
import { evaluateRate } from './kinetics/expressions/rate-value';
import { DEFAULT_PRESSURE_ATM, DEFAULT_TEMPERATURE_K, type ConcentrationUnit } from './kinetics/units';
import { ratePositions } from './rate-positions';
import type { StepModel } from './step-model';

/**
 * Rate expressions are compiled (once per distinct text, about 60 µs each) for mechanisms of at
 * most this many steps; larger ones are checked when they are simulated, so that checking a very
 * large text stays within its time budget.
 */
export const MAX_RATE_CHECK_STEPS = 600;

/** The mechanism's own conditions, with the simulator's defaults where it gives none. */
function checkScope(settings: Pick<MechanismSettings, 'conditions' | 'units'>): RateScope {
  const { T, P, M } = settings.conditions;
  return rateScopeAt(settings.units.conc as ConcentrationUnit, { T: T ?? DEFAULT_TEMPERATURE_K, P: P ?? DEFAULT_PRESSURE_ATM, M });
}

function describeScope(scope: RateScope): string {
  return `T = ${scope.T} K, P = ${Number(scope.P.toPrecision(6))} atm`;
}

/**
 * Evaluates a compiled rate at the mechanism's conditions: a rate that throws, is not a finite
 * number or is negative would stop a simulation there, so the checker says so first. A rate that
 * reads [M] where the unit has none (a surface) and %conditions gives none cannot be evaluated: said so.
 */
function checkValue(step: StepModel, direction: 'forward' | 'reverse', compiled: CompiledRate, scope: RateScope, at: { line: number; column: number }, diagnostics: Diagnostic[]): void {
  const where = `the ${direction} rate of step ${step.id}`;
  if (compiled.containsThirdBody && !Number.isFinite(scope.M)) {
    const message = `${where} reads [M], which has no value here (a surface unit has no ideal-gas [M]): give M in %conditions to check and simulate it`;
    diagnostics.push(finding('third-body-unknown', at, message, { found: compiled.text }));
    return;
  }
  const outcome = evaluateRate(compiled, scope);
  if (outcome.kind === 'threw') {
    diagnostics.push(finding('rate-expression', at, `${where} cannot be evaluated at ${describeScope(scope)}: ${outcome.reason}`, { found: compiled.text }));
  } else if (outcome.kind === 'not-finite') {
    diagnostics.push(finding('rate-not-finite', at, `${where} is not a finite number at ${describeScope(scope)} (${String(outcome.value)})`, { found: compiled.text }));
  } else if (outcome.kind === 'negative') {
    diagnostics.push(finding('rate-negative', at, `${where} is negative at ${describeScope(scope)} (${outcome.value.toExponential(2)}); a rate constant is zero or positive`, { found: compiled.text }));
  }
}

function checkExpression(step: StepModel, direction: 'forward' | 'reverse', text: string, at: { line: number; column: number }, scope: RateScope, diagnostics: Diagnostic[]): void {
  const compiled = compileRateExpression(text);
  if (compiled.ok) {
    checkValue(step, direction, compiled, scope, at, diagnostics);
    return;
  }
  const position = { line: at.line, column: at.column + compiled.column - 1 };
  diagnostics.push(finding('rate-expression', position, `the ${direction} rate of step ${step.id} cannot be used: ${compiled.error}`, { found: text }));
}

/** How many rates the step gives against how many its arrow needs (one one-way, two reversible). */
function checkRateCount(step: StepModel, diagnostics: Diagnostic[]): void {
  const rate = step.rate;
  if (!rate) return;
  if (step.reversible && rate.reverse === null) {
    const message = `step ${step.id} is reversible but gives one rate; write @ FORWARD | REVERSE to simulate it`;
    diagnostics.push(finding('rate-count', rate, message, { found: rate.forward, expected: [`${rate.forward} | REVERSE`] }));
  } else if (!step.reversible && rate.reverse !== null) {
    const message = `step ${step.id} is one-way, so its reverse rate ${rate.reverse} is never used; write ⇌ or drop it`;
    diagnostics.push(finding('rate-count', rate, message, { found: rate.reverse }));
  }
}

/**
 * Checks the rates written after `@`: that a one-way step gives one and a reversible step two,
 * and (up to MAX_RATE_CHECK_STEPS steps) that each expression is one the simulator can evaluate,
 * placed at the column where it goes wrong, and gives a finite, non-negative value at the
 * mechanism's conditions.
 */
export function reportRates(steps: readonly StepModel[], text: string, settings: Pick<MechanismSettings, 'conditions' | 'units'>, diagnostics: Diagnostic[]): void {
  if (steps.length === 0) return; // also: a text that was not a string has no steps
  const compile = steps.length <= MAX_RATE_CHECK_STEPS;
  const lines = compile ? text.split(/\r\n|\n|\r/) : null;
  const scope = checkScope(settings);
  for (const step of steps) {
    checkRateCount(step, diagnostics);
    if (!compile || !step.rate) continue;
    const { forwardAt, reverseAt } = ratePositions(step.rate, lines);
    checkExpression(step, 'forward', step.rate.forward, forwardAt, scope, diagnostics);
    if (step.rate.reverse !== null) checkExpression(step, 'reverse', step.rate.reverse, reverseAt, scope, diagnostics);
  }
  if (!compile && steps.some((step) => step.rate)) {
    const message = `rate expressions are checked here for up to ${MAX_RATE_CHECK_STEPS} steps (this mechanism has ${steps.length}); they are checked when the mechanism is simulated`;
    diagnostics.push(finding('rates-unchecked', steps[0], message));
  }
}
