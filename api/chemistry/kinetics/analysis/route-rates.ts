import { factorLu, solveLu } from '../solver/dense-lu';

export interface RouteRates {
  /** rates[time][route] */
  rates: number[][];
  /** ‖σR − r‖ / ‖r‖ per time: 0 when the step rates are exactly a combination of the routes. */
  residual: number[];
}

function normalMatrix(routes: number[][]): Float64Array {
  const m = routes.length;
  const matrix = new Float64Array(m * m);
  for (let a = 0; a < m; a++) {
    for (let b = 0; b < m; b++) matrix[a * m + b] = routes[a].reduce((sum, sigma, s) => sum + sigma * routes[b][s], 0);
  }
  return matrix;
}

function relativeResidual(routes: number[][], routeRate: Float64Array, stepRate: number[]): number {
  let misfit = 0;
  let size = 0;
  stepRate.forEach((rate, s) => {
    const fitted = routes.reduce((sum, sigma, r) => sum + sigma[s] * routeRate[r], 0);
    misfit += (fitted - rate) ** 2;
    size += rate ** 2;
  });
  return size === 0 ? 0 : Math.sqrt(misfit / size);
}

/**
 * Rates of the routes from the step rates: the least-squares solution R of σ R ≈ r, with σ the
 * stoichiometric numbers (routes[route][step]), through the normal equations σᵀσ R = σᵀ r. When the
 * intermediates are at a quasi-steady state the step rates are an exact combination of a route
 * basis and the fit is exact (Horiuti–Temkin); the relative residual says how far from that a time
 * is. Returns null when the routes are linearly dependent (σᵀσ singular).
 */
export function routeRates(routes: number[][], stepRates: number[][]): RouteRates | null {
  const m = routes.length;
  if (m === 0) return { rates: stepRates.map(() => []), residual: stepRates.map(() => 0) };
  const matrix = normalMatrix(routes);
  const pivots = new Int32Array(m);
  if (!factorLu(matrix, m, pivots)) return null;
  const rates: number[][] = [];
  const residual: number[] = [];
  for (const stepRate of stepRates) {
    const rhs = Float64Array.from(routes, (sigma) => sigma.reduce((sum, value, s) => sum + value * stepRate[s], 0));
    solveLu(matrix, m, pivots, rhs);
    rates.push(Array.from(rhs));
    residual.push(relativeResidual(routes, rhs, stepRate));
  }
  return { rates, residual };
}
