import type { ThermoRecord } from './types';
import { ATCT, JANAF, KNYAZEV_SLAGLE_C2H5O2, PEDLEY, roughly } from './sources';

/** Two- and three-carbon species, gas phase. */
export const CARBON_C2: readonly ThermoRecord[] = [
  { key: 'C2H6', name: 'ethane', dfH: -83.8, uncertainty: 0.3, source: PEDLEY, smiles: 'CC' },
  { key: 'C2H5', name: 'ethyl radical', dfH: 119, uncertainty: 2, source: roughly(ATCT), smiles: 'C[CH2]' },
  { key: 'C2H5O', name: 'ethoxy radical', dfH: -13, uncertainty: 5, source: roughly(ATCT), smiles: 'CC[O]' },
  // ΔfH°(C2H5) + ΔH°298(C2H5 + O2 → C2H5O2): 119 − 145.6 = −26.6 kJ/mol.
  { key: 'C2H5O2', name: 'ethylperoxy radical', dfH: -26.6, uncertainty: 5, source: KNYAZEV_SLAGLE_C2H5O2, smiles: 'CCO[O]' },
  { key: 'C2H4', name: 'ethene', dfH: 52.467, uncertainty: 0.3, source: JANAF, smiles: 'C=C' },
  { key: 'C2H2', name: 'ethyne', dfH: 226.731, uncertainty: 0.8, source: JANAF, smiles: 'C#C' },
  { key: 'CH3CHO', name: 'acetaldehyde', dfH: -166.1, uncertainty: 0.5, source: PEDLEY, smiles: 'CC=O' },
  { key: 'C2H5OH', name: 'ethanol (gas)', dfH: -234.8, uncertainty: 0.3, source: PEDLEY, smiles: 'CCO' },
  { key: 'C3H8', name: 'propane', dfH: -104.7, uncertainty: 0.5, source: PEDLEY, smiles: 'CCC' },
];
