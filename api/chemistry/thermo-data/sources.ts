/**
 * Published tables the built-in values come from. Most values were written from memory of these
 * tables and their source strings say so; the few that were looked up say "looked up".
 */
const FROM_MEMORY = 'from memory';

export const JANAF = `NIST-JANAF Thermochemical Tables, 4th ed. (Chase 1998), ${FROM_MEMORY}`;
export const CODATA_KEY = `CODATA Key Values for Thermodynamics (Cox, Wagman & Medvedev 1989), ${FROM_MEMORY}`;
export const ATCT = `Active Thermochemical Tables (ATcT, Ruscic et al.; version not checked), ${FROM_MEMORY}`;
export const JPL = `NASA/JPL Evaluation No. 19-5 (Burkholder et al. 2019), ${FROM_MEMORY}`;
export const NBS = `NBS Tables of Chemical Thermodynamic Properties (Wagman et al. 1982), ${FROM_MEMORY}`;
export const PEDLEY = `Pedley, Naylor & Kirby, Thermochemical Data of Organic Compounds, 2nd ed. (1986), ${FROM_MEMORY}`;
export const WEBBOOK_JANAF = 'NIST-JANAF Thermochemical Tables (Chase 1998) as listed in the NIST Chemistry WebBook, looked up';
export const CCCBDB = 'NIST CCCBDB Release 22 (2022), experimental ΔfH(298.15 K), looked up';
// Ruscic et al., J. Phys. Chem. A 110 (2006) 6592, values printed in kcal/mol (× 4.184).
export const ATCT_2006 = lookedUp('Active Thermochemical Tables, Ruscic et al., J. Phys. Chem. A 110 (2006) 6592');
export const ATCT_1124 = lookedUp('Active Thermochemical Tables, ver. 1.124 (atct.anl.gov)');
// −ΔH°298(R + O2 → RO2) = 139.9 + 5.7·N(C–C) kJ/mol, 145.6 for ethyl; combined with ΔfH°(C2H5) of this table.
export const KNYAZEV_SLAGLE_C2H5O2 = lookedUp('Knyazev & Slagle, J. Phys. Chem. A 102 (1998) 1770, ΔH°298(C2H5 + O2 → C2H5O2) = −145.6 kJ/mol with ΔfH°(C2H5) = 119 kJ/mol (ATcT, from memory)');
export const ELEMENT_REFERENCE = 'reference state of the element: 0 by definition';

/** A source whose value was recalled only to a few kJ/mol: its uncertainty is widened to cover that. */
export function roughly(source: string): string {
  return `${source}; recalled only roughly, uncertainty widened to cover the recall`;
}

/** A value looked up in a paper, with the figure as printed when it was not in kJ/mol. */
export function lookedUp(citation: string): string {
  return `${citation}, looked up`;
}
