import { afterEach, describe, expect, it, vi } from 'vitest';
import { forEachDiagnostic } from '@codemirror/lint';
import { EditorState } from '@codemirror/state';
import { EditorView } from '@codemirror/view';
import type { Diagnostic } from '@grammar/diagnostics';
import { LiveDiagnostics } from '@web/components/workbench/editor/liveDiagnostics';

// NO + O3 → NO2 + O2 and NO2 + O → NO + O2: the NOx ozone cycle (Finlayson-Pitts & Pitts, ch. 12; from memory).
const TEXT = 'N1: NO• + O3 -> NO2• + O2\nN2: NO2• + O -> NO• + O2\n';
const SERVER_NOTE: Diagnostic = { severity: 'warning', line: 2, column: 1, code: 'enthalpy-missing', message: 'no ΔfH for O', found: 'N2:' };

let view: EditorView;
afterEach(() => view.destroy());

function editor(text: string) {
  let live: LiveDiagnostics | null = null;
  view = new EditorView({
    parent: document.body,
    state: EditorState.create({ doc: text, extensions: [EditorView.updateListener.of((update) => update.docChanged && live?.onChange(update))] }),
  });
  live = new LiveDiagnostics(view);
  return live;
}

/** The marks CodeMirror shows now: message and the text under each. */
function shown(): { message: string; text: string }[] {
  const marks: { message: string; text: string }[] = [];
  forEachDiagnostic(view.state, (d, from, to) => marks.push({ message: d.message, text: view.state.sliceDoc(from, to) }));
  return marks;
}

/** Types `text` at `at`; returns how many transactions followed the typing's own. */
function typeAt(at: number, text: string): number {
  const dispatch = vi.spyOn(view, 'dispatch');
  view.dispatch({ changes: { from: at, insert: text } });
  const after = dispatch.mock.calls.length - 1;
  dispatch.mockRestore();
  return after;
}

describe('LiveDiagnostics', () => {
  it('takes the server’s findings only for the text on screen', () => {
    const live = editor(TEXT);
    expect(live.setServer([SERVER_NOTE], `${TEXT}N3: O3 -> O2 + O\n`)).toBe(false);
    expect(shown()).toEqual([]);
    expect(live.setServer([SERVER_NOTE], TEXT)).toBe(true);
    expect(shown()).toEqual([{ message: 'no ΔfH for O', text: 'N2:' }]);
  });

  it('moves the findings along with typing elsewhere, without handing CodeMirror a new set', () => {
    const live = editor(TEXT);
    live.setServer([SERVER_NOTE], TEXT);
    expect(typeAt(0, '# the NOx cycle\n')).toBe(0);
    expect(typeAt(view.state.doc.length, 'N3: O3 -> O2 + O\n')).toBe(0);
    expect(shown()).toEqual([{ message: 'no ΔfH for O', text: 'N2:' }]);
  });

  it('shows a syntax error on the edited line at once, and drops it when the line is mended', () => {
    editor(TEXT);
    const end = view.state.doc.length;
    expect(typeAt(end, 'N3: O3 -> ')).toBe(1);
    expect(shown()).toHaveLength(1);
    expect(shown()[0].text).toBe('->');
    expect(typeAt(view.state.doc.length, 'O2 + O')).toBe(1);
    expect(shown()).toEqual([]);
  });
});
