import { flushPromises, mount } from '@vue/test-utils';
import { vi } from 'vitest';
import { createPinia, setActivePinia, type Pinia } from 'pinia';
import { createMemoryHistory } from 'vue-router';
import type { Component } from 'vue';
import { installPrimeVue } from '@web/plugins/primevue';
import { createAppRouter } from '@web/router';
import type { Role, User } from '@web/services/types';

// Mounting the real app compiles lazy views on first use, slow on a busy shared machine.
vi.setConfig({ testTimeout: 30_000 });

/** A person of the demo scenario (invented; example.test addresses). */
export function demoUser(roles: Role[], overrides: Partial<User> = {}): User {
  return {
    id: 7,
    name: 'Ines Marlow',
    email: 'ines.marlow@example.test',
    roles,
    githubLogin: null,
    createdAt: '2026-11-02T09:30:00.000Z',
    ...overrides,
  };
}

export function freshPinia(): Pinia {
  const pinia = createPinia();
  setActivePinia(pinia);
  return pinia;
}

/** Mounts a component with the app's real plugins (PrimeVue preset, Pinia, router on memory history). */
export async function mountWithApp(component: Component, options: { pinia?: Pinia; path?: string } = {}) {
  const pinia = options.pinia ?? freshPinia();
  const router = createAppRouter(pinia, createMemoryHistory());
  await router.push(options.path ?? '/');
  const wrapper = mount(component, {
    attachTo: document.body,
    global: { plugins: [pinia, router, { install: installPrimeVue }] },
  });
  await flushPromises();
  return { wrapper, router, pinia };
}

/**
 * Waits for an expectation that depends on a lazy view being loaded. The generous ceiling only
 * keeps a busy shared machine from failing the test; nothing here measures speed.
 */
export function eventually(expectation: () => void): Promise<void> {
  return vi.waitFor(expectation, { timeout: 15_000, interval: 20 });
}
