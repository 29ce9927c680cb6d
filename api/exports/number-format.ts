import type { StepExport } from './exports.schemas';

/** ΔH in kJ/mol to one decimal, with a true minus sign (or an en dash when unknown). */
export function formatKj(dH: number | null): string {
  if (dH === null) return '–';
  const text = Math.abs(dH).toFixed(1);
  return dH < 0 && text !== '0.0' ? `−${text}` : text;
}

/** A photolysis threshold in whole nanometres (or an en dash when there is none). */
export function formatNm(nm: number | null): string {
  return nm === null ? '–' : nm.toFixed(0);
}

/** The rate expression as written; a reversible step shows `forward | reverse`. */
export function rateText(step: StepExport): string {
  if (!step.rate) return '';
  return step.rate.reverse === null ? (step.rate.forward ?? '') : `${step.rate.forward ?? ''} | ${step.rate.reverse}`;
}

/** Stoichiometric numbers as `B1 ×2, B2 ×1` (in step order, as stored). */
export function multipliersText(multipliers: Record<string, number>): string {
  return Object.entries(multipliers).map(([id, sigma]) => `${id} ×${sigma}`).join(', ');
}

export const yesNo = (value: boolean) => (value ? 'yes' : 'no');
