import { reactive, ref } from 'vue';
import { ApiError } from '@web/services/http';
import { fieldErrorsOf } from '@web/services/validation';
import { createCatalogueEntry, updateCatalogueEntry, type CatalogueEntry, type CatalogueEntryInput } from '@web/services/catalogue';

export type EntryField = keyof CatalogueEntryInput;

const blank = (): CatalogueEntryInput => ({ name: '', formula: '', smiles: null, dfH: null, dfHUncertainty: null, dfHSource: null, notes: '' });

/** The field an API error is about: `details.field` (422/409) or the first zod path (400). */
function fieldOf(error: ApiError): string | null {
  const details = error.details as { field?: string } | Array<{ path: string[] }> | undefined;
  if (Array.isArray(details)) return details[0]?.path[0] ?? null;
  return details?.field ?? null;
}

/** A curator's add/edit form for one catalogue entry; the server checks formula and structure. */
export function useCatalogueEntryForm() {
  const values = reactive<CatalogueEntryInput>(blank());
  const editingId = ref<number | null>(null);
  const fieldErrors = reactive<Partial<Record<EntryField, string>>>({});
  const formError = ref<string | null>(null);
  const saving = ref(false);

  function clearErrors(): void {
    for (const key of Object.keys(fieldErrors)) delete fieldErrors[key as EntryField];
    formError.value = null;
  }

  function open(entry: CatalogueEntry | null): void {
    const { name, formula, smiles, dfH, dfHUncertainty, dfHSource, notes } = entry ?? blank();
    Object.assign(values, { name, formula, smiles, dfH, dfHUncertainty, dfHSource, notes });
    editingId.value = entry?.id ?? null;
    clearErrors();
  }

  async function submit(): Promise<CatalogueEntry | null> {
    saving.value = true;
    clearErrors();
    const input = { ...values, smiles: values.smiles?.trim() || null, dfHSource: values.dfHSource?.trim() || null };
    try {
      return editingId.value === null ? await createCatalogueEntry(input) : await updateCatalogueEntry(editingId.value, input);
    } catch (caught) {
      const error = caught instanceof ApiError ? caught : new ApiError(0, 'UNKNOWN', String(caught));
      // A refused input: each field's own sentence, not the validator's "Invalid input — field:" summary.
      const refused = Object.entries(fieldErrorsOf(error)).filter(([field]) => field in values);
      if (refused.length > 0) {
        for (const [field, message] of refused) fieldErrors[field as EntryField] = message;
        return null;
      }
      const field = fieldOf(error) as EntryField | null;
      if (field && field in values) fieldErrors[field] = error.message;
      else formError.value = error.message;
      return null;
    } finally {
      saving.value = false;
    }
  }

  return { values, editingId, fieldErrors, formError, saving, open, submit };
}
