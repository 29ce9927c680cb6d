import { ref, type Ref } from 'vue';
import type { Router } from 'vue-router';

const progressByRouter = new WeakMap<Router, Ref<boolean>>();

/**
 * Flags navigations under way (guards, the session check, a lazy view's download).
 * Register before any other guard: guards run in order, so a later one would only
 * hear of the navigation after the slow part.
 */
export function trackNavigation(router: Router): void {
  const navigating = ref(false);
  progressByRouter.set(router, navigating);
  router.beforeEach(() => {
    navigating.value = true;
  });
  router.afterEach(() => {
    navigating.value = false;
  });
  router.onError(() => {
    navigating.value = false;
  });
}

export function navigationProgressOf(router: Router): Readonly<Ref<boolean>> {
  return progressByRouter.get(router) ?? ref(false);
}
