import { describe, expect, it } from 'vitest';
import { createMemoryHistory, type RouteLocationNormalized } from 'vue-router';
import { createAppRouter } from '@web/router';
import { scrollBehavior } from '@web/router/scroll';
import { freshPinia } from './mount-app';

const router = createAppRouter(freshPinia(), createMemoryHistory());
const at = (path: string) => router.resolve(path) as RouteLocationNormalized;

describe('scroll on navigation', () => {
  it('opens a new page at its top (a new mechanism created on /new opens /m/:slug with the header in view)', () => {
    expect(scrollBehavior(at('/m/bromine-nitrate'), at('/new'), null)).toEqual({ top: 0, left: 0 });
    expect(scrollBehavior(at('/catalogue'), at('/'), null)).toEqual({ top: 0, left: 0 });
  });

  it('returns to where the reader was on back and forward', () => {
    expect(scrollBehavior(at('/'), at('/catalogue'), { left: 0, top: 640 })).toEqual({ left: 0, top: 640 });
  });

  it('leaves the scroll alone when only the query or the hash changes on the same page', () => {
    expect(scrollBehavior(at('/?q=BrO'), at('/'), null)).toBe(false);
    expect(scrollBehavior(at('/m/salt-lake-bromine#history'), at('/m/salt-lake-bromine'), null)).toBe(false);
    expect(scrollBehavior(at('/m/salt-lake-bromine/compare?from=1&to=3'), at('/m/salt-lake-bromine/compare?from=1&to=2'), null)).toBe(false);
  });

  it('is the router\'s own scroll behaviour', () => {
    expect(router.options.scrollBehavior).toBe(scrollBehavior);
  });
});
