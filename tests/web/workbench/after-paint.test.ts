import { describe, expect, it } from 'vitest';
import { effectScope, nextTick, ref, watch } from 'vue';
import { useAfterPaint } from '@web/composables/useAfterPaint';

/** Resolves after the next frame has been painted (a task queued from a frame callback). */
const afterNextPaint = () => new Promise<void>((resolve) => requestAnimationFrame(() => setTimeout(resolve)));

function setup(initial: string) {
  const scope = effectScope();
  const source = ref(initial);
  const shown = scope.run(() => useAfterPaint(source))!;
  return { scope, source, shown };
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
    await afterNextPaint();
    await afterNextPaint();
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
    await afterNextPaint();
    await afterNextPaint();
    expect(taken).toEqual(['c']);
    scope.stop();
  });

  it('passes nothing on after it stops (the workbench has closed)', async () => {
    const { scope, source, shown } = setup('open');
    source.value = 'closing';
    await nextTick();
    scope.stop();
    await afterNextPaint();
    await afterNextPaint();
    expect(shown.value).toBe('open');
  });
});
