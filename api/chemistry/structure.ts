import { Molecule } from 'openchemlib';
import { readMolecule } from './smiles-reader';

/** What a SMILES string says about a species, read by openchemlib. */
export interface StructureInfo {
  /** Hill formula (C, H, then alphabetical; alphabetical when there is no carbon): `CH3NO2`, `O3`. */
  formula: string;
  elements: Record<string, number>;
  charge: number;
  /** Formal charge of every atom in SMILES order (explicit atoms only; implicit H are not atoms). */
  formalCharges: { atom: number; symbol: string; charge: number }[];
  /**
   * Unpaired electrons from openchemlib's radical flags (doublet 1, triplet 2). openchemlib sets
   * them for bracket atoms that lack one or two bonds (`[O]` triplet, `[CH3]` and `[OH]` doublet);
   * it sets none for bare `[H]`, `[C]` or `[N]`, hence `oddElectrons` beside it.
   */
  unpairedElectrons: number;
  /** True when Σ Z − charge is odd: the species is a radical whatever the flags say. */
  oddElectrons: boolean;
  svg: string;
}

/** Size and element id of the depiction (ids must differ when several are on one page). */
export interface DepictionOptions {
  width?: number;
  height?: number;
  svgId?: string;
}

/**
 * Reads a SMILES string with openchemlib: formula, charge, formal charges, unpaired electrons and
 * a 2-D depiction as SVG.
 * @throws Error `SMILES does not parse: …` with openchemlib's reason and position, or naming the
 *   atom whose valence is exceeded.
 */
export function parseSmiles(smiles: string, options: DepictionOptions = {}): StructureInfo {
  const molecule = readMolecule(smiles);
  const atoms = describeAtoms(molecule);
  const elements = countElements(molecule);
  const charge = atoms.reduce((sum, atom) => sum + atom.charge, 0);
  return {
    formula: hillFormula(elements),
    elements,
    charge,
    formalCharges: atoms,
    unpairedElectrons: countUnpaired(molecule),
    oddElectrons: (electronCount(molecule) - charge) % 2 !== 0,
    svg: molecule.toSVG(options.width ?? 240, options.height ?? 180, options.svgId ?? 'structure'),
  };
}

/**
 * Compares a structure with a written formula and charge.
 * @returns plain messages, empty when formula and charge agree (a parse error is one message).
 */
export function checkStructureMatches(smiles: string, elements: Record<string, number>, charge: number): string[] {
  let info: StructureInfo;
  try {
    info = parseSmiles(smiles);
  } catch (error) {
    return [(error as Error).message];
  }
  const problems: string[] = [];
  const written = hillFormula(elements);
  if (written !== info.formula) {
    problems.push(`formula mismatch: the structure ${smiles} is ${info.formula}, the written formula is ${written}`);
  }
  if (info.charge !== charge) {
    problems.push(`charge mismatch: the structure ${smiles} has charge ${signed(info.charge)}, the written species has charge ${signed(charge)}`);
  }
  return problems;
}

function describeAtoms(molecule: Molecule): StructureInfo['formalCharges'] {
  const atoms: StructureInfo['formalCharges'] = [];
  for (let atom = 0; atom < molecule.getAllAtoms(); atom++) {
    atoms.push({ atom, symbol: molecule.getAtomLabel(atom), charge: molecule.getAtomCharge(atom) });
  }
  return atoms;
}

function countElements(molecule: Molecule): Record<string, number> {
  const counts: Record<string, number> = {};
  for (let atom = 0; atom < molecule.getAllAtoms(); atom++) {
    const symbol = molecule.getAtomLabel(atom);
    counts[symbol] = (counts[symbol] ?? 0) + 1;
    const hydrogens = molecule.getImplicitHydrogens(atom);
    if (hydrogens > 0) counts.H = (counts.H ?? 0) + hydrogens;
  }
  return counts;
}

function countUnpaired(molecule: Molecule): number {
  let unpaired = 0;
  for (let atom = 0; atom < molecule.getAllAtoms(); atom++) {
    const radical = molecule.getAtomRadical(atom);
    if (radical === Molecule.cAtomRadicalStateD) unpaired += 1;
    else if (radical === Molecule.cAtomRadicalStateT) unpaired += 2;
  }
  return unpaired;
}

function electronCount(molecule: Molecule): number {
  let electrons = 0;
  for (let atom = 0; atom < molecule.getAllAtoms(); atom++) {
    electrons += molecule.getAtomicNo(atom) + molecule.getImplicitHydrogens(atom);
  }
  return electrons;
}

/** Hill order: C, H, then the other symbols alphabetically; without carbon all alphabetically. */
export function hillFormula(elements: Record<string, number>): string {
  const symbols = Object.keys(elements).filter((symbol) => elements[symbol] !== 0);
  const hasCarbon = symbols.includes('C');
  const first = hasCarbon ? ['C', 'H'].filter((symbol) => symbols.includes(symbol)) : [];
  const rest = symbols.filter((symbol) => !first.includes(symbol)).sort();
  return [...first, ...rest].map((symbol) => `${symbol}${elements[symbol] === 1 ? '' : elements[symbol]}`).join('');
}

function signed(charge: number): string {
  return charge > 0 ? `+${charge}` : String(charge);
}
