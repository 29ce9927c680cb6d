import { parseThermoKey } from '../chemistry/thermo-key';

const GREEK: Record<string, string> = {
  Δ: '\\Delta ', Σ: '\\Sigma ', Π: '\\Pi ', Φ: '\\Phi ', Γ: '\\Gamma ', δ: '\\delta ', σ: '\\sigma ', π: '\\pi ', ν: '\\nu ',
};

/** A state tag for mhchem: term-symbol digits raised (`1D` → `^1D`), Greek letters as commands. */
function stateTag(tag: string): string {
  return tag.replace(/\d+/g, (digits) => `^{${digits}}`).replace(/[^\x00-\x7F]/g, (ch) => GREEK[ch] ?? ch);
}

const RESERVED: Record<string, string> = { 'hν': '$h\\nu$', hv: '$h\\nu$', M: 'M', '*': '{*}', 'e^-': 'e^-' };

/**
 * A species key in mhchem's `\ce{}` syntax: formula, state tags, then one superscript holding the
 * radical dots, the charge and the site mark (`BrO•` → `BrO^{.}`, `Fe(aq)^3+` → `Fe(aq)^{3+}`).
 * Declared names without a formula are kept as literal text.
 */
export function speciesCe(key: string): string {
  if (RESERVED[key]) return RESERVED[key];
  const parts = parseThermoKey(key);
  if (!parts) return `{${key.replace(/[{}\\$]/g, '')}}`;
  const dots = '.'.repeat((key.match(/•/g) ?? []).length);
  const superscript = `${dots}${parts.charge}${parts.sites}`;
  const tags = parts.tags.map((tag) => `(${stateTag(tag)})`).join('');
  return `${parts.formula}${tags}${superscript ? `^{${superscript}}` : ''}`;
}

interface Term {
  key: string;
  coefText: string;
}

const sideCe = (terms: Term[]) =>
  terms.map((term) => `${term.coefText === '1' ? '' : `${term.coefText} `}${speciesCe(term.key)}`).join(' + ');

/** A step's equation in mhchem's syntax, from its terms (not its display text). */
export function equationCe(step: { reactants: Term[]; products: Term[]; reversible: boolean }): string {
  return `${sideCe(step.reactants)} ${step.reversible ? '<=>' : '->'} ${sideCe(step.products)}`;
}

/** A net reaction from signed coefficients (reactants negative), for routes. */
export function netCe(netSpecies: Record<string, number>): string {
  const terms = Object.entries(netSpecies);
  const side = (sign: number) => terms.filter(([, coef]) => Math.sign(coef) === sign)
    .map(([key, coef]) => ({ key, coefText: String(Math.abs(coef)) }));
  return `${sideCe(side(-1))} -> ${sideCe(side(1))}`;
}
