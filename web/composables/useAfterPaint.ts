import { onScopeDispose, ref, shallowRef, watch, type Ref, type ShallowRef } from 'vue';

/**
 * `source`, passed on only after the browser has painted its change, and not while `hold` is true.
 * The workbench gives a new analysis to the editor and the status line at once and to the panels
 * (long tables) through this, held while a newer analysis is on its way: redrawing a table never
 * holds back the diagnostics on screen, and the tables are not redrawn between the keys of someone
 * still typing. Only the newest value is passed on.
 */
export function useAfterPaint<T>(source: Ref<T>, hold: Ref<boolean> = ref(false)): Readonly<ShallowRef<T>> {
  const shown = shallowRef(source.value) as ShallowRef<T>;
  let frame = 0;
  let task: ReturnType<typeof setTimeout> | undefined;

  function cancel(): void {
    cancelAnimationFrame(frame);
    clearTimeout(task);
  }

  watch([source, hold], ([value, held]) => {
    cancel();
    if (held || value === shown.value) return;
    // A frame callback runs just before the paint; a task queued from it runs just after.
    frame = requestAnimationFrame(() => {
      task = setTimeout(() => {
        if (!hold.value) shown.value = source.value;
      });
    });
  });
  onScopeDispose(cancel);
  return shown;
}
