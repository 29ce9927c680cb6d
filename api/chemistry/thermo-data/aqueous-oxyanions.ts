import type { ThermoRecord } from './types';
import { CODATA_KEY, NBS } from './sources';

/** Aqueous oxyanions, ammonium and iron ions (standard state m° = 1 mol/kg). */
export const AQUEOUS_OXYANIONS: readonly ThermoRecord[] = [
  { key: 'NO3(aq)^-', name: 'nitrate', dfH: -206.85, uncertainty: 0.4, source: CODATA_KEY, smiles: '[O-][N+](=O)[O-]' },
  { key: 'NO2(aq)^-', name: 'nitrite', dfH: -104.6, uncertainty: null, source: NBS, smiles: '[O-]N=O' },
  { key: 'NH4(aq)^+', name: 'ammonium', dfH: -133.26, uncertainty: 0.25, source: CODATA_KEY, smiles: '[NH4+]' },
  { key: 'SO4(aq)^2-', name: 'sulfate', dfH: -909.34, uncertainty: 0.4, source: CODATA_KEY, smiles: '[O-]S(=O)(=O)[O-]' },
  { key: 'HSO4(aq)^-', name: 'hydrogen sulfate', dfH: -886.9, uncertainty: 1, source: CODATA_KEY, smiles: 'OS(=O)(=O)[O-]' },
  { key: 'HCO3(aq)^-', name: 'hydrogen carbonate', dfH: -689.93, uncertainty: 2, source: CODATA_KEY, smiles: 'OC([O-])=O' },
  { key: 'CO3(aq)^2-', name: 'carbonate', dfH: -675.23, uncertainty: 0.25, source: CODATA_KEY, smiles: '[O-]C([O-])=O' },
  { key: 'Fe(aq)^2+', name: 'iron(II) ion', dfH: -89.1, uncertainty: null, source: NBS, smiles: '[Fe+2]' },
  { key: 'Fe(aq)^3+', name: 'iron(III) ion', dfH: -48.5, uncertainty: null, source: NBS, smiles: '[Fe+3]' },
];
