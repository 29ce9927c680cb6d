import { reactive, ref } from 'vue';
import { listUsers, updateUserRoles } from '@web/services/admin';
import { ROLES, type Role, type User } from '@web/services/types';
import { useSessionStore } from '@web/stores/session';

function sameRoles(a: readonly Role[], b: readonly Role[]): boolean {
  return a.length === b.length && a.every((role) => b.includes(role));
}

function toError(caught: unknown): Error {
  return caught instanceof Error ? caught : new Error(String(caught));
}

/** The admin's roles table: users as loaded, a draft of roles per user, and saving one row at a time. */
export function useUserRoles() {
  const session = useSessionStore();
  const users = ref<User[]>([]);
  const drafts = reactive<Record<number, Role[]>>({});
  const pending = ref(false);
  const error = ref<Error | null>(null);
  const savingId = ref<number | null>(null);
  const saveErrors = reactive<Record<number, string>>({});

  async function load(): Promise<void> {
    pending.value = true;
    error.value = null;
    try {
      users.value = await listUsers();
      for (const user of users.value) drafts[user.id] = [...user.roles];
    } catch (caught) {
      error.value = toError(caught);
    } finally {
      pending.value = false;
    }
  }

  function draftOf(userId: number): Role[] {
    return drafts[userId] ?? [];
  }

  /** Keeps the draft in the canonical role order so that saving sends a stable list. */
  function toggle(userId: number, role: Role, granted: boolean): void {
    const others = draftOf(userId).filter((held) => held !== role);
    drafts[userId] = ROLES.filter((known) => known === role ? granted : others.includes(known));
  }

  /** The server refuses to let admins drop their own admin role, so the box is not offered. */
  function isLocked(userId: number, role: Role): boolean {
    return role === 'admin' && userId === session.user?.id;
  }

  function isDirty(user: User): boolean {
    return !sameRoles(user.roles, draftOf(user.id));
  }

  function reset(user: User): void {
    drafts[user.id] = [...user.roles];
    delete saveErrors[user.id];
  }

  /** Saves one row; returns the saved user, or null with the reason in `saveErrors`. */
  async function save(user: User): Promise<User | null> {
    savingId.value = user.id;
    delete saveErrors[user.id];
    try {
      const saved = await updateUserRoles(user.id, draftOf(user.id));
      users.value = users.value.map((row) => (row.id === saved.id ? saved : row));
      drafts[saved.id] = [...saved.roles];
      if (saved.id === session.user?.id) await session.refresh();
      return saved;
    } catch (caught) {
      saveErrors[user.id] = toError(caught).message;
      return null;
    } finally {
      savingId.value = null;
    }
  }

  return { users, pending, error, savingId, saveErrors, load, draftOf, toggle, isLocked, isDirty, reset, save };
}
