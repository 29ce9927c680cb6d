import type { WorkbenchPanel } from './panelContract';

/**
 * The sections of the workbench's right half, in tab order. Each one receives
 * `WorkbenchPanelProps` and may emit `select-step` and `replace-source` (panelContract.ts);
 * add a panel by adding one entry here.
 */
export const workbenchPanels: WorkbenchPanel[] = [
  { id: 'steps', label: 'Steps', icon: 'pi pi-list', component: () => import('./WorkbenchStepsPanel.vue') },
  { id: 'species', label: 'Species', icon: 'pi pi-circle', component: () => import('./WorkbenchSpeciesPanel.vue') },
  { id: 'routes', label: 'Routes', icon: 'pi pi-sync', component: () => import('./WorkbenchRoutesPanel.vue') },
  { id: 'network', label: 'Network', icon: 'pi pi-share-alt', component: () => import('./network/WorkbenchNetworkPanel.vue') },
  { id: 'kinetics', label: 'Kinetics', icon: 'pi pi-chart-line', component: () => import('./kinetics/WorkbenchKineticsPanel.vue') },
  { id: 'review', label: 'Review', icon: 'pi pi-flag', component: () => import('./review/WorkbenchReviewPanel.vue') },
  { id: 'remarks', label: 'Remarks', icon: 'pi pi-comments', component: () => import('./review/WorkbenchRemarksPanel.vue') },
  { id: 'history', label: 'History', icon: 'pi pi-history', component: () => import('./history/WorkbenchHistoryPanel.vue') },
];
