import { ref } from 'vue';
import { importFiles, previewImport, type ImportedMechanism, type ImportPreview } from '@web/services/imports';

function toError(caught: unknown): Error {
  return caught instanceof Error ? caught : new Error(String(caught));
}

/** Choose files, preview what they hold, then create them all at once (the server's one transaction). */
export function useImport() {
  const files = ref<File[]>([]);
  const previews = ref<ImportPreview[]>([]);
  const created = ref<ImportedMechanism[]>([]);
  const pending = ref(false);
  const error = ref<Error | null>(null);

  async function run(work: () => Promise<void>): Promise<void> {
    pending.value = true;
    error.value = null;
    try {
      await work();
    } catch (caught) {
      error.value = toError(caught);
    } finally {
      pending.value = false;
    }
  }

  async function choose(chosen: File[]): Promise<void> {
    files.value = chosen;
    previews.value = [];
    created.value = [];
    if (chosen.length > 0) await run(async () => void (previews.value = await previewImport(chosen)));
  }

  const commit = (visibility: 'public' | 'private') =>
    run(async () => {
      created.value = await importFiles(files.value, visibility);
      previews.value = [];
    });

  return { files, previews, created, pending, error, choose, commit };
}
