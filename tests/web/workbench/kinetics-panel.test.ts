import { afterEach, describe, expect, it, vi } from 'vitest';
import { flushPromises, mount } from '@vue/test-utils';
import type { MechanismAnalysis } from '@api/analysis/analysis.schemas';
import { installPrimeVue } from '@web/plugins/primevue';
import * as service from '@web/services/simulations';
import WorkbenchKineticsPanel from '@web/components/workbench/kinetics/WorkbenchKineticsPanel.vue';
import saltLake from '../../../examples/salt-lake-bromine.json';

vi.mock('@web/services/simulations', async (original) => ({
  ...(await original<typeof import('@web/services/simulations')>()),
  startSimulation: vi.fn(),
}));

const source = '%title Salt-lake bromine cycle\nB1: Br• + O3 -> BrO• + O2 @ 1.7e-11 * exp(-800 / T)\n';
let slugCount = 0;

function mountPanel(analysis: MechanismAnalysis | null) {
  slugCount += 1;
  return mount(WorkbenchKineticsPanel, {
    attachTo: document.body,
    props: { mechanism: { slug: `panel-${slugCount}` } as never, revision: null, source, analysis, selectedStep: null },
    global: { plugins: [{ install: installPrimeVue }] },
  });
}

afterEach(() => {
  vi.clearAllMocks();
  document.body.innerHTML = '';
});

describe('WorkbenchKineticsPanel', () => {
  it('sends the editor text and the form as typed when Run is pressed', async () => {
    vi.mocked(service.startSimulation).mockRejectedValue(new Error('stop here'));
    const wrapper = mountPanel(saltLake as unknown as MechanismAnalysis);
    await wrapper.find('#kinetics-tEnd').setValue('600');
    const rows = wrapper.findAll('tbody tr');
    const o3 = rows.find((row) => row.find('th').text() === 'O3')!;
    await o3.find('input[type="text"], input:not([type])').setValue('1e12');
    await wrapper.findAll('button').find((b) => b.text().includes('Run simulation'))!.trigger('click');
    await flushPromises();
    expect(service.startSimulation).toHaveBeenCalledTimes(1);
    const body = vi.mocked(service.startSimulation).mock.calls[0][0];
    expect(body.text).toBe(source);
    expect(body.inputs).toMatchObject({ conditions: { T: 275, P: 1 }, initial: { O3: 1e12 }, tEnd: 600, points: 200, spacing: 'log' });
    expect(wrapper.text()).toContain('stop here');
  });

  it('marks unreadable fields instead of sending', async () => {
    const wrapper = mountPanel(saltLake as unknown as MechanismAnalysis);
    await wrapper.find('#kinetics-T').setValue('warm');
    await wrapper.findAll('button').find((b) => b.text().includes('Run simulation'))!.trigger('click');
    await flushPromises();
    expect(service.startSimulation).not.toHaveBeenCalled();
    expect(wrapper.text()).toContain('“warm” is not a number');
    expect(wrapper.text()).toContain('give at least one initial concentration');
  });

  it('says what to do when there is nothing to simulate', () => {
    const empty = { ...(saltLake as unknown as MechanismAnalysis), steps: [] };
    expect(mountPanel(empty).text()).toContain('Nothing to simulate yet');
    expect(mountPanel(null).text()).toContain('Analysing the mechanism');
  });
});
