import { flushPromises, mount } from '@vue/test-utils';
import { vi } from 'vitest';
import { createMemoryHistory } from 'vue-router';
import type { Component } from 'vue';
import { installPrimeVue } from '@web/plugins/primevue';
import { createAppRouter } from '@web/router';
import { freshPinia } from '../mount-app';

vi.setConfig({ testTimeout: 30_000 });

/** Mounts a component with props and the app's real plugins (router on memory history at `path`). */
export async function mountWithProps(component: Component, props: Record<string, unknown>, path = '/account') {
  const pinia = freshPinia();
  const router = createAppRouter(pinia, createMemoryHistory());
  await router.push(path);
  const wrapper = mount(component, { props, attachTo: document.body, global: { plugins: [pinia, router, { install: installPrimeVue }] } });
  await flushPromises();
  return { wrapper, router, pinia };
}
