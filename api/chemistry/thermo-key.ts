/** The parts of a species key that matter for enthalpy lookup (radical marks are dropped). */
export interface ThermoKeyParts {
  formula: string;
  /** State tags without parentheses (`1D`, `aq`, `l`) in written order; `(g)` is dropped (gas is the default). */
  tags: string[];
  /** Charge as written after `^` (`-`, `2+`), or ''. */
  charge: string;
  /** Site mark as written (`*`, `*2`), or ''. */
  sites: string;
}

// Element symbols, counts and bracket groups; a group must open on an element or another group,
// which is how the notation tells `(CH3)3` from a state tag such as `(1D)` or `(aq)`.
const FORMULA = /^(?:[A-Z][a-z]?|\d+|[([](?=[A-Z([])|[)\]])+/;
const SUFFIX_TOKEN = /\(([^()]+)\)|([•.])|\^(\d*[+-])|\*(\d*)/y;

/**
 * Splits a species key (`Br•`, `O(1D)`, `Fe(aq)^3+`, `CO*`) into formula, state tag, charge and
 * sites. Marks after the formula are accepted in any order. Returns null when the key is not a
 * formula-based species (`hν`, `M`, `*`, `e^-`, declared names and anything malformed).
 */
export function parseThermoKey(key: string): ThermoKeyParts | null {
  const formula = FORMULA.exec(key)?.[0];
  if (!formula || !balancedBrackets(formula)) return null;
  const parts: ThermoKeyParts = { formula, tags: [], charge: '', sites: '' };
  SUFFIX_TOKEN.lastIndex = formula.length;
  while (SUFFIX_TOKEN.lastIndex < key.length) {
    const match = SUFFIX_TOKEN.exec(key);
    if (!match) return null;
    const [, tag, , charge, sites] = match;
    if (tag !== undefined) {
      if (tag !== 'g') parts.tags.push(tag);
    } else if (charge !== undefined) {
      parts.charge = charge;
    } else if (sites !== undefined) {
      parts.sites = `*${sites}`;
    }
  }
  return parts;
}

/** The table key for parts: formula, tags, charge, sites (the canonical order without radical marks). */
export function tableKey(parts: ThermoKeyParts): string {
  const tags = parts.tags.map((tag) => `(${tag})`).join('');
  const charge = parts.charge === '' ? '' : `^${parts.charge}`;
  return `${parts.formula}${tags}${charge}${parts.sites}`;
}

function balancedBrackets(formula: string): boolean {
  const stack: string[] = [];
  for (const ch of formula) {
    if (ch === '(' || ch === '[') stack.push(ch === '(' ? ')' : ']');
    else if ((ch === ')' || ch === ']') && stack.pop() !== ch) return false;
  }
  return stack.length === 0;
}
