import { compileRateExpression, type RateScope } from './expressions/compile-rate';
import { evaluateRate } from './expressions/rate-value';
import type { Conditions, KineticModel, KineticsDiagnostic, KineticStep, TextPosition } from './model';
import { mergeSide, netStoichiometry, type RateSystem, type SystemStep } from './rate-system';
import { checkRateMagnitude } from './unit-check';
import { idealGasConcentration, type ConcentrationUnit } from './units';

type Direction = 'forward' | 'reverse';

interface StepContext {
  model: KineticModel;
  step: KineticStep;
  stepIndex: number;
  scope: RateScope;
  diagnostics: KineticsDiagnostic[];
}

function report(context: StepContext, code: string, message: string, at?: TextPosition, column = 1, severity: 'error' | 'warning' = 'error'): void {
  const { step, stepIndex } = context;
  const where = at ? { line: at.line, column: at.column + column - 1 } : {};
  context.diagnostics.push({ severity, code, message, step: stepIndex, label: step.label, ...where });
}

function sideOrder(terms: { coef: number }[]): number {
  return terms.reduce((sum, term) => sum + term.coef, 0);
}

/**
 * Evaluates one direction's rate constant. Convention for [M]: a step with M on both sides is
 * multiplied by [M] unless its expression already reads M or calls falloff (whose value holds [M]).
 */
function rateConstant(context: StepContext, direction: Direction): number | null {
  const { step, scope } = context;
  const text = direction === 'forward' ? step.forward : (step.reverse ?? '');
  const at = direction === 'forward' ? step.forwardAt : step.reverseAt;
  const compiled = compileRateExpression(text);
  if (!compiled.ok) {
    report(context, 'rate-expression', `${direction} rate: ${compiled.error}`, at, compiled.column);
    return null;
  }
  const multipliesByM = step.thirdBody && !compiled.containsThirdBody;
  if ((multipliesByM || compiled.containsThirdBody) && !Number.isFinite(scope.M)) {
    report(context, 'third-body-unknown', 'this step needs [M]: give M in %conditions (surface units have no ideal-gas [M])', at);
    return null;
  }
  const outcome = evaluateRate(compiled, scope);
  // A function refusing its arguments (falloff with Fc > 1, say) says why, at the expression.
  if (outcome.kind === 'threw') {
    report(context, 'rate-expression', `${direction} rate: ${outcome.reason}`, at);
    return null;
  }
  if (outcome.kind === 'not-finite') {
    report(context, 'rate-not-finite', `${direction} rate "${text}" does not give a finite number at the conditions`, at);
    return null;
  }
  // A negative rate constant has no meaning in mass action (it would run the step backwards
  // without its reverse's stoichiometry); integrating it only exhausts the step budget.
  if (outcome.kind === 'negative') {
    report(context, 'rate-negative', `${direction} rate "${text}" is negative at the conditions (${outcome.value.toExponential(2)}); a rate constant is zero or positive`, at);
    return null;
  }
  const { value } = outcome;
  const order = sideOrder(direction === 'forward' ? step.reactants : step.products) + (multipliesByM ? 1 : 0);
  const photolysis = step.photolysis && direction === 'forward';
  for (const warning of checkRateMagnitude({ order, unit: context.model.unit, value, photolysis })) {
    report(context, 'rate-magnitude', `${direction} rate: ${warning}`, at, 1, 'warning');
  }
  return multipliesByM ? value * scope.M : value;
}

function buildStep(context: StepContext): SystemStep | null {
  const { step } = context;
  const kForward = rateConstant(context, 'forward');
  const kReverse = step.reverse === null ? 0 : rateConstant(context, 'reverse');
  if (kForward === null || kReverse === null) return null;
  const reactants = mergeSide(step.reactants);
  const products = mergeSide(step.products);
  return {
    reactantIndex: reactants.index,
    reactantCoef: reactants.coef,
    productIndex: products.index,
    productCoef: products.coef,
    ...netStoichiometry(step.reactants, step.products),
    kForward,
    kReverse,
    photolysis: step.photolysis,
  };
}

/** [M] as given, else from the ideal gas law; null for a surface unit without a given M. */
function thirdBodyOf(unit: ConcentrationUnit, conditions: Conditions): number | null {
  if (typeof conditions.M === 'number') return conditions.M;
  return idealGasConcentration(conditions.P, conditions.T, unit);
}

/** The values a rate expression reads at these conditions ([M] NaN when it has none). */
export function rateScopeAt(unit: ConcentrationUnit, conditions: Conditions): RateScope {
  return { T: conditions.T, P: conditions.P, M: thirdBodyOf(unit, conditions) ?? Number.NaN };
}

/**
 * Compiles every rate expression of a model and evaluates it at the given conditions, giving the
 * numeric mass-action system, or null with error diagnostics (each at its step and column) when any
 * expression is refused or does not evaluate. Rate-magnitude warnings are returned either way.
 */
export function buildRateSystem(model: KineticModel, conditions: Conditions): { system: RateSystem | null; diagnostics: KineticsDiagnostic[] } {
  const diagnostics: KineticsDiagnostic[] = [];
  const thirdBody = thirdBodyOf(model.unit, conditions);
  const scope = rateScopeAt(model.unit, conditions);
  const steps = model.steps.map((step, stepIndex) => buildStep({ model, step, stepIndex, scope, diagnostics }));
  if (steps.some((step) => step === null)) return { system: null, diagnostics };
  return { system: { speciesCount: model.species.length, steps: steps as SystemStep[], thirdBody }, diagnostics };
}
