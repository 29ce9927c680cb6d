import type { ParticleNode } from '@grammar/ast';
import type { Diagnostic } from '@grammar/diagnostics';
import { finding } from './diagnostic-codes';
import { resolveParticle, type DeclaredSpecies, type Resolution } from './species-resolve';
import type { SpeciesInfo } from './species-model';
import { compositionList, type CompositionList } from './species-composition';
import type { Fraction } from './fraction';
import type { StepTerm } from './step-model';
import type { EnthalpyEntry } from './thermo';

/**
 * A species met in the mechanism, with where it was first written. The fields from `order` on
 * belong to this analysis only and are read on every step of a large text, so they sit on the
 * record itself rather than in lookup tables.
 */
export interface RegisteredSpecies extends SpeciesInfo {
  firstLine: number;
  firstColumn: number;
  /** Position in the list of species (order of first appearance). */
  order: number;
  /** The elements as (atomic number, count) pairs, for the balance. */
  composition: CompositionList;
  /** The step terms of this species, one per coefficient (step-model.ts shares them between steps)… */
  terms: Map<Fraction, StepTerm>;
  /** …except the term without a coefficient, the commonest, kept here. */
  unitTerm: StepTerm | null;
  /** Written as a reactant (consumed) or a product (formed) somewhere; a reversible step counts both ways. */
  consumed: boolean;
  formed: boolean;
  /** ΔfH° of the species for this analysis' lookup; undefined until asked (enthalpy.ts). */
  enthalpy: EnthalpyEntry | null | undefined;
  /** Already named among the species without an enthalpy (missing-enthalpies.ts). */
  enthalpyMissingNoted: boolean;
}

/**
 * The listed record, built field by field: every species then has one object shape (a spread
 * of the resolution plus the fields above took several shape changes per species).
 */
function listed(info: SpeciesInfo, node: ParticleNode, order: number): RegisteredSpecies {
  return {
    key: info.key,
    kind: info.kind,
    formula: info.formula,
    name: info.name,
    elements: info.elements,
    charge: info.charge,
    sites: info.sites,
    electrons: info.electrons,
    radical: info.radical,
    reactive: info.reactive,
    stateTagged: info.stateTagged,
    radicalMarks: info.radicalMarks,
    declared: info.declared,
    opaque: info.opaque,
    firstLine: node.line,
    firstColumn: node.column,
    order,
    composition: compositionList(info.elements),
    terms: new Map(),
    unitTerm: null,
    consumed: false,
    formed: false,
    enthalpy: undefined,
    enthalpyMissingNoted: false,
  };
}

/** Most spellings kept between analyses (a large mechanism has about one species per four steps). */
const SHARED_RESOLUTIONS_MAX = 50_000;
/**
 * Resolutions of texts without `%species` declarations, kept between analyses: a spelling then
 * always means the same species, and the workbench analyses nearly the same text on every pause
 * in typing. Resolutions are never changed once made (the registry copies what it lists).
 */
const sharedResolutions = new Map<string, Resolution>();

/** Forgets the kept resolutions (the bench measures a text whose spellings are all new). */
export function forgetSharedResolutions(): void {
  sharedResolutions.clear();
}

// Reserved particles are cached under keys no written species can have (`%` is not part of the notation's species).
const RESERVED_CACHE_KEYS = { photon: '%photon', 'third-body': '%third-body', site: '%site', electron: '%electron' } as const;

/**
 * Resolves written particles once per distinct spelling and keeps every species in order of
 * first appearance. Problems are reported at each place they occur.
 */
export class SpeciesRegistry {
  readonly byKey = new Map<string, RegisteredSpecies>();
  /** Listed species by the text they were written as, so that a spelling met again costs one lookup. */
  private readonly byText = new Map<string, RegisteredSpecies>();
  private readonly cache: Map<string, Resolution>;

  constructor(
    private readonly declarations: ReadonlyMap<string, DeclaredSpecies>,
    private readonly diagnostics: Diagnostic[],
  ) {
    this.cache = declarations.size === 0 ? sharedResolutions : new Map();
  }

  /**
   * The species for a written particle, or null (with diagnostics) when it cannot be read. It is
   * not listed yet: `register` does that once the whole step could be read.
   */
  resolve(node: ParticleNode): SpeciesInfo | null {
    const text = node.kind === 'species' ? node.text : RESERVED_CACHE_KEYS[node.kind];
    // A listed spelling resolved without problems (one with problems is never listed).
    const known = this.byText.get(text);
    if (known) return known;
    let resolution = this.cache.get(text);
    if (!resolution) {
      resolution = resolveParticle(node, this.declarations);
      if (this.cache.size >= SHARED_RESOLUTIONS_MAX) this.cache.clear();
      this.cache.set(text, resolution);
    }
    for (const problem of resolution.problems) {
      const position = { line: node.line, column: node.column + problem.offset };
      this.diagnostics.push(finding(problem.code, position, problem.message, { found: problem.found }));
    }
    return resolution.info;
  }

  /** Lists a species (first place it was written wins) and returns the listed record. */
  register(info: SpeciesInfo, node: ParticleNode): RegisteredSpecies {
    // Only listed records carry `order`: such an info came from `byText` in `resolve`.
    if ('order' in info) return info as RegisteredSpecies;
    const text = node.kind === 'species' ? node.text : RESERVED_CACHE_KEYS[node.kind];
    let registered = this.byKey.get(info.key);
    if (!registered) this.byKey.set(info.key, (registered = listed(info, node, this.byKey.size)));
    this.byText.set(text, registered);
    return registered;
  }

  /** Species in order of first appearance. */
  all(): RegisteredSpecies[] {
    return [...this.byKey.values()];
  }
}
