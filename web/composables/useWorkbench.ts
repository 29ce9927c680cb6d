import { ref, shallowRef } from 'vue';
import * as mechanisms from '@web/services/mechanisms';
import type { MechanismSummary, RevisionDetail, RevisionListItem } from '@web/services/mechanisms';

/**
 * One mechanism as the workbench opens it: its summary, the list of revisions and the revision
 * shown (the latest unless a number is asked for). Loading, error and "not found" are states the
 * view shows; nothing is thrown.
 */
export function useWorkbench() {
  const mechanism = shallowRef<MechanismSummary | null>(null);
  const revisions = ref<RevisionListItem[]>([]);
  const revision = shallowRef<RevisionDetail | null>(null);
  const loading = ref(false);
  const error = ref<Error | null>(null);

  async function load(slug: string, number?: number): Promise<void> {
    loading.value = true;
    error.value = null;
    try {
      const summary = await mechanisms.getMechanism(slug);
      const [list, detail] = await Promise.all([
        mechanisms.listRevisions(slug),
        mechanisms.getRevision(slug, number ?? summary.latestRevisionNumber),
      ]);
      mechanism.value = summary;
      revisions.value = list;
      revision.value = detail;
    } catch (caught) {
      error.value = caught instanceof Error ? caught : new Error(String(caught));
    } finally {
      loading.value = false;
    }
  }

  /** Reads the summary and the list again: after a save, or after a review act changed the round or the reference. */
  async function refreshSummary(): Promise<void> {
    if (!mechanism.value) return;
    const slug = mechanism.value.slug;
    const [summary, list] = await Promise.all([mechanisms.getMechanism(slug), mechanisms.listRevisions(slug)]);
    if (mechanism.value?.slug !== slug) return;
    mechanism.value = summary;
    revisions.value = list;
  }

  /** After a save: the new revision is the one shown, and the summary and list are read again. */
  async function takeSaved(saved: RevisionDetail): Promise<void> {
    revision.value = saved;
    await refreshSummary();
  }

  async function rename(title: string): Promise<void> {
    if (!mechanism.value) return;
    mechanism.value = await mechanisms.updateMechanism(mechanism.value.slug, { title });
  }

  function reset(): void {
    mechanism.value = null;
    revisions.value = [];
    revision.value = null;
    error.value = null;
  }

  return { mechanism, revisions, revision, loading, error, load, refreshSummary, takeSaved, rename, reset };
}
