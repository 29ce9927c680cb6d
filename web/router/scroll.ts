import type { RouterScrollBehavior } from 'vue-router';

/**
 * A new page opens at its top, with the header in view (the workbench's "Create r1" leaves the
 * page scrolled down to the button otherwise). Back and forward return where the reader was; a
 * change of query or hash on the same page (library filters, a workbench section, the revisions
 * compared) leaves the scroll alone, since the reader is still on that page.
 */
export const scrollBehavior: RouterScrollBehavior = (to, from, savedPosition) => {
  if (savedPosition) return savedPosition;
  if (to.path === from.path) return false;
  return { top: 0, left: 0 };
};
