import type { ComparedStep } from '@web/services/revisions';

/** A step as the comparison names it: its label, else its line. */
export const stepName = (step: ComparedStep) => step.label ?? `line ${step.line}`;

export const enthalpyText = (value: number | null) =>
  value === null ? 'unknown' : `${value > 0 ? '+' : value < 0 ? '−' : ''}${Math.abs(value).toFixed(1)} kJ mol⁻¹`;

/** Stoichiometric numbers as `B1 ×2, B3 ×1`. */
export const multipliersText = (numbers: Record<string, number>) =>
  Object.entries(numbers)
    .map(([step, n]) => `${step} ×${n}`)
    .join(', ');
