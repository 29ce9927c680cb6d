import type { ThermoRecord } from './types';
import { CCCBDB, CODATA_KEY, ELEMENT_REFERENCE, JANAF, JPL, lookedUp, roughly, WEBBOOK_JANAF } from './sources';

const KLOBAS_WILMOUTH = lookedUp('Klobas & Wilmouth, Atmos. Chem. Phys. 19 (2019) 6205, third-law ClO/ClOOCl equilibrium');

/** Chlorine species, gas phase. */
export const CHLORINE: readonly ThermoRecord[] = [
  { key: 'Cl', name: 'chlorine atom', dfH: 121.301, uncertainty: 0.008, source: CODATA_KEY, smiles: '[Cl]' },
  { key: 'Cl2', name: 'dichlorine', dfH: 0, uncertainty: 0, source: ELEMENT_REFERENCE, smiles: 'ClCl' },
  { key: 'ClO', name: 'chlorine monoxide', dfH: 101.6, uncertainty: 0.1, source: JPL, smiles: '[O]Cl' },
  { key: 'OClO', name: 'chlorine dioxide', dfH: 95.6, uncertainty: 3, source: roughly(JPL), smiles: 'O=Cl[O]' },
  { key: 'ClOO', name: 'chlorine peroxy radical', dfH: 98, uncertainty: 4, source: roughly(JPL), smiles: '[O]OCl' },
  { key: 'Cl2O2', name: 'chlorine peroxide (ClOOCl)', dfH: 130.0, uncertainty: 0.6, source: KLOBAS_WILMOUTH, smiles: 'ClOOCl' },
  { key: 'HCl', name: 'hydrogen chloride', dfH: -92.31, uncertainty: 0.1, source: CODATA_KEY, smiles: 'Cl' },
  { key: 'HOCl', name: 'hypochlorous acid', dfH: -74.48, uncertainty: 2.1, source: `${WEBBOOK_JANAF}; uncertainty from ${CCCBDB}`, smiles: 'OCl' },
  { key: 'ClONO2', name: 'chlorine nitrate', dfH: 23, uncertainty: 3, source: roughly(JPL), smiles: 'ClO[N+](=O)[O-]' },
  { key: 'Cl2O', name: 'dichlorine monoxide', dfH: 77.2, uncertainty: 3.4, source: lookedUp('Thorn et al., J. Phys. Chem. 100 (1996) 14178'), smiles: 'ClOCl' },
  { key: 'ClNO', name: 'nitrosyl chloride', dfH: 51.71, uncertainty: 0.4, source: JANAF, smiles: 'ClN=O' },
];
