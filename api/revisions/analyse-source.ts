import { analyseMechanism } from '../chemistry/analyse';
import { builtinEnthalpy, type EnthalpyLookup } from '../chemistry/thermo';
import type { AnalysisView } from './analysis-view';

/**
 * Runs the engine once per saved revision; the result is stored so reads never re-analyse.
 * The services pass the analysis service's `enthalpySource`, so saved and live analyses agree.
 */
export function analyseSource(source: string, enthalpy: EnthalpyLookup = builtinEnthalpy): { analysis: AnalysisView; speciesKeys: string[] } {
  const analysis = analyseMechanism(source, { enthalpy }) as unknown as AnalysisView;
  const mentioned = analysis.species.filter((species) => species.role !== 'third-body' && species.role !== 'photon');
  return { analysis, speciesKeys: mentioned.map((species) => species.key) };
}
