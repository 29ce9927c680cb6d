import { watch } from 'vue';
import { useRoute } from 'vue-router';
import { RangeSet, StateEffect, StateField, type Extension, type Text } from '@codemirror/state';
import { EditorView, gutter, GutterMarker, ViewPlugin } from '@codemirror/view';
import type { MechanismAnalysis } from '@api/analysis/analysis.schemas';
import { useStepRemarks } from '@web/composables/useStepRemarks';
import type { Remark } from '@web/services/reviews';

/** A speech-bubble marker beside a step line: how many remarks, and what they say on hover. */
class RemarkMarker extends GutterMarker {
  constructor(readonly remarks: readonly Remark[]) {
    super();
  }

  override eq(other: GutterMarker): boolean {
    return other instanceof RemarkMarker && other.remarks.map((r) => r.id).join() === this.remarks.map((r) => r.id).join();
  }

  override toDOM(): Node {
    const marker = document.createElement('span');
    const open = this.remarks.filter((r) => r.state === 'open').length;
    marker.className = open > 0 ? 'cm-remark-marker' : 'cm-remark-marker cm-remark-marker--settled';
    const icon = marker.appendChild(document.createElement('i'));
    icon.className = 'pi pi-comment';
    if (this.remarks.length > 1) marker.append(String(this.remarks.length));
    marker.title = this.remarks.map((r) => `${r.authorName} (${r.state}): ${r.body}`).join('\n\n');
    marker.setAttribute('aria-label', `${this.remarks.length} remark${this.remarks.length > 1 ? 's' : ''}, ${open} open`);
    return marker;
  }
}

const setRemarkLines = StateEffect.define<ReadonlyMap<number, Remark[]>>();

function markersFor(lines: ReadonlyMap<number, Remark[]>, doc: Text): RangeSet<GutterMarker> {
  const ranges = [...lines]
    .filter(([line]) => line >= 1 && line <= doc.lines)
    .sort(([a], [b]) => a - b)
    .map(([line, remarks]) => new RemarkMarker(remarks).range(doc.line(line).from));
  return RangeSet.of(ranges);
}

const remarkTheme = EditorView.baseTheme({
  '.cm-remark-gutter': { minWidth: '1.6em' },
  '.cm-remark-marker': { display: 'inline-flex', gap: '1px', alignItems: 'center', cursor: 'default', fontSize: '0.8em', color: '#213c68' },
  '.cm-remark-marker--settled': { opacity: '0.45' },
});

/**
 * Gutter markers for the remarks of the mechanism's review round in progress, on the lines of
 * their steps in the text being edited (found again by label, then normalised equation, whenever
 * the analysis is refreshed; moved with the text in between). Call while the editor component is
 * being set up or mounted: it reads the route's mechanism and the shared review store.
 */
export function remarkGutter(analysis: () => MechanismAnalysis | null): Extension {
  // Without a router (an editor mounted on its own) there is no mechanism, hence no remarks.
  const route = useRoute() as ReturnType<typeof useRoute> | undefined;
  const { byLine } = useStepRemarks(() => (typeof route?.params.slug === 'string' ? route.params.slug : null), analysis);
  const markers = StateField.define<RangeSet<GutterMarker>>({
    create: (state) => markersFor(byLine.value, state.doc),
    update(value, transaction) {
      const replaced = transaction.effects.find((effect) => effect.is(setRemarkLines));
      return replaced ? markersFor(replaced.value as ReadonlyMap<number, Remark[]>, transaction.state.doc) : value.map(transaction.changes);
    },
  });
  const follow = ViewPlugin.define((view) => ({ destroy: watch(byLine, (lines) => view.dispatch({ effects: setRemarkLines.of(lines) })) }));
  return [markers, gutter({ class: 'cm-remark-gutter', markers: (view) => view.state.field(markers) }), follow, remarkTheme];
}
