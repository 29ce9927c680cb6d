import type { ThermoRecord } from './types';
import { CODATA_KEY, ELEMENT_REFERENCE, JANAF, JPL, lookedUp } from './sources';

// 1 kcal = 4.184 kJ (thermochemical calorie).
const ORLANDO_TYNDALL = lookedUp('Orlando & Tyndall, J. Phys. Chem. 100 (1996) 19398');

/** Bromine species, gas phase unless tagged. */
export const BROMINE: readonly ThermoRecord[] = [
  { key: 'Br', name: 'bromine atom', dfH: 111.87, uncertainty: 0.12, source: CODATA_KEY, smiles: '[Br]' },
  { key: 'Br2', name: 'dibromine (gas)', dfH: 30.91, uncertainty: 0.11, source: CODATA_KEY, smiles: 'BrBr' },
  { key: 'Br2(l)', name: 'dibromine (liquid)', dfH: 0, uncertainty: 0, source: ELEMENT_REFERENCE, smiles: 'BrBr' },
  { key: 'BrO', name: 'bromine monoxide', dfH: 125.8, uncertainty: 2.4, source: JPL, smiles: '[O]Br' },
  { key: 'HBr', name: 'hydrogen bromide', dfH: -36.29, uncertainty: 0.16, source: CODATA_KEY, smiles: 'Br' },
  { key: 'HOBr', name: 'hypobromous acid', dfH: -59.0, uncertainty: 8.4, source: `${ORLANDO_TYNDALL}: −14.1 ± 2.0 kcal/mol`, smiles: 'OBr' },
  { key: 'BrCl', name: 'bromine monochloride', dfH: 14.64, uncertainty: 0.3, source: JANAF, smiles: 'ClBr' },
  { key: 'BrONO2', name: 'bromine nitrate', dfH: 42.3, uncertainty: 8.4, source: `${ORLANDO_TYNDALL}: 10.1 ± 2.0 kcal/mol`, smiles: 'BrO[N+](=O)[O-]' },
  { key: 'OBrO', name: 'bromine dioxide', dfH: 163.9, uncertainty: 4.4, source: lookedUp('Klemm et al., J. Phys. Chem. A 105 (2001) 1638'), smiles: 'O=Br[O]' },
];
