import { onScopeDispose, ref, shallowRef, watch, type Ref } from 'vue';
import type { MechanismAnalysis } from '@api/analysis/analysis.schemas';
import { analyseText } from '@web/services/analysis';

/** How long typing must pause before the server analyses the text. */
export const ANALYSE_DELAY_MS = 250;

/**
 * The server's analysis of the editor's text, refreshed a moment after typing stops. Only the
 * newest request counts: an older one still in flight is aborted. `analysedSource` is the exact
 * text the current `analysis` belongs to, so the editor can tell whether its positions still hold.
 */
export function useLiveAnalysis(source: Ref<string>, options: { delayMs?: number } = {}) {
  const delay = options.delayMs ?? ANALYSE_DELAY_MS;
  const analysis = shallowRef<MechanismAnalysis | null>(null);
  const analysedSource = ref<string | null>(null);
  const pending = ref(false);
  const error = ref<Error | null>(null);
  let timer: ReturnType<typeof setTimeout> | undefined;
  let inFlight: AbortController | null = null;

  async function run(text: string): Promise<void> {
    inFlight?.abort();
    const controller = new AbortController();
    inFlight = controller;
    try {
      const result = await analyseText(text, controller.signal);
      if (controller.signal.aborted) return;
      analysis.value = result;
      analysedSource.value = text;
      error.value = null;
    } catch (caught) {
      if (controller.signal.aborted) return;
      error.value = caught instanceof Error ? caught : new Error(String(caught));
    } finally {
      if (inFlight === controller) {
        inFlight = null;
        pending.value = false;
      }
    }
  }

  function schedule(text: string): void {
    clearTimeout(timer);
    if (text === analysedSource.value) {
      inFlight?.abort();
      pending.value = false;
      return;
    }
    pending.value = true;
    timer = setTimeout(() => void run(text), delay);
  }

  /** Takes a known analysis (a saved revision's) without asking the server. */
  function adopt(text: string, known: MechanismAnalysis): void {
    clearTimeout(timer);
    inFlight?.abort();
    analysis.value = known;
    analysedSource.value = text;
    pending.value = false;
  }

  watch(source, schedule);
  onScopeDispose(() => {
    clearTimeout(timer);
    inFlight?.abort();
  });

  function refreshNow(): Promise<void> {
    clearTimeout(timer);
    pending.value = true;
    return run(source.value);
  }

  return { analysis, analysedSource, pending, error, adopt, refreshNow };
}
