import type { Extension, Text } from '@codemirror/state';
import { Decoration, EditorView, WidgetType, type DecorationSet } from '@codemirror/view';
import { summariseRemark, type RemarkSummary } from '@web/components/review/remarkSummary';
import type { Remark } from '@web/services/reviews';
import { remarkField, remarkLinesIn, type RemarkLines } from './remarkLines';

function span(className: string, text: string): HTMLSpanElement {
  const element = document.createElement('span');
  element.className = className;
  element.textContent = text;
  return element;
}

/**
 * The remarks of one step, shown under its line: author, first line, replies and state, each a
 * button (reached with Tab from the editor) that opens the thread in the Remarks section.
 */
class RemarksUnderStep extends WidgetType {
  readonly summaries: RemarkSummary[];

  constructor(remarks: readonly Remark[], readonly open: (remarkId: number) => void) {
    super();
    this.summaries = remarks.map(summariseRemark);
  }

  override eq(other: WidgetType): boolean {
    return other instanceof RemarksUnderStep && JSON.stringify(other.summaries) === JSON.stringify(this.summaries);
  }

  override toDOM(): HTMLElement {
    const list = document.createElement('div');
    list.className = 'cm-remark-inline';
    list.setAttribute('role', 'group');
    list.setAttribute('aria-label', 'Remarks on this step');
    for (const summary of this.summaries) list.append(this.item(summary));
    return list;
  }

  private item(summary: RemarkSummary): HTMLButtonElement {
    const button = document.createElement('button');
    button.type = 'button';
    button.className = `cm-remark-inline__item cm-remark-inline__item--${summary.state}`;
    button.dataset.remarkId = String(summary.id);
    button.title = summary.hint;
    const icon = button.appendChild(document.createElement('i'));
    icon.className = summary.state === 'open' ? 'pi pi-comment' : 'pi pi-check';
    icon.setAttribute('aria-hidden', 'true');
    // Spaces between the parts, so a screen reader does not run the author into the text.
    button.append(
      span('cw-visually-hidden', 'Open remark:'), ' ',
      span('cm-remark-inline__author', summary.author), ' ',
      span('cm-remark-inline__text', summary.firstLine), ' ',
      span('cm-remark-inline__replies', summary.replies), ' ',
      span('cm-remark-inline__state', summary.state),
    );
    button.addEventListener('click', () => this.open(summary.id));
    return button;
  }

  /** The buttons handle their own clicks and keys; the editor must not move its cursor for them. */
  override ignoreEvent(): boolean {
    return true;
  }
}

const inlineTheme = EditorView.baseTheme({
  '.cm-remark-inline': {
    // Padding, not margin: the editor measures a block's box to line the gutter up with the text.
    // Inline-size containment: a long first line is cut with an ellipsis instead of widening every line.
    display: 'flex', flexDirection: 'column', gap: '2px', padding: '2px 0 4px 0.5em', contain: 'inline-size',
    fontFamily: "'Noto Sans', system-ui, sans-serif", fontSize: '0.82em', lineHeight: '1.4',
  },
  '.cm-remark-inline__item': {
    display: 'flex', gap: '0.6em', alignItems: 'baseline', width: '100%', padding: '2px 8px', textAlign: 'left',
    font: 'inherit', color: '#1b1f26', background: '#f2f5fa', border: '1px solid #dce3ee', borderLeft: '3px solid #2b4b7e',
    borderRadius: '4px', cursor: 'pointer',
  },
  '.cm-remark-inline__item:hover': { background: '#e6ecf5' },
  '.cm-remark-inline__item:focus-visible': { outline: '2px solid #2b4b7e', outlineOffset: '1px' },
  '.cm-remark-inline__item--settled': { color: '#4a515c', background: '#f6f7f9', borderLeftColor: '#8a929e' },
  '.cm-remark-inline__item i': { alignSelf: 'center', fontSize: '0.9em' },
  '.cm-remark-inline__author': { fontWeight: '600', whiteSpace: 'nowrap' },
  '.cm-remark-inline__text': { flex: '1', minWidth: '0', overflow: 'hidden', textOverflow: 'ellipsis', whiteSpace: 'nowrap' },
  '.cm-remark-inline__replies, .cm-remark-inline__state': { whiteSpace: 'nowrap', color: '#4a515c' },
  '.cm-remark-inline__state': { fontStyle: 'italic' },
});

/** The remarks of each remarked step as a block under its line (editorRemarks.ts keeps the lines current). */
export function remarkInline(lines: () => RemarkLines, open: (remarkId: number) => void): Extension {
  const widgets = remarkField(lines, (current: RemarkLines, doc: Text): DecorationSet =>
    Decoration.set(remarkLinesIn(current, doc).map(({ line, remarks }) =>
      Decoration.widget({ widget: new RemarksUnderStep(remarks, open), block: true, side: 1 }).range(line.to))));
  return [widgets, EditorView.decorations.from(widgets), inlineTheme];
}
