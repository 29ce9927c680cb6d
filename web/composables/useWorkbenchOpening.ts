import { computed, ref } from 'vue';
import type { RouteLocationNormalizedLoaded } from 'vue-router';
import { isDemoExample, loadExampleText } from '@web/components/library/demoExamples';
import { useDraftAutosave } from './useDraftAutosave';
import type { ForeignDraft } from './useDraftStorage';
import { useLiveAnalysis } from './useLiveAnalysis';
import { useNewMechanism } from './useNewMechanism';
import { useRevisionSave } from './useRevisionSave';
import { useStepSelection } from './useStepSelection';
import { useWorkbench } from './useWorkbench';

const WORKBENCH_ROUTES = ['workbench', 'workbench-revision', 'mechanism-new'];
const TITLE_DIRECTIVE = /^%title\s+(.+)$/m;

/**
 * Everything the workbench view holds for one mechanism (or a new one): the editor's text and
 * the revision it started from, the live analysis, the selection, drafts and saving.
 */
export function useWorkbenchOpening(route: RouteLocationNormalizedLoaded) {
  const isNew = computed(() => route.name === 'mechanism-new');
  const slug = computed(() => (isNew.value || typeof route.params.slug !== 'string' ? null : route.params.slug));
  const requestedRevision = computed(() => (typeof route.params.n === 'string' ? Number(route.params.n) : null));

  const workbench = useWorkbench();
  const source = ref('');
  const base = ref<number | null>(null);
  const note = ref('');
  /** This tab's unsaved text put back into the editor on opening: when it was kept and what it started from. */
  const restored = ref<{ savedAt: string; base: number | null } | null>(null);
  const savedSource = computed(() => workbench.revision.value?.source ?? '');
  const dirty = computed(() => source.value !== savedSource.value);

  const live = useLiveAnalysis(source);
  const selection = useStepSelection(live.analysis);
  const fresh = useNewMechanism();
  const draftTitle = computed(() => (isNew.value ? fresh.title.value : ''));
  const drafts = useDraftAutosave(slug, source, base, savedSource, draftTitle);
  const revisionSave = useRevisionSave(slug, base, source);

  async function openNew(): Promise<void> {
    workbench.reset();
    base.value = null;
    const example = route.query.example;
    const draft = drafts.restorable('', null);
    if (isDemoExample(example)) {
      source.value = await loadExampleText(example);
      fresh.title.value = TITLE_DIRECTIVE.exec(source.value)?.[1].trim() ?? '';
    } else if (draft) {
      source.value = draft.source;
      fresh.title.value = draft.title ?? '';
      restored.value = { savedAt: draft.savedAt, base: null };
    } else {
      source.value = '';
    }
    if (source.value) await live.refreshNow();
  }

  async function openExisting(name: string): Promise<void> {
    await workbench.load(name, requestedRevision.value ?? undefined);
    const revision = workbench.revision.value;
    if (!revision) return;
    live.adopt(revision.source, revision.analysis);
    const draft = drafts.restorable(revision.source, requestedRevision.value);
    base.value = draft?.base ?? revision.number;
    source.value = draft?.source ?? revision.source;
    restored.value = draft ? { savedAt: draft.savedAt, base: draft.base } : null;
  }

  async function open(): Promise<void> {
    if (!WORKBENCH_ROUTES.includes(String(route.name))) return;
    restored.value = null;
    note.value = '';
    if (isNew.value) await openNew();
    else if (slug.value) await openExisting(slug.value);
  }

  function discardDraft(): void {
    drafts.discard();
    restored.value = null;
    base.value = workbench.revision.value?.number ?? null;
    source.value = savedSource.value;
    if (isNew.value) fresh.title.value = '';
  }

  /** Another tab's draft, put into this editor on request (only when this one holds nothing unsaved). */
  function takeForeignDraft(draft: ForeignDraft): void {
    drafts.takeForeign(draft);
    base.value = isNew.value ? null : (draft.base ?? base.value);
    source.value = draft.source;
    if (isNew.value) fresh.title.value = draft.title ?? fresh.title.value;
    restored.value = { savedAt: draft.savedAt, base: base.value };
  }

  /** The restored text beside the latest revision, when it started from an older one. */
  function compareRestored(): void {
    const latest = workbench.revision.value;
    if (latest && restored.value?.base) revisionSave.compareWith(latest, { base: restored.value.base, source: source.value });
  }

  async function saveRevision() {
    const saved = await revisionSave.save(note.value);
    if (!saved) return null;
    note.value = '';
    await workbench.takeSaved(saved);
    live.adopt(saved.source, saved.analysis);
    base.value = saved.number;
    restored.value = null;
    return saved;
  }

  const createNew = () => fresh.create(source.value, note.value);

  return {
    isNew, slug, source, base, note, restored, dirty, workbench, live, selection, revisionSave, fresh, drafts,
    open, discardDraft, takeForeignDraft, compareRestored, saveRevision, createNew,
  };
}
