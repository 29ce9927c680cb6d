import { describe, expect, it } from 'vitest';
import { mount } from '@vue/test-utils';
import type { SimulationResult } from '@api/simulations/simulations.schemas';
import { installPrimeVue } from '@web/plugins/primevue';
import WorkbenchKineticsPanelSteadyState from '@web/components/workbench/kinetics/WorkbenchKineticsPanelSteadyState.vue';

function resultWith(converged: boolean): SimulationResult {
  return {
    species: ['N2O5', 'NO2'],
    concentrations: [[1e15, 0], [1e15, 1e13]],
    steadyState: {
      converged, iterations: 3, residual: 1e12, conservationLaws: 0, method: 'integrate-then-newton',
      message: converged ? null : 'The rate equations do not pin every species down here. At the last estimate NO2 is still rising.',
      concentrations: { N2O5: 1e15, NO2: 7.6e26 }, solvedFor: ['NO2'],
    },
  } as unknown as SimulationResult;
}

const mountSteady = (converged: boolean) => mount(WorkbenchKineticsPanelSteadyState, {
  props: { result: resultWith(converged), unit: 'molecule cm^-3' },
  global: { plugins: [{ install: installPrimeVue }] },
});

describe('the steady-state table', () => {
  it('labels the values of a run that did not converge as the last estimate, not a steady state', () => {
    const text = mountSteady(false).text();
    expect(text).toContain('Did not converge');
    expect(text).toContain('Last estimate, not steady (molecule cm^-3)');
    expect(text).toContain('not converged');
    expect(text).not.toContain('Steady state (molecule cm^-3)');
    expect(text).toContain('NO2 is still rising');
  });

  it('shows a converged steady state as solved', () => {
    const text = mountSteady(true).text();
    expect(text).toContain('Steady state (molecule cm^-3)');
    expect(text).toMatch(/NO2.*yes/);
  });
});
