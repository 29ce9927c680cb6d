import { Molecule, SSSearcher } from 'openchemlib';
import { readMolecule } from '../chemistry/smiles-reader';
import { AppError } from '../errors';

/**
 * A test for "contains this fragment" with openchemlib's substructure searcher.
 * @throws AppError 422 naming the query field `substructure` when the SMILES does not parse.
 */
export function substructureFilter(fragmentSmiles: string): (smiles: string | null) => boolean {
  let fragment: Molecule;
  try {
    fragment = readMolecule(fragmentSmiles);
  } catch (error) {
    throw new AppError(422, 'SMILES_INVALID', `substructure: ${(error as Error).message}`, { field: 'substructure' });
  }
  fragment.setFragment(true);
  const searcher = new SSSearcher();
  return (smiles) => {
    if (!smiles) return false;
    searcher.setMol(fragment, Molecule.fromSmiles(smiles));
    return searcher.isFragmentInMolecule();
  };
}
