import type { ParticleNode, SourceToken, SpeciesNode } from '@grammar/ast';
import { elementBySymbol } from './elements';
import { countElements, type FormulaProblem } from './species-formula';
import { RESERVED, speciesKey, type SpeciesInfo } from './species-model';

/** A species declared with `%species NAME [= FORMULA]`. */
export interface DeclaredSpecies {
  name: string;
  line: number;
  /** The declared composition; null for an opaque name. */
  species: SpeciesNode | null;
}

export interface Resolution {
  info: SpeciesInfo | null;
  /** Problems, placed by offset within the species text. */
  problems: FormulaProblem[];
}

// Phase tags say where a species is, not that it is excited, so they do not make it reactive.
const PHASE_TAG = /^\((?:g|l|s|aq|cr|ads)\)$/;

function readCharge(charge: SourceToken | null, speciesColumn: number): { value: number; problem: FormulaProblem | null } {
  if (!charge) return { value: 0, problem: null };
  const digits = charge.text.slice(1, -1);
  const sign = charge.text.endsWith('-') ? -1 : 1;
  if (digits === '') return { value: sign, problem: null };
  if (/^[1-9][0-9]*$/.test(digits)) return { value: sign * Number(digits), problem: null };
  const message = `charge ${charge.text} must be ^+, ^-, or a whole number from 1 with its sign (^2+)`;
  return { value: 0, problem: { code: 'bad-count', offset: charge.column - speciesColumn, found: charge.text, message } };
}

function electronCount(elements: Map<string, number>, charge: number): number {
  let total = 0;
  for (const [symbol, count] of elements) total += (elementBySymbol(symbol)?.z ?? 0) * count;
  return total - charge;
}

interface Composition {
  elements: Map<string, number> | null;
  charge: number;
  radicalMarks: number;
  /** The radical marks the key shows (a declared name's own marks are not written in its key). */
  keyMarks: number;
  stateTagged: boolean;
  declared: DeclaredSpecies | null;
}

function describe(node: SpeciesNode, composition: Composition): SpeciesInfo {
  const { elements, charge, radicalMarks, stateTagged, declared } = composition;
  const electrons = elements ? electronCount(elements, charge) : null;
  const radical = electrons === null ? radicalMarks > 0 : electrons % 2 === 1 || (radicalMarks > 0 && stateTagged);
  return {
    key: speciesKey(node.formulaText, node.states, composition.keyMarks, charge, node.sites),
    kind: 'species',
    formula: declared && declared.species ? declared.species.formulaText : node.formulaText,
    name: declared ? declared.name : null,
    elements: elements ? Object.fromEntries(elements) : {},
    charge,
    sites: node.sites,
    electrons,
    radical,
    reactive: radical || stateTagged || node.sites > 0 || charge !== 0,
    stateTagged,
    radicalMarks,
    declared: declared !== null,
    opaque: declared !== null && declared.species === null,
  };
}

/**
 * Whether marks written on a declared name repeat what its declaration already says: none, as
 * many as declared, or one on a name whose composition has an odd electron count. `RO2•` is then
 * the species `RO2` (declared C2H5O2•), not a second one that the routes would keep apart.
 */
function sameRadical(written: number, declared: number, elements: Map<string, number> | null, charge: number): boolean {
  if (written === 0 || written === declared) return true;
  return elements !== null && declared === 0 && written === 1 && electronCount(elements, charge) % 2 === 1;
}

/** The charge a declaration gives its name (0 for an opaque name). */
function declaredCharge(declared: DeclaredSpecies): number {
  return declared.species ? readCharge(declared.species.charge, declared.species.column).value : 0;
}

/** A charge written on a name declared with a composition must be the declared charge. */
function chargeProblem(node: SpeciesNode, declared: DeclaredSpecies, written: number): FormulaProblem | null {
  const source = declared.species;
  if (!source || !node.charge) return null;
  const own = declaredCharge(declared);
  if (written === own) return null;
  const message = `${declared.name} is declared on line ${declared.line} as ${source.text} (charge ${own < 0 ? `−${-own}` : own}); written here with ${node.charge.text}, it would be another species: write ${declared.name}, or declare a name for this ion`;
  return { code: 'bad-declaration', offset: node.charge.column - node.column, found: node.charge.text, message };
}

function declaredComposition(node: SpeciesNode, declared: DeclaredSpecies, charge: number | null): Composition {
  const source = declared.species;
  const inner = source ? countElements(source.formula) : null;
  const innerCharge = declaredCharge(declared);
  const states = [...(source?.states ?? []), ...node.states];
  const declaredMarks = source?.radicalMarks ?? 0;
  const elements = inner ? inner.elements : null;
  return {
    elements,
    charge: charge ?? innerCharge,
    radicalMarks: Math.max(node.radicalMarks, declaredMarks),
    keyMarks: sameRadical(node.radicalMarks, declaredMarks, elements, innerCharge) ? 0 : node.radicalMarks,
    stateTagged: states.some((tag) => !PHASE_TAG.test(tag)),
    declared,
  };
}

/** Resolves one written species against the declarations (no caching here). */
export function resolveSpecies(node: SpeciesNode, declarations: ReadonlyMap<string, DeclaredSpecies>): Resolution {
  const charge = readCharge(node.charge, node.column);
  const problems = charge.problem ? [charge.problem] : [];
  const onlyWord = node.formula.length === 1 && node.formula[0].kind === 'word' ? node.formula[0].text : null;
  const declared = onlyWord === null ? undefined : declarations.get(onlyWord);
  if (declared) {
    const mismatch = problems.length === 0 ? chargeProblem(node, declared, charge.value) : null;
    if (mismatch) problems.push(mismatch);
    const composition = declaredComposition(node, declared, node.charge ? charge.value : null);
    return { info: problems.length > 0 ? null : describe(node, composition), problems };
  }
  const counted = countElements(node.formula);
  problems.push(...counted.problems);
  const stateTagged = node.states.some((tag) => !PHASE_TAG.test(tag));
  const composition = { elements: counted.elements, charge: charge.value, radicalMarks: node.radicalMarks, keyMarks: node.radicalMarks, stateTagged, declared: null };
  return { info: problems.length > 0 ? null : describe(node, composition), problems };
}

/** Resolves any particle; reserved words map to their shared descriptions. */
export function resolveParticle(node: ParticleNode, declarations: ReadonlyMap<string, DeclaredSpecies>): Resolution {
  if (node.kind !== 'species') return { info: RESERVED[node.kind], problems: [] };
  return resolveSpecies(node, declarations);
}
