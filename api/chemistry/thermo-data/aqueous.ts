import type { ThermoRecord } from './types';
import { CODATA_KEY, NBS } from './sources';

// Conventional ionic values: ΔfH°(H⁺, aq) = 0 by definition.
const ION_CONVENTION = 'convention for aqueous ions: ΔfH°(H⁺, aq) = 0';

/** Aqueous species (standard state m° = 1 mol/kg), keyed formula(aq)^charge. */
export const AQUEOUS: readonly ThermoRecord[] = [
  { key: 'H(aq)^+', name: 'hydrogen ion', dfH: 0, uncertainty: 0, source: ION_CONVENTION, smiles: '[H+]' },
  { key: 'OH(aq)^-', name: 'hydroxide', dfH: -230.015, uncertainty: 0.04, source: CODATA_KEY, smiles: '[OH-]' },
  { key: 'H2O2(aq)', name: 'hydrogen peroxide (aq)', dfH: -191.17, uncertainty: null, source: NBS, smiles: 'OO' },
  { key: 'O2(aq)', name: 'dissolved dioxygen', dfH: -11.7, uncertainty: null, source: NBS, smiles: 'O=O' },
  { key: 'Na(aq)^+', name: 'sodium ion', dfH: -240.34, uncertainty: 0.06, source: CODATA_KEY, smiles: '[Na+]' },
  { key: 'Cl(aq)^-', name: 'chloride', dfH: -167.08, uncertainty: 0.1, source: CODATA_KEY, smiles: '[Cl-]' },
  { key: 'Br(aq)^-', name: 'bromide', dfH: -121.41, uncertainty: 0.15, source: CODATA_KEY, smiles: '[Br-]' },
  { key: 'I(aq)^-', name: 'iodide', dfH: -56.78, uncertainty: 0.05, source: CODATA_KEY, smiles: '[I-]' },
  { key: 'Cl2(aq)', name: 'dissolved chlorine', dfH: -23.4, uncertainty: null, source: NBS, smiles: 'ClCl' },
  { key: 'Br2(aq)', name: 'dissolved bromine', dfH: -2.59, uncertainty: null, source: NBS, smiles: 'BrBr' },
  { key: 'I2(aq)', name: 'dissolved iodine', dfH: 22.6, uncertainty: null, source: NBS, smiles: 'II' },
  { key: 'HOCl(aq)', name: 'hypochlorous acid (aq)', dfH: -120.9, uncertainty: null, source: NBS, smiles: 'OCl' },
  { key: 'ClO(aq)^-', name: 'hypochlorite', dfH: -107.1, uncertainty: null, source: NBS, smiles: '[O-]Cl' },
  { key: 'HOBr(aq)', name: 'hypobromous acid (aq)', dfH: -113, uncertainty: null, source: NBS, smiles: 'OBr' },
  { key: 'BrO(aq)^-', name: 'hypobromite', dfH: -94.1, uncertainty: null, source: NBS, smiles: '[O-]Br' },
  { key: 'Br3(aq)^-', name: 'tribromide', dfH: -130.4, uncertainty: null, source: NBS },
  { key: 'HOI(aq)', name: 'hypoiodous acid (aq)', dfH: -138.1, uncertainty: null, source: NBS, smiles: 'OI' },
  { key: 'IO(aq)^-', name: 'hypoiodite', dfH: -107.5, uncertainty: null, source: NBS, smiles: '[O-]I' },
  { key: 'I3(aq)^-', name: 'triiodide', dfH: -51.5, uncertainty: null, source: NBS },
  { key: 'IO3(aq)^-', name: 'iodate', dfH: -221.3, uncertainty: null, source: NBS, smiles: '[O-]I(=O)=O' },
];
