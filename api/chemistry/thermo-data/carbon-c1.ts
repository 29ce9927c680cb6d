import type { ThermoRecord } from './types';
import { ATCT, ATCT_1124, CODATA_KEY, ELEMENT_REFERENCE, JANAF, PEDLEY, roughly } from './sources';

/** One-carbon species, gas phase unless tagged. */
export const CARBON_C1: readonly ThermoRecord[] = [
  { key: 'C(s)', name: 'graphite', dfH: 0, uncertainty: 0, source: ELEMENT_REFERENCE },
  { key: 'C', name: 'carbon atom', dfH: 716.68, uncertainty: 0.45, source: CODATA_KEY, smiles: '[C]' },
  { key: 'CO', name: 'carbon monoxide', dfH: -110.53, uncertainty: 0.17, source: CODATA_KEY, smiles: '[C-]#[O+]' },
  { key: 'CO2', name: 'carbon dioxide', dfH: -393.51, uncertainty: 0.13, source: CODATA_KEY, smiles: 'O=C=O' },
  { key: 'CH4', name: 'methane', dfH: -74.873, uncertainty: 0.34, source: JANAF, smiles: 'C' },
  { key: 'CH3', name: 'methyl radical', dfH: 146.4, uncertainty: 0.5, source: roughly(ATCT), smiles: '[CH3]' },
  { key: 'CH3O2', name: 'methylperoxy radical', dfH: 12, uncertainty: 3, source: roughly(ATCT), smiles: 'CO[O]' },
  { key: 'CH3O', name: 'methoxy radical', dfH: 21, uncertainty: 2, source: roughly(ATCT), smiles: 'C[O]' },
  { key: 'CH2O', name: 'formaldehyde', dfH: -109.229, uncertainty: 0.096, source: ATCT_1124, smiles: 'C=O' },
  // The same molecule as written in most atmospheric mechanisms (species are identified as written).
  { key: 'HCHO', name: 'formaldehyde', dfH: -109.229, uncertainty: 0.096, source: ATCT_1124, smiles: 'C=O' },
  { key: 'HCO', name: 'formyl radical', dfH: 41.8, uncertainty: 1, source: roughly(ATCT), smiles: '[CH]=O' },
  { key: 'CH3OH', name: 'methanol (gas)', dfH: -200.9, uncertainty: 1, source: roughly(ATCT), smiles: 'CO' },
  { key: 'HCOOH', name: 'formic acid (gas)', dfH: -378.6, uncertainty: 1, source: roughly(PEDLEY), smiles: 'OC=O' },
  { key: 'CH3Cl', name: 'chloromethane', dfH: -81.9, uncertainty: 1, source: roughly(PEDLEY), smiles: 'CCl' },
  { key: 'HCN', name: 'hydrogen cyanide', dfH: 135.143, uncertainty: 8.4, source: JANAF, smiles: 'C#N' },
];
