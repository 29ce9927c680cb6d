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
  stateTagged: boolean;
  declared: DeclaredSpecies | null;
}

function describe(node: SpeciesNode, composition: Composition): SpeciesInfo {
  const { elements, charge, radicalMarks, stateTagged, declared } = composition;
  const electrons = elements ? electronCount(elements, charge) : null;
  const radical = electrons === null ? radicalMarks > 0 : electrons % 2 === 1 || (radicalMarks > 0 && stateTagged);
  return {
    key: speciesKey(node.formulaText, node.states, node.radicalMarks, charge, node.sites),
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

function declaredComposition(node: SpeciesNode, declared: DeclaredSpecies, charge: number | null): Composition {
  const source = declared.species;
  const inner = source ? countElements(source.formula) : null;
  const innerCharge = source ? readCharge(source.charge, source.column).value : 0;
  const states = [...(source?.states ?? []), ...node.states];
  return {
    elements: inner ? inner.elements : null,
    charge: charge ?? innerCharge,
    radicalMarks: Math.max(node.radicalMarks, source?.radicalMarks ?? 0),
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
    const composition = declaredComposition(node, declared, node.charge ? charge.value : null);
    return { info: problems.length > 0 ? null : describe(node, composition), problems };
  }
  const counted = countElements(node.formula);
  problems.push(...counted.problems);
  const stateTagged = node.states.some((tag) => !PHASE_TAG.test(tag));
  const composition = { elements: counted.elements, charge: charge.value, radicalMarks: node.radicalMarks, stateTagged, declared: null };
  return { info: problems.length > 0 ? null : describe(node, composition), problems };
}

/** Resolves any particle; reserved words map to their shared descriptions. */
export function resolveParticle(node: ParticleNode, declarations: ReadonlyMap<string, DeclaredSpecies>): Resolution {
  if (node.kind !== 'species') return { info: RESERVED[node.kind], problems: [] };
  return resolveSpecies(node, declarations);
}
