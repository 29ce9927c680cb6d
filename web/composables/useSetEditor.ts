import { computed, reactive, ref, watch } from 'vue';
import { ApiError } from '@web/services/http';
import { createSet, updateSet, type MechanismChoice, type SetDetail, type SetInput } from '@web/services/sets';
import { fieldErrorsOf, type FieldErrors } from './setEditorErrors';

/** The mechanism chosen for a row: enough to name it and offer its revisions. */
export type ChosenMechanism = Pick<MechanismChoice, 'slug' | 'title' | 'latestRevision' | 'referenceRevision'>;

export interface SetEditorRow {
  /** Stable across moves, so Vue keeps each row's picker and its typed text with the row. */
  key: number;
  mechanism: ChosenMechanism | null;
  revision: number | null;
  note: string;
}

let nextKey = 1;
const emptyRow = (): SetEditorRow => ({ key: nextKey++, mechanism: null, revision: null, note: '' });

function rowsOf(set: SetDetail | undefined): SetEditorRow[] {
  if (!set || set.items.length === 0) return [emptyRow()];
  return set.items.map((item) => ({ key: nextKey++, mechanism: item.mechanism, revision: item.revision, note: item.note }));
}

/** The errors found before asking the server, worded as the server words them. */
function localErrors(title: string, rows: SetEditorRow[]): FieldErrors {
  const errors: FieldErrors = {};
  if (title.trim() === '') errors.title = 'Give the set a title';
  rows.forEach((row, index) => {
    if (!row.mechanism) errors[`items.${index}.mechanism`] = `Mechanism ${index + 1}: choose a mechanism`;
    else if (row.revision === null) errors[`items.${index}.revision`] = `Mechanism ${index + 1}: choose a revision`;
  });
  return errors;
}

/**
 * The new-set and edit-set form: its values, the messages placed at each field, and saving. A
 * failed save keeps every value as typed, so nothing is lost; only the messages change.
 */
export function useSetEditor(existing?: SetDetail) {
  const values = reactive({ title: existing?.title ?? '', audience: existing?.audience ?? '', rows: rowsOf(existing) });
  const errors = ref<FieldErrors>({});
  const failure = ref<string | null>(null);
  const saving = ref(false);
  const hasErrors = computed(() => Object.keys(errors.value).length > 0);

  // A message goes once its field is edited; the others stay until the next save.
  const drop = (matches: (path: string) => boolean) => {
    errors.value = Object.fromEntries(Object.entries(errors.value).filter(([path]) => !matches(path)));
  };
  const rowState = () => values.rows.map((row) => `${row.key}|${row.mechanism?.slug}|${row.revision}|${row.note}`);
  watch(() => values.title, () => drop((path) => path === 'title'));
  watch(() => values.audience, () => drop((path) => path === 'audience'));
  watch(rowState, (now, before) => {
    // Rows moved or removed renumber the items, so their messages no longer fit.
    const keyAt = (states: string[], at: number) => states[at]?.split('|')[0];
    if (now.length < before.length || before.some((_, at) => keyAt(now, at) !== keyAt(before, at))) {
      drop((path) => path.startsWith('items'));
      return;
    }
    before.forEach((state, at) => {
      if (state !== now[at]) drop((path) => path.startsWith(`items.${at}.`));
    });
  });

  const addRow = () => values.rows.push(emptyRow());
  const removeRow = (index: number) => values.rows.splice(index, 1);
  function moveRow(index: number, by: -1 | 1): void {
    const [row] = values.rows.splice(index, 1);
    values.rows.splice(index + by, 0, row);
  }

  /** A newly chosen mechanism starts at its adopted revision, else its latest. */
  function choose(index: number, mechanism: ChosenMechanism | null): void {
    const row = values.rows[index];
    row.mechanism = mechanism;
    row.revision = mechanism ? (mechanism.referenceRevision ?? mechanism.latestRevision) : null;
  }

  const input = (): SetInput => ({
    title: values.title.trim(), audience: values.audience.trim(),
    items: values.rows.map((row) => ({ mechanism: row.mechanism!.slug, revision: row.revision!, note: row.note.trim() })),
  });

  async function save(): Promise<SetDetail | null> {
    failure.value = null;
    errors.value = localErrors(values.title, values.rows);
    if (hasErrors.value) return null;
    saving.value = true;
    try {
      return existing ? await updateSet(existing.id, input()) : await createSet(input());
    } catch (caught) {
      const placed = caught instanceof ApiError ? fieldErrorsOf(caught) : null;
      if (placed && Object.keys(placed).length > 0) errors.value = placed;
      else failure.value = caught instanceof Error ? caught.message : String(caught);
      return null;
    } finally {
      saving.value = false;
    }
  }

  return { values, errors, failure, saving, hasErrors, addRow, removeRow, moveRow, choose, save };
}
