import type { MechanismAnalysis } from '@api/analysis/analysis.schemas';
import type { MechanismSummary, RevisionSummary } from '@web/services/mechanisms';

export type { MechanismSummary, RevisionSummary };

/**
 * What the workbench gives every panel on its right half. A new mechanism that is not saved
 * yet has no `mechanism` and no `revision`; `analysis` is null until the first analysis
 * arrives; `source` is the editor's current text (possibly unsaved).
 */
export interface WorkbenchPanelProps {
  mechanism: MechanismSummary | null;
  revision: RevisionSummary | null;
  source: string;
  analysis: MechanismAnalysis | null;
  /** The step id (`B2`, or `#3` for an unlabelled step) selected anywhere on the workbench. */
  selectedStep: string | null;
}

/**
 * What a panel may ask of the workbench: select a step everywhere, replace the editor's text, or
 * open a remark's thread in the Remarks section. (Review acts need no event: the review stores
 * tell the header and the queues, stores/reviewActivity.ts.)
 */
export interface WorkbenchPanelEmits {
  'select-step': [stepId: string];
  'replace-source': [text: string];
  'open-remark': [remarkId: number];
}

/** One entry of the panel registry (workbenchPanels.ts). */
export interface WorkbenchPanel {
  /** Stable id, also the tab's value and part of the URL hash. */
  id: string;
  label: string;
  /** A primeicons class, e.g. `pi pi-list`. */
  icon: string;
  /** Loaded only when the tab is first opened, to keep the workbench's first load small. */
  component: () => Promise<{ default: unknown }>;
}
