import { ref } from 'vue';
import { getMailPreferences, MAIL_KINDS, saveMailPreferences, type MailKind, type MailPreferences } from '@web/services/notifications';
import { useLoader } from './useLoader';
import { useSubmission } from './useSubmission';

/** Which e-mails the person receives: every kind is on unless turned off; saved with PATCH /api/me. */
export function useMailPreferences() {
  const loader = useLoader(getMailPreferences, {} as MailPreferences);
  const draft = ref<Record<MailKind, boolean>>(fill({}));
  const saved = ref(false);
  const { pending: saving, errorSummary, submit } = useSubmission();

  function fill(preferences: MailPreferences): Record<MailKind, boolean> {
    return Object.fromEntries(MAIL_KINDS.map(({ kind }) => [kind, preferences[kind] !== false])) as Record<MailKind, boolean>;
  }

  async function load(): Promise<void> {
    await loader.load();
    draft.value = fill(loader.data.value);
  }

  async function save(): Promise<void> {
    saved.value = false;
    saved.value = await submit(async () => {
      loader.data.value = await saveMailPreferences({ ...draft.value });
      draft.value = fill(loader.data.value);
    });
  }

  return { draft, pending: loader.pending, error: loader.error, load, save, saving, saved, errorSummary };
}
