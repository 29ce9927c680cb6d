import type { Diagnostic } from '@grammar/diagnostics';
import { finding } from './diagnostic-codes';
import { compileRateExpression } from './kinetics/expressions/compile-rate';
import { ratePositions } from './rate-positions';
import type { StepModel } from './step-model';

/**
 * Rate expressions are compiled (once per distinct text, about 60 µs each) for mechanisms of at
 * most this many steps; larger ones are checked when they are simulated, so that checking a very
 * large text stays within its time budget.
 */
export const MAX_RATE_CHECK_STEPS = 600;

function checkExpression(step: StepModel, direction: 'forward' | 'reverse', text: string, at: { line: number; column: number }, diagnostics: Diagnostic[]): void {
  const compiled = compileRateExpression(text);
  if (compiled.ok) return;
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
 * placed at the column where it goes wrong.
 */
export function reportRates(steps: readonly StepModel[], text: string, diagnostics: Diagnostic[]): void {
  if (steps.length === 0) return; // also: a text that was not a string has no steps
  const compile = steps.length <= MAX_RATE_CHECK_STEPS;
  const lines = compile ? text.split(/\r\n|\n|\r/) : null;
  for (const step of steps) {
    checkRateCount(step, diagnostics);
    if (!compile || !step.rate) continue;
    const { forwardAt, reverseAt } = ratePositions(step.rate, lines);
    checkExpression(step, 'forward', step.rate.forward, forwardAt, diagnostics);
    if (step.rate.reverse !== null) checkExpression(step, 'reverse', step.rate.reverse, reverseAt, diagnostics);
  }
  if (!compile && steps.some((step) => step.rate)) {
    const message = `rate expressions are checked here for up to ${MAX_RATE_CHECK_STEPS} steps (this mechanism has ${steps.length}); they are checked when the mechanism is simulated`;
    diagnostics.push(finding('rates-unchecked', steps[0], message));
  }
}
