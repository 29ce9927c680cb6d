import type { ThermoRecord } from './types';
import { CODATA_KEY, ELEMENT_REFERENCE, JPL, NBS, roughly } from './sources';

/** Iodine species, gas phase unless tagged. */
export const IODINE: readonly ThermoRecord[] = [
  { key: 'I', name: 'iodine atom', dfH: 106.76, uncertainty: 0.04, source: CODATA_KEY, smiles: '[I]' },
  { key: 'I2', name: 'diiodine (gas)', dfH: 62.42, uncertainty: 0.08, source: CODATA_KEY, smiles: 'II' },
  { key: 'I2(s)', name: 'diiodine (solid)', dfH: 0, uncertainty: 0, source: ELEMENT_REFERENCE, smiles: 'II' },
  { key: 'IO', name: 'iodine monoxide', dfH: 123, uncertainty: 10, source: roughly(JPL), smiles: '[O]I' },
  { key: 'HI', name: 'hydrogen iodide', dfH: 26.5, uncertainty: 0.1, source: CODATA_KEY, smiles: 'I' },
  { key: 'ICl', name: 'iodine monochloride', dfH: 17.78, uncertainty: null, source: NBS, smiles: 'ClI' },
  { key: 'IBr', name: 'iodine monobromide', dfH: 40.84, uncertainty: null, source: NBS, smiles: 'BrI' },
];
