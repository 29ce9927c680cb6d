import { RangeSet, type Extension, type Text } from '@codemirror/state';
import { EditorView, gutter, GutterMarker } from '@codemirror/view';
import type { Remark } from '@web/services/reviews';
import { remarkField, remarkLinesIn, type RemarkLines } from './remarkLines';

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

const markersFor = (lines: RemarkLines, doc: Text): RangeSet<GutterMarker> =>
  RangeSet.of(remarkLinesIn(lines, doc).map(({ line, remarks }) => new RemarkMarker(remarks).range(line.from)));

const remarkTheme = EditorView.baseTheme({
  '.cm-remark-gutter': { minWidth: '1.6em' },
  '.cm-remark-marker': { display: 'inline-flex', gap: '1px', alignItems: 'center', cursor: 'default', fontSize: '0.8em', color: '#213c68' },
  '.cm-remark-marker--settled': { opacity: '0.45' },
});

/** Gutter markers on the lines of remarked steps (editorRemarks.ts keeps the lines current). */
export function remarkGutter(lines: () => RemarkLines): Extension {
  const markers = remarkField(lines, markersFor);
  return [markers, gutter({ class: 'cm-remark-gutter', markers: (view) => view.state.field(markers) }), remarkTheme];
}
