import { defineStore } from 'pinia';
import { computed, ref } from 'vue';
import * as auth from '@web/services/auth';
import type { Role, SessionInfo, SignInBody, SignUpBody, User } from '@web/services/types';

type SessionStatus = 'unknown' | 'loading' | 'ready' | 'failed';

/** The signed-in person and the CSRF token: the only state the whole app shares. */
export const useSessionStore = defineStore('session', () => {
  const user = ref<User | null>(null);
  const csrfToken = ref('');
  const status = ref<SessionStatus>('unknown');
  const loadError = ref<Error | null>(null);
  const refreshing = ref(false);
  let inFlight: Promise<void> | null = null;

  const isSignedIn = computed(() => user.value !== null);
  const roles = computed<Role[]>(() => user.value?.roles ?? []);

  function hasRole(role: Role): boolean {
    return roles.value.includes(role);
  }

  function hasAnyRole(wanted: readonly Role[]): boolean {
    return wanted.some(hasRole);
  }

  function apply(info: SessionInfo): void {
    user.value = info.user;
    csrfToken.value = info.csrfToken;
    status.value = 'ready';
    loadError.value = null;
  }

  /**
   * Asks the server who is signed in; concurrent callers share one request. Failures land
   * in `loadError` (never thrown); a session that was known stays as it was.
   */
  function refresh(): Promise<void> {
    inFlight ??= fetchAndApply().finally(() => (inFlight = null));
    return inFlight;
  }

  async function fetchAndApply(): Promise<void> {
    if (status.value !== 'ready') status.value = 'loading';
    refreshing.value = true;
    try {
      apply(await auth.fetchSession());
    } catch (error) {
      loadError.value = error instanceof Error ? error : new Error(String(error));
      if (status.value !== 'ready') status.value = 'failed';
    } finally {
      refreshing.value = false;
    }
  }

  function ensureLoaded(): Promise<void> {
    return status.value === 'ready' ? Promise.resolve() : refresh();
  }

  async function signIn(body: SignInBody): Promise<void> {
    apply(await auth.signIn(body));
  }

  async function signUp(body: SignUpBody): Promise<void> {
    apply(await auth.signUp(body));
  }

  async function signOut(): Promise<void> {
    await auth.signOut();
    clear();
  }

  /** Forgets the person; the next navigation fetches a fresh session (and CSRF token). */
  function clear(): void {
    user.value = null;
    csrfToken.value = '';
    status.value = 'unknown';
  }

  return {
    user, csrfToken, status, loadError, refreshing, isSignedIn, roles,
    hasRole, hasAnyRole, refresh, ensureLoaded, signIn, signUp, signOut, clear,
  };
});
