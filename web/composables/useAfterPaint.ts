import { onScopeDispose, shallowRef, watch, type Ref, type ShallowRef } from 'vue';

/**
 * `source`, passed on only after the browser has painted its change. The workbench gives a new
 * analysis to the editor and the status line at once and to the panels (long tables) through this,
 * so redrawing a table never holds back the diagnostics on screen. Only the newest value is passed on.
 */
export function useAfterPaint<T>(source: Ref<T>): Readonly<ShallowRef<T>> {
  const shown = shallowRef(source.value) as ShallowRef<T>;
  let frame = 0;
  let task: ReturnType<typeof setTimeout> | undefined;

  function cancel(): void {
    cancelAnimationFrame(frame);
    clearTimeout(task);
  }

  watch(source, (value) => {
    cancel();
    // A frame callback runs just before the paint; a task queued from it runs just after.
    frame = requestAnimationFrame(() => {
      task = setTimeout(() => (shown.value = value));
    });
  });
  onScopeDispose(cancel);
  return shown;
}
