import { Molecule } from 'openchemlib';

/**
 * Parses SMILES with openchemlib and rejects what openchemlib lets through: an empty string,
 * unbalanced branches and atoms with more bonds than their valence.
 * @throws Error `SMILES does not parse: …` saying where and why.
 */
export function readMolecule(smiles: string): Molecule {
  const text = smiles.trim();
  if (text === '') throw new Error('SMILES does not parse: the string is empty');
  const branchProblem = unbalancedBranch(text);
  if (branchProblem) throw new Error(`SMILES does not parse: ${branchProblem}`);
  let molecule: Molecule;
  try {
    molecule = Molecule.fromSmiles(text);
  } catch (error) {
    throw new Error(`SMILES does not parse: ${libraryReason(error)}`);
  }
  molecule.ensureHelperArrays(Molecule.cHelperNeighbours);
  for (let atom = 0; atom < molecule.getAllAtoms(); atom++) {
    if (molecule.getFreeValence(atom) < 0) {
      throw new Error(`SMILES does not parse: atom ${atom + 1} (${molecule.getAtomLabel(atom)}) has more bonds than its valence allows`);
    }
  }
  return molecule;
}

// openchemlib accepts an unclosed branch such as `C(C` silently; the author surely meant something else.
function unbalancedBranch(text: string): string | null {
  let depth = 0;
  let inBracket = false;
  for (const [position, ch] of [...text].entries()) {
    if (ch === '[') inBracket = true;
    else if (ch === ']') inBracket = false;
    else if (!inBracket && ch === '(') depth++;
    else if (!inBracket && ch === ')' && --depth < 0) return `')' at position ${position + 1} closes no branch`;
  }
  return depth > 0 ? `${depth} branch${depth > 1 ? 'es' : ''} opened with '(' never closed` : null;
}

// openchemlib's exceptions read "Class$S19: SmilesParser: …": keep the reason, drop the class name.
function libraryReason(error: unknown): string {
  const message = error instanceof Error ? error.message : String(error);
  return message.replace(/^Class\$\w+:\s*/, '');
}
