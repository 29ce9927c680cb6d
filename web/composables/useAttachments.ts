import { ref, watch } from 'vue';
import { listAttachments, uploadAttachment } from '@web/services/attachments';
import { ApiError } from '@web/services/http';
import { useLoader } from './useLoader';

/** What a failed upload means for the person who tried it. */
export function uploadErrorText(error: unknown): string {
  if (error instanceof ApiError && error.status === 413) return `The file is too large. ${error.message}`;
  if (error instanceof ApiError && error.status === 400) return `The file was refused: ${error.message}`;
  return error instanceof Error ? error.message : String(error);
}

/** A mechanism's attachments and one upload at a time with its progress (0…1). */
export function useAttachments(slug: () => string | null) {
  const list = useLoader(() => (slug() ? listAttachments(slug()!) : Promise.resolve([])), []);
  const progress = ref<number | null>(null);
  const uploadError = ref('');
  watch(slug, () => void list.load(), { immediate: true });

  async function upload(file: File): Promise<boolean> {
    const target = slug();
    if (!target || progress.value !== null) return false;
    uploadError.value = '';
    if (file.size === 0) {
      uploadError.value = `“${file.name}” is empty: choose a file with content.`;
      return false;
    }
    progress.value = 0;
    try {
      await uploadAttachment(target, file, (fraction) => (progress.value = fraction));
      await list.load();
      return true;
    } catch (caught) {
      uploadError.value = uploadErrorText(caught);
      return false;
    } finally {
      progress.value = null;
    }
  }

  return { attachments: list.data, pending: list.pending, error: list.error, reload: list.load, progress, uploadError, upload };
}
