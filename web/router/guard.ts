import type { RouteLocationNormalized, RouteLocationRaw } from 'vue-router';
import type { useSessionStore } from '@web/stores/session';

type SessionStore = ReturnType<typeof useSessionStore>;

/**
 * Decides where a navigation may go. The client only hides what a role cannot do;
 * the server still checks every request.
 */
export function createSessionGuard(session: SessionStore) {
  return async (to: RouteLocationNormalized): Promise<true | RouteLocationRaw> => {
    await session.ensureLoaded();
    if (to.meta.public) {
      return to.meta.guestOnly && session.isSignedIn ? { name: 'library' } : true;
    }
    if (!session.isSignedIn) return { name: 'sign-in', query: { redirect: to.fullPath } };
    if (to.meta.roles && !session.hasAnyRole(to.meta.roles)) {
      return { name: 'forbidden', query: { from: to.fullPath } };
    }
    return true;
  };
}

/** The in-app path a `?redirect=` may send people to; anything else falls back to the library. */
export function safeRedirect(value: unknown): string {
  const path = Array.isArray(value) ? value[0] : value;
  if (typeof path !== 'string' || !path.startsWith('/') || /^\/[\\/]/.test(path)) return '/';
  return path;
}
