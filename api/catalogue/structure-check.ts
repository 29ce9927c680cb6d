import { checkStructureMatches, parseSmiles, type StructureInfo } from '../chemistry/structure';
import { AppError } from '../errors';
import type { CatalogueStructure } from './catalogue.schemas';
import type { WrittenSpecies } from './written-species';

/**
 * Reads a SMILES and checks it against the written species.
 * @throws AppError 422 `SMILES_INVALID` when it does not parse, `STRUCTURE_MISMATCH` when its
 *   formula or charge differ from the written formula; both name the field `smiles`.
 */
export function checkedStructure(smiles: string, written: WrittenSpecies): StructureInfo {
  let info: StructureInfo;
  try {
    info = parseSmiles(smiles);
  } catch (error) {
    throw new AppError(422, 'SMILES_INVALID', `smiles: ${(error as Error).message}`, { field: 'smiles' });
  }
  const problems = checkStructureMatches(smiles, written.elements, written.charge);
  if (problems.length > 0) {
    throw new AppError(422, 'STRUCTURE_MISMATCH', `smiles does not match formula ${written.key}: ${problems.join('; ')}`, {
      field: 'smiles', structureFormula: info.formula, structureCharge: info.charge,
    });
  }
  return info;
}

/** What the structure says, for the entry's JSON (the depiction has its own address). */
export function structureSummary(smiles: string | null): CatalogueStructure | null {
  if (!smiles) return null;
  const { formula, charge, formalCharges, unpairedElectrons, oddElectrons } = parseSmiles(smiles);
  return { formula, charge, formalCharges, unpairedElectrons, oddElectrons };
}
