import { createRouter, createWebHistory, type RouterHistory } from 'vue-router';
import type { Pinia } from 'pinia';
import { useSessionStore } from '@web/stores/session';
import { createSessionGuard } from './guard';
import { trackNavigation } from './progress';
import { routes } from './routes';
import { scrollBehavior } from './scroll';

export function createAppRouter(pinia: Pinia, history: RouterHistory = createWebHistory()) {
  const router = createRouter({ history, routes, scrollBehavior });
  trackNavigation(router);
  router.beforeEach(createSessionGuard(useSessionStore(pinia)));
  router.afterEach((to) => {
    document.title = `${to.meta.title} · Cyclewright`;
  });
  return router;
}
