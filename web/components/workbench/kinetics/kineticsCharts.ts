import type { ChartConfiguration, ChartDataset } from 'chart.js';
import type { SimulationResult } from '@api/simulations/simulations.schemas';
import { ember, graphite, ink, lagoon } from '@web/plugins/palette';
import { formatQuantity } from './kineticsFormat';

/** Distinct line colours from our own scales, paired with dash patterns so colour is never the only cue. */
const SERIES = [ink[600], ember[600], lagoon[600], graphite[700], ink[300], ember[800], lagoon[800], graphite[400]];
const DASHES = [[], [6, 3], [2, 2], [8, 3, 2, 3]];

export function seriesLook(index: number) {
  return { borderColor: SERIES[index % SERIES.length], borderDash: DASHES[Math.floor(index / SERIES.length) % DASHES.length] };
}

export interface AxisOptions {
  logTime: boolean;
  logValue: boolean;
}

/** A log axis cannot show t = 0 or a zero concentration: those points are left out of it. */
function point(x: number, y: number | null, axes: AxisOptions) {
  if (y === null || (axes.logTime && x <= 0) || (axes.logValue && y <= 0)) return { x, y: null };
  return { x, y };
}

/** Axis ticks as 1×10¹², not 1,000,000,000,000.00000; a log axis labels its decades only. */
function tickLabel(value: number | string): string {
  const number = Number(value);
  if (number > 0 && Math.abs(Math.log10(number) % 1) > 1e-9 && (number >= 1e4 || number < 1e-2)) return '';
  return formatQuantity(number, 2).replace(/^1\.0×/, '');
}

/** A line chart of `series` against the run's times. */
export function timeChart(times: number[], series: { label: string; values: (number | null)[] }[], axes: AxisOptions, yTitle: string): ChartConfiguration<'line'> {
  const datasets: ChartDataset<'line', { x: number; y: number | null }[]>[] = series.map((s, i) => ({
    label: s.label, data: times.map((t, k) => point(t, s.values[k], axes)), ...seriesLook(i),
    backgroundColor: seriesLook(i).borderColor, pointRadius: 0, borderWidth: 2, spanGaps: true,
  }));
  return {
    type: 'line',
    data: { datasets },
    options: {
      animation: false, responsive: true, maintainAspectRatio: false, parsing: false, normalized: true,
      interaction: { mode: 'nearest', axis: 'x', intersect: false },
      scales: {
        x: { type: axes.logTime ? 'logarithmic' : 'linear', title: { display: true, text: 'time / s' }, ticks: { callback: tickLabel } },
        y: { type: axes.logValue ? 'logarithmic' : 'linear', title: { display: true, text: yTitle }, ticks: { callback: tickLabel } },
      },
      plugins: { legend: { position: 'bottom', labels: { boxWidth: 24, boxHeight: 2 } } },
    },
  };
}

/** Concentrations of the chosen species over time. */
export function concentrationChart(result: SimulationResult, shown: string[], axes: AxisOptions, unit: string): ChartConfiguration<'line'> {
  const series = shown.map((species) => {
    const j = result.species.indexOf(species);
    return { label: species, values: result.concentrations.map((row) => row[j] ?? null) };
  });
  return timeChart(result.times, series, axes, `concentration / ${unit}`);
}
