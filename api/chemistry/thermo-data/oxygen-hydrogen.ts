import type { ThermoRecord } from './types';
import { ATCT_2006, CODATA_KEY, ELEMENT_REFERENCE, JANAF, NBS } from './sources';


/** Oxygen and hydrogen species, gas phase unless tagged. */
export const OXYGEN_HYDROGEN: readonly ThermoRecord[] = [
  { key: 'O', name: 'oxygen atom', dfH: 249.173, uncertainty: 0.1, source: JANAF, smiles: '[O]' },
  { key: 'O2', name: 'dioxygen', dfH: 0, uncertainty: 0, source: ELEMENT_REFERENCE, smiles: 'O=O' },
  { key: 'O3', name: 'ozone', dfH: 142.674, uncertainty: 1.7, source: JANAF, smiles: '[O-][O+]=O' },
  { key: 'H', name: 'hydrogen atom', dfH: 217.999, uncertainty: 0.006, source: JANAF, smiles: '[H]' },
  { key: 'H2', name: 'dihydrogen', dfH: 0, uncertainty: 0, source: ELEMENT_REFERENCE, smiles: '[H][H]' },
  { key: 'OH', name: 'hydroxyl radical', dfH: 37.36, uncertainty: 0.13, source: `${ATCT_2006}: 8.93 ± 0.03 kcal/mol`, smiles: '[OH]' },
  { key: 'HO2', name: 'hydroperoxyl radical', dfH: 12.3, uncertainty: 0.25, source: `${ATCT_2006}: 2.94 ± 0.06 kcal/mol`, smiles: 'O[O]' },
  { key: 'H2O', name: 'water (gas)', dfH: -241.826, uncertainty: 0.04, source: CODATA_KEY, smiles: 'O' },
  { key: 'H2O(l)', name: 'water (liquid)', dfH: -285.83, uncertainty: 0.04, source: CODATA_KEY, smiles: 'O' },
  { key: 'H2O2', name: 'hydrogen peroxide (gas)', dfH: -136.31, uncertainty: null, source: NBS, smiles: 'OO' },
  { key: 'H2O2(l)', name: 'hydrogen peroxide (liquid)', dfH: -187.78, uncertainty: null, source: NBS, smiles: 'OO' },
];
