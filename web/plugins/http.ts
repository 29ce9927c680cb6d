import type { Pinia } from 'pinia';
import type { Router } from 'vue-router';
import { configureHttp } from '@web/services/http';
import { useSessionStore } from '@web/stores/session';

/**
 * The one place a lost session is handled: every 401 (outside sign-in itself)
 * forgets the person and sends them to sign-in, remembering where they were;
 * a rejected CSRF token is replaced so that trying again works.
 */
export function connectHttpToSession(pinia: Pinia, router: Router): void {
  const session = useSessionStore(pinia);
  configureHttp({
    csrfToken: () => session.csrfToken,
    onUnauthorized: () => {
      session.clear();
      const here = router.currentRoute.value;
      if (here.name === 'sign-in') return;
      void router.push({ name: 'sign-in', query: here.meta.public ? {} : { redirect: here.fullPath } });
    },
    onCsrfRejected: () => void session.refresh(),
  });
}
