import { describe, expect, it } from 'vitest';
import type { SimulationResult } from '@api/simulations/simulations.schemas';
import { ApiError } from '@web/services/http';
import { contributionsAt, formatQuantity, formatShare, routeRows, steadyStateRows } from '@web/components/workbench/kinetics/kineticsFormat';
import { errorLines } from '@web/components/workbench/kinetics/kineticsErrors';

const result = {
  species: ['Br•', 'BrO•', 'O3'],
  times: [0, 10],
  concentrations: [[0, 0, 1e12], [3.2e7, 4.56e8, 9.9e11]],
  byStep: [
    { species: 'BrO•', step: 'B1', rates: [0, 3e6] },
    { species: 'BrO•', step: 'B2', rates: [0, -2e6] },
    { species: 'BrO•', step: 'B3', rates: [0, -1e6] },
    { species: 'Br•', step: 'B1', rates: [0, -3e6] },
  ],
  routes: [{ name: 'R1', rates: [0, 1.5e6], chainLength: [null, 250], turnover: [{ catalyst: 'Br•', family: ['Br•', 'BrO•'], values: [null, 0.0031] }] }],
  steadyState: { converged: true, concentrations: { 'Br•': 3.3e7, 'BrO•': 4.6e8, O3: 9.9e11 }, solvedFor: ['Br•', 'BrO•'], iterations: 4, residual: 1e-3, conservationLaws: 1, message: null, method: 'newton' },
} as unknown as SimulationResult;

describe('formatQuantity', () => {
  it('writes three significant figures, powers of ten with superscripts and a real minus sign', () => {
    expect(formatQuantity(1.234e12)).toBe('1.23×10¹²');
    expect(formatQuantity(-4.5e-7)).toBe('−4.50×10⁻⁷');
    expect(formatQuantity(275)).toBe('275');
    expect(formatQuantity(0.0456)).toBe('0.0456');
    expect(formatQuantity(0)).toBe('0');
    expect(formatQuantity(null)).toBe('—');
  });
});

describe('result tables', () => {
  it('lists the steady state beside the end of the run, marking species held rather than solved', () => {
    expect(steadyStateRows(result)).toEqual([
      { species: 'Br•', value: '3.30×10⁷', solved: true, endOfRun: '3.20×10⁷' },
      { species: 'BrO•', value: '4.60×10⁸', solved: true, endOfRun: '4.56×10⁸' },
      { species: 'O3', value: '9.90×10¹¹', solved: false, endOfRun: '9.90×10¹¹' },
    ]);
  });

  it('splits a species’ budget into forming and removing steps with their shares, largest first', () => {
    const { production, loss } = contributionsAt(result, 'BrO•', 1);
    expect(production).toEqual([{ step: 'B1', rate: 3e6, share: 1 }]);
    expect(loss.map((c) => [c.step, c.share])).toEqual([['B2', 2 / 3], ['B3', 1 / 3]]);
    expect(formatShare(2 / 3)).toBe('67 %');
    expect(formatShare(0.042)).toBe('4.2 %');
  });

  it('gives each route’s last rate, chain length and catalyst turnover', () => {
    expect(routeRows(result, (name) => `route ${name}`)).toEqual([
      { name: 'route R1', finalRate: '1.50×10⁶', finalChainLength: '250', turnover: 'Br•: 3.10×10⁻³ s⁻¹' },
    ]);
  });
});

describe('errorLines', () => {
  it('puts the message first, then where: zod issues, diagnostics, steps, unknown species', () => {
    const zod = new ApiError(400, 'VALIDATION_FAILED', 'Invalid input', [{ path: ['inputs', 'tEnd'], message: 'Too small' }]);
    expect(errorLines(zod)).toEqual(['Invalid input', 'inputs.tEnd: Too small']);
    const parse = new ApiError(422, 'PARSE_FAILED', 'The mechanism has 1 error(s)', { diagnostics: [{ line: 3, column: 7, message: 'unbalanced: Br −1' }] });
    expect(errorLines(parse)).toEqual(['The mechanism has 1 error(s)', 'line 3, column 7: unbalanced: Br −1']);
    const rate = new ApiError(422, 'NOT_SIMULABLE', 'Give a rate constant', { steps: [{ id: 'N1', line: 1 }] });
    expect(errorLines(rate)).toEqual(['Give a rate constant', 'line 1: step N1']);
    const unknown = new ApiError(400, 'UNKNOWN_SPECIES', 'Not species', { field: 'inputs.initial', unknown: ['XYZ'] });
    expect(errorLines(unknown)).toEqual(['Not species', 'unknown species: XYZ']);
    expect(errorLines(null)).toEqual([]);
  });
});
