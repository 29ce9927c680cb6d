import { analyseMechanism } from '../chemistry/analyse';
import { builtinEnthalpy } from '../chemistry/thermo';
import type { AnalysisView } from './analysis-view';

/** Runs the engine once per saved revision; the result is stored so reads never re-analyse. */
export function analyseSource(source: string): { analysis: AnalysisView; speciesKeys: string[] } {
  const analysis = analyseMechanism(source, { enthalpy: builtinEnthalpy }) as unknown as AnalysisView;
  const mentioned = analysis.species.filter((species) => species.role !== 'third-body' && species.role !== 'photon');
  return { analysis, speciesKeys: mentioned.map((species) => species.key) };
}
