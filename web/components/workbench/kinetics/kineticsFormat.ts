import type { SimulationResult } from '@api/simulations/simulations.schemas';

const SUPERSCRIPT: Record<string, string> = { '-': '⁻', '0': '⁰', '1': '¹', '2': '²', '3': '³', '4': '⁴', '5': '⁵', '6': '⁶', '7': '⁷', '8': '⁸', '9': '⁹' };

/** Three significant figures; powers of ten written as ×10ⁿ beyond 10⁴ or under 10⁻²; a dash when unknown. */
export function formatQuantity(value: number | null | undefined, digits = 3): string {
  if (value === null || value === undefined || Number.isNaN(value)) return '—';
  if (value === 0) return '0';
  const magnitude = Math.abs(value);
  if (magnitude >= 1e-2 && magnitude < 1e4) return Number(value.toPrecision(digits)).toString().replace('-', '−');
  const [mantissa, exponent] = value.toExponential(digits - 1).split('e');
  const power = exponent.replace('+', '').split('').map((c) => SUPERSCRIPT[c]).join('');
  return `${mantissa.replace('-', '−')}×10${power}`;
}

export interface SteadyStateRow {
  species: string;
  value: string;
  /** Solved for by Newton, or held at its end-of-run value. */
  solved: boolean;
  endOfRun: string;
}

/** The steady state beside each species' value at the end of the run. */
export function steadyStateRows(result: SimulationResult): SteadyStateRow[] {
  const steady = result.steadyState;
  if (!steady) return [];
  const last = result.concentrations[result.concentrations.length - 1] ?? [];
  const solved = new Set(steady.solvedFor);
  return result.species.map((species, i) => ({
    species,
    value: formatQuantity(steady.concentrations[species] ?? null),
    solved: solved.has(species),
    endOfRun: formatQuantity(last[i] ?? null),
  }));
}

export interface StepContribution {
  step: string;
  rate: number;
  /** Share of the species' total production (or loss) at that time, 0…1. */
  share: number;
}

/** How each step forms (positive) and removes (negative) `species` at output time `timeIndex`, largest first. */
export function contributionsAt(result: SimulationResult, species: string, timeIndex: number): { production: StepContribution[]; loss: StepContribution[] } {
  const entries = result.byStep.filter((entry) => entry.species === species).map((entry) => ({ step: entry.step, rate: entry.rates[timeIndex] ?? 0 }));
  const side = (sign: 1 | -1) => {
    const chosen = entries.filter((e) => Math.sign(e.rate) === sign);
    const total = chosen.reduce((sum, e) => sum + Math.abs(e.rate), 0);
    return chosen
      .map((e) => ({ ...e, share: total > 0 ? Math.abs(e.rate) / total : 0 }))
      .sort((a, b) => Math.abs(b.rate) - Math.abs(a.rate));
  };
  return { production: side(1), loss: side(-1) };
}

export const formatShare = (share: number) => `${(share * 100).toFixed(share < 0.1 ? 1 : 0)} %`;

export interface RouteRow {
  name: string;
  finalRate: string;
  /** Chain length at the end of the run, or a dash without an initiation step. */
  finalChainLength: string;
  turnover: string;
}

function lastKnown(values: (number | null)[]): number | null {
  for (let i = values.length - 1; i >= 0; i -= 1) if (values[i] !== null) return values[i];
  return null;
}

/** One row per route: its rate, chain length and catalyst turnover frequency at the end of the run. */
export function routeRows(result: SimulationResult, label: (name: string) => string = (name) => name): RouteRow[] {
  return result.routes.map((route) => ({
    name: label(route.name),
    finalRate: formatQuantity(route.rates[route.rates.length - 1] ?? null),
    finalChainLength: formatQuantity(lastKnown(route.chainLength)),
    turnover: route.turnover.map((t) => `${t.catalyst}: ${formatQuantity(lastKnown(t.values))} s⁻¹`).join(', ') || '—',
  }));
}
