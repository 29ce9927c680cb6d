import { StateEffect, StateField, type RangeSet, type RangeValue, type Text } from '@codemirror/state';
import type { Remark } from '@web/services/reviews';

/** The remarks placed on the editor's lines (1-based), as useStepRemarks computes them. */
export type RemarkLines = ReadonlyMap<number, Remark[]>;

/** Sent whenever the remarks or their placement change; every remark field rebuilds from it. */
export const setRemarkLines = StateEffect.define<RemarkLines>();

/** The lines that exist in `doc`, in order, with their remarks. */
export function remarkLinesIn(lines: RemarkLines, doc: Text) {
  return [...lines]
    .filter(([line]) => line >= 1 && line <= doc.lines)
    .sort(([a], [b]) => a - b)
    .map(([line, remarks]) => ({ line: doc.line(line), remarks }));
}

/**
 * A state field of ranges built from the remark lines: rebuilt when new lines arrive, otherwise
 * moved with the text typed in between (so a marker stays on its step until the next analysis).
 */
export function remarkField<T extends RangeValue>(initial: () => RemarkLines, build: (lines: RemarkLines, doc: Text) => RangeSet<T>) {
  return StateField.define<RangeSet<T>>({
    create: (state) => build(initial(), state.doc),
    update(value, transaction) {
      const replaced = transaction.effects.find((effect) => effect.is(setRemarkLines));
      return replaced ? build(replaced.value as RemarkLines, transaction.state.doc) : value.map(transaction.changes);
    },
  });
}
