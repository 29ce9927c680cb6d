import { onScopeDispose, ref, shallowRef, watch, type Ref } from 'vue';
import type { MechanismAnalysis } from '@api/analysis/analysis.schemas';
import { analyseText } from '@web/services/analysis';

/**
 * How long typing must pause before the server analyses the text. Short, because the whole
 * refresh after the last key (this pause, the server and the redraw) should stay under 300 ms even
 * for a 2,000-step mechanism; the server is still asked at most once at a time (see below).
 */
export const ANALYSE_DELAY_MS = 120;

/**
 * The server's analysis of the editor's text, refreshed a moment after typing stops.
 *
 * At most one request is in flight: text typed meanwhile waits, and only the newest waiting text
 * is sent when the answer comes. Aborting instead would not spare the server (it has already
 * started analysing), so with fast typing on a large mechanism it would fall ever further behind.
 * An answer for a text that has since changed again is dropped, never shown.
 * `analysedSource` is the exact text the current `analysis` belongs to, so the editor can tell
 * whether its positions still hold.
 */
export function useLiveAnalysis(source: Ref<string>, options: { delayMs?: number } = {}) {
  const delay = options.delayMs ?? ANALYSE_DELAY_MS;
  const analysis = shallowRef<MechanismAnalysis | null>(null);
  const analysedSource = ref<string | null>(null);
  const pending = ref(false);
  const error = ref<Error | null>(null);
  let timer: ReturnType<typeof setTimeout> | undefined;
  let inFlight: { text: string; controller: AbortController } | null = null;
  /** The newest text still to be sent once the request in flight answers; null when none is. */
  let waiting: string | null = null;

  async function run(text: string): Promise<void> {
    const request = { text, controller: new AbortController() };
    inFlight = request;
    try {
      const result = await analyseText(text, request.controller.signal);
      if (request.controller.signal.aborted || waiting !== null) return;
      analysis.value = result;
      analysedSource.value = text;
      error.value = null;
    } catch (caught) {
      if (request.controller.signal.aborted || waiting !== null) return;
      error.value = caught instanceof Error ? caught : new Error(String(caught));
    } finally {
      if (inFlight === request) finish();
    }
  }

  /** The request in flight has answered: send the text that waited for it, if any. */
  function finish(): void {
    inFlight = null;
    const next = waiting;
    waiting = null;
    if (next === null) pending.value = false;
    else void run(next);
  }

  function send(text: string): void {
    if (!inFlight) {
      void run(text);
      return;
    }
    // Back to the text already being analysed: its answer is the one wanted.
    waiting = inFlight.text === text ? null : text;
  }

  function cancel(): void {
    clearTimeout(timer);
    waiting = null;
    inFlight?.controller.abort();
    inFlight = null;
  }

  function schedule(text: string): void {
    clearTimeout(timer);
    if (text === analysedSource.value) {
      cancel();
      pending.value = false;
      return;
    }
    pending.value = true;
    timer = setTimeout(() => send(text), delay);
  }

  /** Takes a known analysis (a saved revision's) without asking the server. */
  function adopt(text: string, known: MechanismAnalysis): void {
    cancel();
    analysis.value = known;
    analysedSource.value = text;
    pending.value = false;
  }

  watch(source, schedule);
  onScopeDispose(cancel);

  function refreshNow(): Promise<void> {
    cancel();
    pending.value = true;
    return run(source.value);
  }

  return { analysis, analysedSource, pending, error, adopt, refreshNow };
}
