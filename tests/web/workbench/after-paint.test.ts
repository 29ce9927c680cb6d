import { describe, expect, it } from 'vitest';
import { effectScope, nextTick, ref, watch } from 'vue';
import { useAfterPaint } from '@web/composables/useAfterPaint';

/** Resolves after the next frame has been painted (a task queued from a frame callback). */
const afterNextPaint = () => new Promise<void>((resolve) => requestAnimationFrame(() => setTimeout(resolve)));

/** Lets Vue's watchers run, then two frames paint: anything passed on by then has been. */
async function painted(): Promise<void> {
  await nextTick();
  await afterNextPaint();
  await afterNextPaint();
}

function setup(initial: string) {
  const scope = effectScope();
  const source = ref(initial);
  const hold = ref(false);
  const shown = scope.run(() => useAfterPaint(source, hold))!;
  return { scope, source, hold, shown };
}

describe('useAfterPaint', () => {
  it('starts with the value as it is', () => {
    const { scope, shown } = setup('first analysis');
    expect(shown.value).toBe('first analysis');
    scope.stop();
  });

  it('passes a change on only once a frame has been painted, not in the same update', async () => {
    const { scope, source, shown } = setup('before');
    source.value = 'after';
    await nextTick();
    expect(shown.value).toBe('before');
    await painted();
    expect(shown.value).toBe('after');
    scope.stop();
  });

  it('passes on only the newest of several changes before the paint', async () => {
    const { scope, source, shown } = setup('a');
    const taken: string[] = [];
    scope.run(() => watch(shown, (value) => taken.push(value), { flush: 'sync' }));
    source.value = 'b';
    await nextTick();
    source.value = 'c';
    await nextTick();
    await painted();
    expect(taken).toEqual(['c']);
    scope.stop();
  });

  it('holds the value while a newer one is on its way (typing goes on), then passes on the newest', async () => {
    const { scope, source, hold, shown } = setup('r1');
    source.value = 'answer for the text before the key';
    hold.value = true;
    await nextTick();
    await painted();
    expect(shown.value).toBe('r1');
    source.value = 'answer for the text after the key';
    hold.value = false;
    await nextTick();
    await painted();
    expect(shown.value).toBe('answer for the text after the key');
    scope.stop();
  });

  it('passes on a value whose hold ends without a newer one (the text typed back to what was analysed)', async () => {
    const { scope, source, hold, shown } = setup('r1');
    hold.value = true;
    source.value = 'r2';
    await nextTick();
    hold.value = false;
    await nextTick();
    await painted();
    expect(shown.value).toBe('r2');
    scope.stop();
  });

  it('passes nothing on after it stops (the workbench has closed)', async () => {
    const { scope, source, shown } = setup('open');
    source.value = 'closing';
    await nextTick();
    scope.stop();
    await painted();
    expect(shown.value).toBe('open');
  });
});
