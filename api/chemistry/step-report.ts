import type { Diagnostic } from '@grammar/diagnostics';
import type { StepJson } from './analysis-types';
import { finding } from './diagnostic-codes';
import type { Fraction } from './fraction';
import { normalisedStep } from './duplicates';
import { stepEnthalpy } from './enthalpy';
import { equationText, type ShownTerm } from './equation-format';
import { balanceOf, type StepBalance } from './step-balance';
import { termsOf, type StepModel, type StepTerm } from './step-model';
import { checkStepRules, isElementary, molecularity, reportClass } from './step-rules';
import { suggestFix, type BalancingFix } from './suggest-fix';
import type { SpeciesInfo } from './species-model';
import type { EnthalpyLookup } from './thermo';

function signed(value: number): string {
  return value > 0 ? `+${value}` : String(value);
}

function reportImbalance(step: StepModel, balance: StepBalance, diagnostics: Diagnostic[]): void {
  for (const [symbol, delta] of Object.entries(balance.imbalance)) {
    const message = `step ${step.id} does not conserve ${symbol}: products − reactants = ${signed(delta)}`;
    diagnostics.push(finding('element-imbalance', step, message, { found: `${symbol} ${signed(delta)}`, expected: [`${symbol} 0`] }));
  }
  if (balance.chargeDelta !== 0) {
    diagnostics.push(finding('charge-imbalance', step, `step ${step.id} changes the charge by ${signed(balance.chargeDelta)}`, { found: signed(balance.chargeDelta), expected: ['0'] }));
  }
  if (balance.siteDelta !== 0) {
    diagnostics.push(finding('site-imbalance', step, `step ${step.id} changes the number of surface sites by ${signed(balance.siteDelta)}`, { found: signed(balance.siteDelta), expected: ['0'] }));
  }
}

function fixedEquation(step: StepModel, fix: BalancingFix): string {
  if (fix.kind === 'coefficients') {
    const withCoefficients = (terms: StepTerm[], coefs: Fraction[]): ShownTerm[] => terms.map((term, index) => ({ key: term.key, coef: coefs[index] }));
    return equationText(withCoefficients(step.reactants, fix.reactants), withCoefficients(step.products, fix.products), step.reversible);
  }
  const side = (terms: StepTerm[], name: 'reactants' | 'products') => {
    const touched = (term: StepTerm) => fix.side === name && term.key === fix.key;
    const kept = fix.kind === 'remove' ? terms.filter((term) => !touched(term)) : terms;
    const list: ShownTerm[] = kept.map((term) => {
      if (fix.kind === 'coefficient' && touched(term)) return { key: term.key, coef: fix.to };
      return fix.kind === 'replace' && touched(term) ? { key: fix.by, coef: term.fraction } : term;
    });
    if (fix.kind === 'add' && fix.side === name) list.push({ key: fix.key, coef: fix.coef });
    return list;
  };
  return equationText(side(step.reactants, 'reactants'), side(step.products, 'products'), step.reversible);
}

function reportFix(step: StepModel, candidates: readonly SpeciesInfo[], diagnostics: Diagnostic[]): void {
  const fix = suggestFix(step, candidates);
  if (!fix) return;
  const change = fix.kind === 'coefficients'
    ? 'these coefficients'
    : fix.kind === 'coefficient'
      ? `${fix.to.toString()} ${fix.key} instead of ${fix.from.toString()} ${fix.key} among the ${fix.side}`
      : fix.kind === 'remove'
        ? `${fix.coef.toString()} ${fix.key} removed from the ${fix.side}`
        : fix.kind === 'replace'
          ? `${fix.by} instead of ${fix.key} among the ${fix.side}`
          : `${fix.coef.toString()} ${fix.key} added to the ${fix.side}`;
  const fixed = fixedEquation(step, fix);
  diagnostics.push(finding('suggested-fix', step, `step ${step.id} balances with ${change}: ${fixed}`, { expected: [fixed] }));
}

function reportOpaque(step: StepModel, balance: StepBalance, diagnostics: Diagnostic[]): void {
  if (balance.elementsChecked) return;
  const opaque = [...new Set(termsOf(step).filter((term) => term.species.opaque).map((term) => term.species.key))];
  diagnostics.push(finding('opaque-species', step, `step ${step.id} contains the opaque ${opaque.length === 1 ? 'name' : 'names'} ${opaque.join(', ')}; its elements are not checked (charge and sites are)`));
}

/** Checks one step and builds its JSON; diagnostics go to `diagnostics`. */
export function reportStep(step: StepModel, lookup: EnthalpyLookup, candidates: readonly SpeciesInfo[], diagnostics: Diagnostic[]): StepJson {
  const balance = balanceOf(step);
  if (!balance.balanced) {
    reportImbalance(step, balance, diagnostics);
    reportFix(step, candidates, diagnostics);
  }
  reportOpaque(step, balance, diagnostics);
  checkStepRules(step, diagnostics);
  const stepClass = reportClass(step, diagnostics);
  const enthalpy = stepEnthalpy(step, lookup);
  // Fields written out (no spread of `balance`): this literal is built once per step of a large text.
  return {
    label: step.label,
    id: step.id,
    line: step.line,
    column: step.column,
    equation: equationText(step.reactants, step.products, step.reversible),
    normalised: normalisedStep(step),
    reversible: step.reversible,
    // The steps' own lists: their terms are TermJson with the engine's fields hidden (step-model.ts).
    reactants: step.reactants,
    products: step.products,
    imbalance: balance.imbalance,
    chargeDelta: balance.chargeDelta,
    siteDelta: balance.siteDelta,
    balanced: balance.balanced,
    elementsChecked: balance.elementsChecked,
    class: stepClass,
    photolysis: step.reactants.some((term) => term.species.kind === 'photon'),
    molecularity: molecularity(step),
    elementary: isElementary(step),
    // Σ ν ΔfH° of a step that does not conserve its atoms is no reaction enthalpy: none is given.
    dH: balance.balanced ? enthalpy.dH : null,
    thresholdNm: balance.balanced ? enthalpy.thresholdNm : null,
    missingEnthalpies: enthalpy.missing,
    usedEnthalpies: enthalpy.used,
    // The rate as the parser read it ({ forward, reverse, line, column }): nothing changes it, so it is not copied.
    rate: step.rate,
  };
}
