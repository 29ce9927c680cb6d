/**
 * Published tables the built-in values come from. Every value in this folder was written from
 * memory of these tables (no copy was at hand while writing); each source string says so.
 */
const FROM_MEMORY = 'from memory';

export const JANAF = `NIST-JANAF Thermochemical Tables, 4th ed. (Chase 1998), ${FROM_MEMORY}`;
export const CODATA_KEY = `CODATA Key Values for Thermodynamics (Cox, Wagman & Medvedev 1989), ${FROM_MEMORY}`;
export const ATCT = `Active Thermochemical Tables (ATcT, Ruscic et al.; version not checked), ${FROM_MEMORY}`;
export const JPL = `NASA/JPL Evaluation No. 19-5 (Burkholder et al. 2019), ${FROM_MEMORY}`;
export const NBS = `NBS Tables of Chemical Thermodynamic Properties (Wagman et al. 1982), ${FROM_MEMORY}`;
export const PEDLEY = `Pedley, Naylor & Kirby, Thermochemical Data of Organic Compounds, 2nd ed. (1986), ${FROM_MEMORY}`;
export const ELEMENT_REFERENCE = 'reference state of the element: 0 by definition';

/** A source whose value was recalled only to a few kJ/mol: its uncertainty is widened to cover that. */
export function roughly(source: string): string {
  return `${source}; recalled only roughly, uncertainty widened to cover the recall`;
}
