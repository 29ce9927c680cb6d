import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it, vi } from 'vitest';
import { mount, type DOMWrapper } from '@vue/test-utils';
import type { Component } from 'vue';
import type { MechanismAnalysis } from '@api/analysis/analysis.schemas';
import { installPrimeVue } from '@web/plugins/primevue';
import WorkbenchRoutesPanel from '@web/components/workbench/WorkbenchRoutesPanel.vue';
import WorkbenchSpeciesPanel from '@web/components/workbench/WorkbenchSpeciesPanel.vue';
import WorkbenchStepsPanel from '@web/components/workbench/WorkbenchStepsPanel.vue';
import { freshPinia } from '../mount-app';

// The first mount compiles PrimeVue's DataTable, slow on a busy shared machine.
vi.setConfig({ testTimeout: 30_000 });

/** The engine's golden analysis of an example, exactly as POST /api/analyse returns it. */
function golden(name: string): MechanismAnalysis {
  return JSON.parse(readFileSync(join(import.meta.dirname, '..', '..', '..', 'examples', `${name}.json`), 'utf8')) as MechanismAnalysis;
}

function mountPanel(panel: Component, analysis: MechanismAnalysis | null, selectedStep: string | null = null) {
  return mount(panel, {
    props: { mechanism: null, revision: null, source: '', analysis, selectedStep },
    // Pinia for the review store: the Steps section shows the review round's remarks under their steps.
    global: { plugins: [freshPinia(), { install: installPrimeVue }] },
  });
}

/** Each row's cells, their text with spaces normalised, joined by " | ". */
const rowsOf = (wrapper: ReturnType<typeof mount>) =>
  wrapper.findAll('tbody tr').map((row) => row.findAll('td').map(cellText).join(' | '));

function cellText(cell: DOMWrapper<Element>): string {
  const items = cell.findAll('li');
  const text = items.length ? items.map((item) => item.text()).join(' ') : cell.text();
  return text.replace(/\s+/g, ' ').trim();
}
const bromine = golden('salt-lake-bromine');

describe('WorkbenchStepsPanel with the salt-lake bromine cycle', () => {
  it('lists every step with its class, balance and ΔH', () => {
    const rows = rowsOf(mountPanel(WorkbenchStepsPanel, bromine));
    expect(rows).toHaveLength(5);
    expect(rows[0]).toBe('B1 | Br• + O3 → BrO• + O2 | propagation | balanced | −128.7 | ');
    // Br2 + hν → 2 Br• makes radicals from a closed-shell molecule: initiation (common practice).
    expect(rows[4]).toContain('initiation');
  });

  it('gives the photolysis threshold λ = N_A·h·c / ΔH of the light-driven steps only', () => {
    const rows = rowsOf(mountPanel(WorkbenchStepsPanel, bromine));
    // 119 626.6 kJ mol⁻¹ nm / 235.2 kJ mol⁻¹ = 508.6 nm (CODATA constants, analysis.md).
    expect(rows[2]).toContain('509 nm');
    expect(rows[0]).not.toContain('nm');
  });

  it('names what an unbalanced step fails to conserve', () => {
    const rows = rowsOf(mountPanel(WorkbenchStepsPanel, golden('faulty')));
    expect(rows.find((row) => row.startsWith('F15 |'))).toContain('| O −2 |');
    expect(rows.find((row) => row.startsWith('F12 |'))).toContain('| charge −1 |');
  });

  it('gives an unbalanced step no ΔH and says why on hover', () => {
    const wrapper = mountPanel(WorkbenchStepsPanel, golden('faulty'));
    const row = wrapper.findAll('tbody tr').find((item) => item.text().startsWith('F15'));
    const enthalpy = row?.findAll('td')[4].find('span');
    expect(enthalpy?.text()).toBe('—');
    expect(enthalpy?.attributes('title')).toBe('No ΔH: the step is not balanced');
  });

  it('asks to select a step when its label is pressed, and marks the selected row', async () => {
    const wrapper = mountPanel(WorkbenchStepsPanel, bromine, 'B2');
    expect(wrapper.findAll('tbody tr')[1].classes()).toContain('workbench-steps-panel__row--selected');
    await wrapper.findAll('tbody tr')[2].find('button').trigger('click');
    expect(wrapper.emitted('select-step')).toEqual([['B3']]);
  });

  it('says the analysis is on its way before it arrives', () => {
    expect(mountPanel(WorkbenchStepsPanel, null).text()).toContain('Analysing');
  });
});

describe('WorkbenchSpeciesPanel', () => {
  it('shows electrons, radicals and roles, the catalyst and the intermediate marked in words as well as tint', () => {
    const wrapper = mountPanel(WorkbenchSpeciesPanel, bromine);
    const rows = rowsOf(wrapper);
    // Br has Z = 35, so the neutral atom has 35 electrons: an odd count, a radical (IUPAC atomic numbers).
    expect(rows[0]).toMatch(/^Br• \| 35 \| yes • \| catalyst \| 111\.9 \| CODATA/);
    expect(rows[2]).toMatch(/^BrO• \| 43 \| yes • \| intermediate \|/);
    expect(wrapper.find('.species-role-tag--catalyst').text()).toBe('catalyst');
    expect(wrapper.find('.species-role-tag--intermediate').text()).toBe('intermediate');
  });

  it('names the catalyst of the iodide-catalysed peroxide decomposition', () => {
    const rows = rowsOf(mountPanel(WorkbenchSpeciesPanel, golden('iodide-peroxide')));
    // 2 H2O2 → 2 H2O + O2 with I⁻ regenerated and IO⁻ formed then used (textbook iodide catalysis).
    expect(rows.find((row) => row.includes('| catalyst |'))).toMatch(/^I− \|/);
    expect(rows.find((row) => row.includes('| intermediate |'))).toMatch(/^IO− \|/);
  });
});

describe('WorkbenchRoutesPanel', () => {
  it('puts the overall route first with its stoichiometric numbers in step order and its net reaction', () => {
    const rows = rowsOf(mountPanel(WorkbenchRoutesPanel, bromine));
    expect(rows[0]).toBe('Overall | B1 × 3 B2 × 1 B3 × 1 B4 × 1 | 2 O3 → 3 O2 | productive | −285.3');
  });

  it('lists the other routes, null cycles said in words', () => {
    const rows = rowsOf(mountPanel(WorkbenchRoutesPanel, bromine));
    expect(rows).toHaveLength(3);
    expect(rows[1]).toBe('Route 1 | B1 × 2 B2 × 1 | 2 O3 → 3 O2 | productive, direct | −285.3');
    expect(rows[2]).toMatch(/^Route 2 \| B1 × 1 B3 × 1 B4 × 1 \| nothing: a null cycle \| null cycle/);
  });

  it('explains which species were taken as intermediates', () => {
    const text = mountPanel(WorkbenchRoutesPanel, bromine).text();
    expect(text).toContain(bromine.intermediatesExplanation);
  });

  it('lists the species routes cancel with the role the Species panel gives them (Br• a catalyst)', () => {
    const wrapper = mountPanel(WorkbenchRoutesPanel, bromine);
    expect(wrapper.text()).toContain('Cancelled in routes (intermediates and catalysts)');
    expect(wrapper.text()).not.toMatch(/(^|\s)Intermediates(\s|$)/);
    const listed = wrapper.findAll('.workbench-routes-panel__cancelled li').map((item) => item.text().replace(/\s+/g, ' ').trim());
    expect(listed).toEqual(['Br• catalyst', 'BrO• intermediate', 'O(3P) intermediate']);
  });

  it('selects a step from its stoichiometric number', async () => {
    const wrapper = mountPanel(WorkbenchRoutesPanel, bromine);
    await wrapper.find('.workbench-routes-panel__step').trigger('click');
    expect(wrapper.emitted('select-step')).toEqual([['B1']]);
  });
});
