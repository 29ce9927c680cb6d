import { computed, ref } from 'vue';
import { fieldErrorsOf } from '@web/services/validation';

/** Pending flag, error and per-field messages around one form action. */
export function useSubmission() {
  const pending = ref(false);
  const error = ref<Error | null>(null);
  const fieldErrors = computed(() => fieldErrorsOf(error.value));
  /** One line above the form; field problems are detailed beside their fields. */
  const errorSummary = computed(() => {
    if (!error.value) return '';
    return Object.keys(fieldErrors.value).length > 0 ? 'Check the fields marked below.' : error.value.message;
  });

  /** Runs the action once at a time; resolves true on success, false when it failed. */
  async function submit(action: () => Promise<void>): Promise<boolean> {
    if (pending.value) return false;
    pending.value = true;
    error.value = null;
    try {
      await action();
      return true;
    } catch (caught) {
      error.value = caught instanceof Error ? caught : new Error(String(caught));
      return false;
    } finally {
      pending.value = false;
    }
  }

  return { pending, error, errorSummary, fieldErrors, submit };
}
