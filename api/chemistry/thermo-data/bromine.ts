import type { ThermoRecord } from './types';
import { CODATA_KEY, ELEMENT_REFERENCE, JANAF, JPL, roughly } from './sources';

/** Bromine species, gas phase unless tagged. */
export const BROMINE: readonly ThermoRecord[] = [
  { key: 'Br', name: 'bromine atom', dfH: 111.87, uncertainty: 0.12, source: CODATA_KEY, smiles: '[Br]' },
  { key: 'Br2', name: 'dibromine (gas)', dfH: 30.91, uncertainty: 0.11, source: CODATA_KEY, smiles: 'BrBr' },
  { key: 'Br2(l)', name: 'dibromine (liquid)', dfH: 0, uncertainty: 0, source: ELEMENT_REFERENCE, smiles: 'BrBr' },
  { key: 'BrO', name: 'bromine monoxide', dfH: 125.8, uncertainty: 2.4, source: JPL, smiles: '[O]Br' },
  { key: 'HBr', name: 'hydrogen bromide', dfH: -36.29, uncertainty: 0.16, source: CODATA_KEY, smiles: 'Br' },
  { key: 'HOBr', name: 'hypobromous acid', dfH: -60, uncertainty: 4, source: roughly(JPL), smiles: 'OBr' },
  { key: 'BrCl', name: 'bromine monochloride', dfH: 14.64, uncertainty: 0.3, source: JANAF, smiles: 'ClBr' },
  { key: 'BrONO2', name: 'bromine nitrate', dfH: 42, uncertainty: 8, source: roughly(JPL), smiles: 'BrO[N+](=O)[O-]' },
];
