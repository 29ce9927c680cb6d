/** What kind of particle a term is: a species, or one of the reserved words. */
export type ParticleKind = 'species' | 'photon' | 'third-body' | 'site' | 'electron';

/** One species as the engine sees it (see analysis.md, "Species"). */
export interface SpeciesInfo {
  /** Canonical key: formula, state tags, `•` marks, charge, `*` (step-notation.md). */
  key: string;
  kind: ParticleKind;
  /** The formula as written (for a declared name, the name). */
  formula: string;
  /** The declared name, when the species was declared with %species. */
  name: string | null;
  elements: Record<string, number>;
  charge: number;
  sites: number;
  /** Σ Z − charge; null for an opaque name. */
  electrons: number | null;
  radical: boolean;
  /** Radical, excited (state-tagged), adsorbed, a site, or an ion. */
  reactive: boolean;
  /** Has a state tag other than a phase tag. */
  stateTagged: boolean;
  radicalMarks: number;
  declared: boolean;
  opaque: boolean;
}

/** hν and M: written in steps, but neither balanced nor cancelled; routes report them aside. */
export function isAside(species: Pick<SpeciesInfo, 'kind'>): boolean {
  return species.kind === 'photon' || species.kind === 'third-body';
}

/** Reserved particles: one shared description each. */
export const RESERVED: Record<Exclude<ParticleKind, 'species'>, SpeciesInfo> = {
  photon: reserved('hν', 'photon', 0, 0),
  'third-body': reserved('M', 'third-body', 0, 0),
  site: reserved('*', 'site', 0, 1),
  electron: reserved('e^-', 'electron', -1, 0),
};

function reserved(key: string, kind: ParticleKind, charge: number, sites: number): SpeciesInfo {
  return {
    key,
    kind,
    formula: key,
    name: null,
    elements: {},
    charge,
    sites,
    electrons: kind === 'electron' ? 1 : 0,
    radical: false,
    reactive: kind === 'site',
    stateTagged: false,
    radicalMarks: 0,
    declared: false,
    opaque: false,
  };
}

/** The key of a written species (step-notation.md, "canonical form"). */
export function speciesKey(formula: string, states: readonly string[], radicalMarks: number, charge: number, sites: number): string {
  const chargeText = charge === 0 ? '' : `^${Math.abs(charge) === 1 ? '' : Math.abs(charge)}${charge > 0 ? '+' : '-'}`;
  const siteText = sites === 0 ? '' : sites === 1 ? '*' : `*${sites}`;
  return `${formula}${states.join('')}${'•'.repeat(radicalMarks)}${chargeText}${siteText}`;
}
