import type { ThermoRecord } from './types';
import { ATCT_2006, CCCBDB, ELEMENT_REFERENCE, JANAF, NBS, WEBBOOK_JANAF } from './sources';

/** Nitrogen species, gas phase. */
export const NITROGEN: readonly ThermoRecord[] = [
  { key: 'N', name: 'nitrogen atom', dfH: 472.683, uncertainty: 0.4, source: JANAF, smiles: '[N]' },
  { key: 'N2', name: 'dinitrogen', dfH: 0, uncertainty: 0, source: ELEMENT_REFERENCE, smiles: 'N#N' },
  { key: 'NO', name: 'nitric oxide', dfH: 91.04, uncertainty: 0.08, source: `${ATCT_2006}: 21.76 ± 0.02 kcal/mol`, smiles: '[N]=O' },
  { key: 'NO2', name: 'nitrogen dioxide', dfH: 33.97, uncertainty: 0.08, source: `${ATCT_2006}: 8.12 ± 0.02 kcal/mol`, smiles: '[O]N=O' },
  { key: 'NO3', name: 'nitrate radical', dfH: 73.7, uncertainty: 1.4, source: `${CCCBDB} (ref. 1993Dav/Kim)`, smiles: '[O][N+](=O)[O-]' },
  { key: 'N2O', name: 'nitrous oxide', dfH: 82.05, uncertainty: 0.4, source: JANAF, smiles: '[N-]=[N+]=O' },
  { key: 'N2O4', name: 'dinitrogen tetroxide', dfH: 9.079, uncertainty: 0.2, source: JANAF, smiles: '[O-][N+](=O)[N+]([O-])=O' },
  { key: 'N2O5', name: 'dinitrogen pentoxide', dfH: 11.3, uncertainty: null, source: NBS, smiles: '[O-][N+](=O)O[N+]([O-])=O' },
  { key: 'HNO3', name: 'nitric acid', dfH: -134.306, uncertainty: 0.42, source: `${WEBBOOK_JANAF} (uncertainty from memory)`, smiles: 'O[N+](=O)[O-]' },
  { key: 'HONO', name: 'nitrous acid (trans)', dfH: -78.94, uncertainty: 0.6, source: `${CCCBDB} (Gurvich, trans)`, smiles: 'ON=O' },
  { key: 'NH3', name: 'ammonia', dfH: -45.898, uncertainty: 0.4, source: JANAF, smiles: 'N' },
];
