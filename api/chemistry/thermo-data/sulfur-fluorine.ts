import type { ThermoRecord } from './types';
import { CODATA_KEY, ELEMENT_REFERENCE, JANAF, roughly, WEBBOOK_JANAF } from './sources';

/** Sulfur and fluorine species, gas phase unless tagged. */
export const SULFUR_FLUORINE: readonly ThermoRecord[] = [
  { key: 'S(s)', name: 'sulfur (rhombic)', dfH: 0, uncertainty: 0, source: ELEMENT_REFERENCE },
  { key: 'S', name: 'sulfur atom', dfH: 277.17, uncertainty: 0.15, source: CODATA_KEY, smiles: '[S]' },
  { key: 'SO2', name: 'sulfur dioxide', dfH: -296.81, uncertainty: 0.2, source: CODATA_KEY, smiles: 'O=S=O' },
  { key: 'SO3', name: 'sulfur trioxide', dfH: -395.77, uncertainty: 0.7, source: JANAF, smiles: 'O=S(=O)=O' },
  { key: 'H2SO4', name: 'sulfuric acid (gas)', dfH: -735.1, uncertainty: 8, source: roughly(JANAF), smiles: 'OS(=O)(=O)O' },
  { key: 'H2S', name: 'hydrogen sulfide', dfH: -20.6, uncertainty: 0.5, source: CODATA_KEY, smiles: 'S' },
  { key: 'OCS', name: 'carbonyl sulfide', dfH: -138.41, uncertainty: null, source: WEBBOOK_JANAF, smiles: 'O=C=S' },
  { key: 'F', name: 'fluorine atom', dfH: 79.38, uncertainty: 0.3, source: CODATA_KEY, smiles: '[F]' },
  { key: 'F2', name: 'difluorine', dfH: 0, uncertainty: 0, source: ELEMENT_REFERENCE, smiles: 'FF' },
  { key: 'HF', name: 'hydrogen fluoride', dfH: -273.3, uncertainty: 0.7, source: CODATA_KEY, smiles: 'F' },
];
