/** One row of the built-in enthalpy table. */
export interface ThermoRecord {
  /** Table key: formula, state tag for condensed phases, charge (`Br2(l)`, `Cl(aq)^-`); gases untagged. */
  key: string;
  /** ΔfH°(298.15 K), kJ/mol. */
  dfH: number;
  /** Uncertainty as given by the source (kJ/mol), or null when the source gives none. */
  uncertainty: number | null;
  /** The published table the value comes from, with "from memory" when it was not looked up. */
  source: string;
  /** Optional structure as SMILES (radical SMILES for open-shell species). */
  smiles?: string;
  name: string;
}
