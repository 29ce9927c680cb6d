import { computed, ref, type Ref } from 'vue';
import type { MechanismAnalysis } from '@api/analysis/analysis.schemas';

/**
 * The step selected anywhere on the workbench (editor line, table row, graph node), as a step id
 * and as the editor line it sits on, per the latest analysis.
 */
export function useStepSelection(analysis: Ref<MechanismAnalysis | null>) {
  const selectedStep = ref<string | null>(null);
  const selectedLine = computed(() => analysis.value?.steps.find((step) => step.id === selectedStep.value)?.line ?? null);

  function selectStep(id: string): void {
    selectedStep.value = id;
  }

  /** The cursor moved to a line: the step on it, if any, becomes the selection. */
  function selectLine(line: number): void {
    const step = analysis.value?.steps.find((candidate) => candidate.line === line);
    if (step) selectedStep.value = step.id;
  }

  return { selectedStep, selectedLine, selectStep, selectLine };
}
