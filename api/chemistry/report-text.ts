import type { MechanismAnalysis, RouteJson, StepJson } from './analysis-types';
import { counted } from './wording';

function kj(value: number | null): string {
  return value === null ? 'ΔH unknown' : `ΔH = ${value.toFixed(1)} kJ/mol`;
}

/** A lumped step's molecularity (a sum of fractions) to three decimals: `0.333`, not `0.3333333333333333`. */
function molecularityText(value: number): string {
  return Number.isInteger(value) ? String(value) : String(Number(value.toFixed(3)));
}

function stepLine(step: StepJson): string {
  const balance = step.balanced ? 'balanced' : 'NOT balanced';
  const threshold = step.thresholdNm !== null ? `, λ < ${step.thresholdNm.toFixed(0)} nm` : '';
  const enthalpy = step.balanced ? kj(step.dH) : 'no ΔH (not balanced)';
  return `  ${step.id.padEnd(8)} ${step.equation}\n           ${balance}, ${step.class}, molecularity ${molecularityText(step.molecularity)}, ${enthalpy}${threshold}`;
}

/** `1×R1 − 2×R3 + 1×R4`: a step run backwards (σ < 0) is subtracted rather than added. */
function routeSum(multipliers: Record<string, number>): string {
  const terms = Object.entries(multipliers).map(([id, value]) => ({ sign: value < 0 ? '−' : '+', text: `${Math.abs(value)}×${id}` }));
  const [first, ...rest] = terms;
  if (!first) return '';
  return [`${first.sign === '−' ? '−' : ''}${first.text}`, ...rest.map((term) => `${term.sign} ${term.text}`)].join(' ');
}

function routeLine(route: RouteJson, index: number, overall: number | null): string {
  const numbers = routeSum(route.multipliers);
  const backwards = route.reversesOneWay.length > 0 ? `runs ${route.reversesOneWay.join(', ')} backwards` : null;
  const tags = [route.kind, route.direct ? 'direct' : null, index === overall ? 'overall' : null, backwards].filter(Boolean).join(', ');
  // Photons are reactants only and M cancels, so what is left aside is the light the route absorbs.
  const aside = Object.entries(route.aside).map(([key, value]) => `${Math.abs(value)} ${key} ${value < 0 ? 'absorbed' : 'given off'}`).join(', ');
  return `  ${index + 1}. ${numbers}\n     net: ${route.net}${aside ? ` (${aside})` : ''}; ${kj(route.dH)} [${tags}]`;
}

/** The readable report of `check` (without --json). */
export function formatReport(analysis: MechanismAnalysis, fileName: string): string {
  const lines: string[] = [`${analysis.title ?? fileName}`, ''];
  lines.push(`Steps (${analysis.steps.length}):`, ...analysis.steps.map(stepLine), '');
  lines.push(`Intermediates: ${analysis.intermediates.join(', ') || 'none'}`, `  ${analysis.intermediatesExplanation}`, '');
  lines.push(`Chain carriers: ${analysis.chainCarriers.join(', ') || 'none'}`, '');
  lines.push(`Routes (${analysis.routes.length}):`, ...analysis.routes.map((route, index) => routeLine(route, index, analysis.overall)), '');
  const roles = analysis.species.map((species) => `${species.key} ${species.role}`);
  lines.push(`Roles: ${roles.join('; ') || 'none'}`, '');
  const counts = { error: 0, warning: 0, info: 0 };
  for (const item of analysis.diagnostics) counts[item.severity] += 1;
  lines.push(`Diagnostics: ${counted(counts.error, 'error')}, ${counted(counts.warning, 'warning')}, ${counted(counts.info, 'note')}`);
  for (const item of analysis.diagnostics) lines.push(`  ${fileName}:${item.line}:${item.column} ${item.severity} [${item.code}] ${item.message}`);
  return lines.join('\n');
}
