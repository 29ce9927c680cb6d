import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { effectScope, nextTick, ref } from 'vue';
import { ANALYSE_DELAY_MS, useLiveAnalysis } from '@web/composables/useLiveAnalysis';
import * as analysisService from '@web/services/analysis';
import type { MechanismAnalysis } from '@api/analysis/analysis.schemas';

vi.mock('@web/services/analysis', () => ({ analyseText: vi.fn() }));

const analysisOf = (title: string) => ({ title, steps: [], diagnostics: [] }) as unknown as MechanismAnalysis;

function setup() {
  const scope = effectScope();
  const source = ref('');
  const live = scope.run(() => useLiveAnalysis(source))!;
  return { scope, source, live };
}

/** A server that answers each analysis after `ms`, noting what it was asked and the abort signals. */
function slowServer(ms: number) {
  const answers: string[] = [];
  const signals: AbortSignal[] = [];
  vi.mocked(analysisService.analyseText).mockImplementation((text, signal) => {
    answers.push(text);
    signals.push(signal!);
    return new Promise((resolve, reject) => {
      const timer = setTimeout(() => resolve(analysisOf(text)), ms);
      signal!.addEventListener('abort', () => {
        clearTimeout(timer);
        reject(new DOMException('aborted', 'AbortError'));
      });
    });
  });
  return { answers, signals };
}

async function type(source: { value: string }, text: string) {
  source.value = text;
  await nextTick();
}

beforeEach(() => {
  vi.useFakeTimers();
  vi.mocked(analysisService.analyseText).mockImplementation(async (text) => analysisOf(text));
});
afterEach(() => {
  vi.useRealTimers();
  vi.mocked(analysisService.analyseText).mockReset();
});

describe('useLiveAnalysis', () => {
  it('asks the server once, a moment after typing stops, for the last text', async () => {
    const { source, live, scope } = setup();
    await type(source, 'B1: Br• + O3');
    await vi.advanceTimersByTimeAsync(ANALYSE_DELAY_MS - 50);
    await type(source, 'B1: Br• + O3 -> BrO• + O2');
    expect(live.pending.value).toBe(true);
    await vi.advanceTimersByTimeAsync(ANALYSE_DELAY_MS - 1);
    expect(analysisService.analyseText).not.toHaveBeenCalled();
    await vi.advanceTimersByTimeAsync(1);
    expect(analysisService.analyseText).toHaveBeenCalledTimes(1);
    expect(vi.mocked(analysisService.analyseText).mock.calls[0][0]).toBe('B1: Br• + O3 -> BrO• + O2');
    expect(live.analysedSource.value).toBe('B1: Br• + O3 -> BrO• + O2');
    expect(live.pending.value).toBe(false);
    scope.stop();
  });

  it('never has two analyses in flight: text typed meanwhile waits, and only the newest is sent', async () => {
    const { answers, signals } = slowServer(1000);
    const { source, live, scope } = setup();
    await type(source, 'first');
    await vi.advanceTimersByTimeAsync(ANALYSE_DELAY_MS);
    await type(source, 'second');
    await vi.advanceTimersByTimeAsync(ANALYSE_DELAY_MS);
    await type(source, 'third');
    await vi.advanceTimersByTimeAsync(ANALYSE_DELAY_MS);
    expect(answers).toEqual(['first']);
    expect(signals[0].aborted).toBe(false);
    await vi.advanceTimersByTimeAsync(1000 - 2 * ANALYSE_DELAY_MS);
    // The answer for "first" came, but the text has moved on: it is dropped and "third" is asked for.
    expect(answers).toEqual(['first', 'third']);
    expect(live.analysis.value).toBeNull();
    expect(live.pending.value).toBe(true);
    await vi.advanceTimersByTimeAsync(1000);
    expect(live.analysis.value?.title).toBe('third');
    expect(live.analysedSource.value).toBe('third');
    expect(live.pending.value).toBe(false);
    scope.stop();
  });

  it('takes the answer in flight when the text goes back to what it was sent with', async () => {
    const { answers } = slowServer(1000);
    const { source, live, scope } = setup();
    await type(source, 'B1: Br• + O3');
    await vi.advanceTimersByTimeAsync(ANALYSE_DELAY_MS);
    await type(source, 'B1: Br• + O3 x');
    await vi.advanceTimersByTimeAsync(ANALYSE_DELAY_MS);
    await type(source, 'B1: Br• + O3');
    await vi.advanceTimersByTimeAsync(1000);
    expect(answers).toEqual(['B1: Br• + O3']);
    expect(live.analysedSource.value).toBe('B1: Br• + O3');
    expect(live.pending.value).toBe(false);
    scope.stop();
  });

  it('aborts the analysis in flight when it stops (the workbench closes)', async () => {
    const { signals } = slowServer(1000);
    const { source, scope } = setup();
    await type(source, 'first');
    await vi.advanceTimersByTimeAsync(ANALYSE_DELAY_MS);
    scope.stop();
    expect(signals[0].aborted).toBe(true);
  });

  it('does not ask again for a text whose analysis it already has (a saved revision)', async () => {
    const { source, live, scope } = setup();
    live.adopt('saved text', analysisOf('saved'));
    await type(source, 'saved text');
    await vi.advanceTimersByTimeAsync(ANALYSE_DELAY_MS * 2);
    expect(analysisService.analyseText).not.toHaveBeenCalled();
    expect(live.analysis.value?.title).toBe('saved');
    scope.stop();
  });

  it('keeps the last analysis and reports the error when the server fails', async () => {
    const { source, live, scope } = setup();
    await type(source, 'good');
    await vi.advanceTimersByTimeAsync(ANALYSE_DELAY_MS);
    vi.mocked(analysisService.analyseText).mockRejectedValue(new Error('Too many analyses in a minute; wait a moment'));
    await type(source, 'good, then more');
    await vi.advanceTimersByTimeAsync(ANALYSE_DELAY_MS);
    expect(live.error.value?.message).toContain('Too many analyses');
    expect(live.analysis.value?.title).toBe('good');
    scope.stop();
  });
});
