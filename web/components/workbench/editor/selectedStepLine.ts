import { StateEffect, StateField } from '@codemirror/state';
import { Decoration, EditorView, type DecorationSet } from '@codemirror/view';

/** Marks the line of the step selected anywhere on the workbench. */
export const selectLine = StateEffect.define<number | null>();

const mark = Decoration.line({ class: 'cm-selected-step', attributes: { 'data-selected-step': 'true' } });

export const selectedStepLine = StateField.define<DecorationSet>({
  create: () => Decoration.none,
  update(decorations, transaction) {
    let next = decorations.map(transaction.changes);
    for (const effect of transaction.effects) {
      if (!effect.is(selectLine)) continue;
      const line = effect.value;
      next = line === null || line > transaction.state.doc.lines
        ? Decoration.none
        : Decoration.set([mark.range(transaction.state.doc.line(line).from)]);
    }
    return next;
  },
  provide: (field) => EditorView.decorations.from(field),
});
