import { watch } from 'vue';
import { useRoute } from 'vue-router';
import type { Extension } from '@codemirror/state';
import { ViewPlugin } from '@codemirror/view';
import type { MechanismAnalysis } from '@api/analysis/analysis.schemas';
import { useStepRemarks } from '@web/composables/useStepRemarks';
import { remarkGutter } from './remarkGutter';
import { remarkInline } from './remarkInline';
import { setRemarkLines } from './remarkLines';

/**
 * The remarks of the mechanism's review round in progress, on the lines of their steps in the
 * text being edited: a gutter marker and the remarks under the line, each opening its thread.
 * Steps are found again by label, then normalised equation, whenever the analysis is refreshed.
 * Call while the editor component is being set up: it reads the route's mechanism and the shared
 * review store.
 */
export function editorRemarks(analysis: () => MechanismAnalysis | null, open: (remarkId: number) => void): Extension {
  // Without a router (an editor mounted on its own) there is no mechanism, hence no remarks.
  const route = useRoute() as ReturnType<typeof useRoute> | undefined;
  const { byLine } = useStepRemarks(() => (typeof route?.params.slug === 'string' ? route.params.slug : null), analysis);
  const follow = ViewPlugin.define((view) => ({ destroy: watch(byLine, (lines) => view.dispatch({ effects: setRemarkLines.of(lines) })) }));
  return [remarkGutter(() => byLine.value), remarkInline(() => byLine.value, open), follow];
}
