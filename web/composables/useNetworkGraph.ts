import { onBeforeUnmount, ref, shallowRef, watch, type Ref } from 'vue';
import type { Core, EventObject } from 'cytoscape';
import type { NetworkModel } from '@web/components/workbench/network/networkModel';
import { createNetworkCore, drawNetwork, updateNetworkData } from '@web/components/workbench/network/networkGraph';
import { planLayout } from '@web/components/workbench/network/networkLayout';
import { placeStepLabels } from '@web/components/workbench/network/networkStepLabels';
import { downloadBlob, graphToSvg } from '@web/components/workbench/network/networkSnapshot';

const structureOf = (model: NetworkModel) => `${model.nodes.map((n) => n.id).join('|')}#${model.edges.map((e) => e.id).join('|')}`;

/**
 * A cytoscape graph in `container`, kept in step with `model`: a new structure is laid out again;
 * a new route, selection or flux only updates the elements' data, so the picture stays put.
 */
export function useNetworkGraph(container: Ref<HTMLElement | null>, model: Ref<NetworkModel>, onStepClick: (step: string) => void) {
  const cy = shallowRef<Core | null>(null);
  const status = ref<'loading' | 'ready' | 'error'>('loading');
  const hovered = ref<{ label: string; role: string | null } | null>(null);
  let structure = '';
  /** The panel has closed: a graph still being built is dropped. */
  let closed = false;

  async function create(element: HTMLElement): Promise<void> {
    // A large graph's layout starts in its worker while cytoscape is fetched.
    const planned = planLayout(model.value);
    const instance = await createNetworkCore(element, model.value.nodes.length);
    if (closed) return void instance.destroy();
    instance.on('tap', 'node[kind = "step"]', (event: EventObject) => onStepClick(String(event.target.data('step'))));
    instance.on('mouseover', 'node', (event: EventObject) => {
      hovered.value = { label: String(event.target.data('key') ?? event.target.data('step')), role: event.target.data('role') ?? null };
    });
    instance.on('mouseout', 'node', () => (hovered.value = null));
    // A dragged node moves arrows of its neighbours: their steps' labels find free room again.
    instance.on('dragfree', 'node', () => placeStepLabels(instance));
    cy.value = instance;
    await sync(model.value, planned);
    status.value = 'ready';
  }

  async function sync(next: NetworkModel, planned?: ReturnType<typeof planLayout>): Promise<void> {
    const instance = cy.value;
    if (!instance) return;
    const nextStructure = structureOf(next);
    if (nextStructure !== structure) {
      structure = nextStructure;
      // The panel may have closed (and its graph been destroyed) while the layout ran.
      const drawn = await drawNetwork(instance, next, planned, () => structure === nextStructure && !instance.destroyed());
      // A route or selection chosen while the layout ran was not in the elements just added.
      if (drawn && model.value !== next) await sync(model.value);
      return;
    }
    updateNetworkData(instance, next);
  }

  watch(container, (element) => {
    if (element && !cy.value) create(element).catch(() => (status.value = 'error'));
  }, { immediate: true });
  watch(model, (next) => void sync(next));
  onBeforeUnmount(() => {
    closed = true;
    cy.value?.destroy();
  });

  async function exportPng(fileName: string): Promise<void> {
    const blob = await cy.value?.png({ output: 'blob-promise', full: true, scale: 2, bg: '#ffffff' });
    if (blob) downloadBlob(blob, fileName);
  }

  function exportSvg(fileName: string): void {
    if (cy.value) downloadBlob(new Blob([graphToSvg(cy.value)], { type: 'image/svg+xml' }), fileName);
  }

  const fit = () => cy.value?.fit(undefined, 24);

  return { cy, status, hovered, exportPng, exportSvg, fit };
}
