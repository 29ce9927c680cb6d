import type { RouteRecordRaw } from 'vue-router';
import type { Role } from '@web/services/types';

declare module 'vue-router' {
  interface RouteMeta {
    /** Shown in the tab title. */
    title: string;
    /** Reachable without signing in. */
    public?: boolean;
    /** Only for signed-out people (sign-in, sign-up); signed-in people go to the library. */
    guestOnly?: boolean;
    /** The person needs at least one of these roles. */
    roles?: Role[];
    /** Without the app frame (header and search). */
    bare?: boolean;
  }
}

export const routes: RouteRecordRaw[] = [
  {
    path: '/sign-in',
    name: 'sign-in',
    component: () => import('@web/views/SignInView.vue'),
    meta: { title: 'Sign in', public: true, guestOnly: true, bare: true },
  },
  {
    path: '/sign-up',
    name: 'sign-up',
    component: () => import('@web/views/SignUpView.vue'),
    meta: { title: 'Create an account', public: true, guestOnly: true, bare: true },
  },
  { path: '/', name: 'library', component: () => import('@web/views/LibraryView.vue'), meta: { title: 'Library' } },
  {
    path: '/new',
    name: 'mechanism-new',
    component: () => import('@web/views/WorkbenchView.vue'),
    meta: { title: 'New mechanism', roles: ['author'] },
  },
  { path: '/m/:slug', name: 'workbench', component: () => import('@web/views/WorkbenchView.vue'), meta: { title: 'Workbench' } },
  {
    path: '/m/:slug/r/:n(\\d+)',
    name: 'workbench-revision',
    component: () => import('@web/views/WorkbenchView.vue'),
    meta: { title: 'Workbench' },
  },
  { path: '/catalogue', name: 'catalogue', component: () => import('@web/views/CatalogueView.vue'), meta: { title: 'Species catalogue' } },
  { path: '/sets', name: 'sets', component: () => import('@web/views/SetsView.vue'), meta: { title: 'Sets' } },
  { path: '/import', name: 'import', component: () => import('@web/views/ImportView.vue'), meta: { title: 'Import', roles: ['author'] } },
  { path: '/account', name: 'account', component: () => import('@web/views/AccountView.vue'), meta: { title: 'Account' } },
  {
    path: '/admin/roles',
    name: 'admin-roles',
    component: () => import('@web/views/AdminRolesView.vue'),
    meta: { title: 'Roles', roles: ['admin'] },
  },
  {
    path: '/my-reviews',
    name: 'my-reviews',
    component: () => import('@web/views/MyReviewsView.vue'),
    meta: { title: 'My reviews', roles: ['reviewer'] },
  },
  {
    path: '/to-adopt',
    name: 'to-adopt',
    component: () => import('@web/views/ToAdoptView.vue'),
    meta: { title: 'To adopt', roles: ['curator'] },
  },
  {
    path: '/m/:slug/compare',
    name: 'compare',
    component: () => import('@web/views/CompareView.vue'),
    meta: { title: 'Compare revisions' },
  },
  {
    path: '/dev/inbox',
    name: 'dev-inbox',
    component: () => import('@web/views/InboxView.vue'),
    meta: { title: 'Development inbox', roles: ['admin'] },
  },
  {
    path: '/forbidden',
    name: 'forbidden',
    component: () => import('@web/views/ForbiddenView.vue'),
    meta: { title: 'Not allowed' },
  },
  {
    path: '/:pathMatch(.*)*',
    name: 'not-found',
    component: () => import('@web/views/NotFoundView.vue'),
    meta: { title: 'Page not found', public: true },
  },
];
