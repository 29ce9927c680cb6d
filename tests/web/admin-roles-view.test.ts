import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { flushPromises } from '@vue/test-utils';
import AdminRolesView from '@web/views/AdminRolesView.vue';
import * as admin from '@web/services/admin';
import * as auth from '@web/services/auth';
import { ApiError } from '@web/services/http';
import { demoUser, mountWithApp } from './mount-app';

vi.mock('@web/services/auth', () => ({ fetchSession: vi.fn(), GITHUB_SIGN_IN_PATH: '/auth/github' }));
vi.mock('@web/services/admin', () => ({ listUsers: vi.fn(), updateUserRoles: vi.fn() }));

const theAdmin = demoUser(['admin'], { id: 1, name: 'Tomas Reedbeck', email: 'tomas.reedbeck@example.test' });
const anAuthor = demoUser(['author'], { id: 2, name: 'Ada Saltcote', email: 'ada.saltcote@example.test', githubLogin: 'adasalt' });

async function openRolesPage() {
  return mountWithApp(AdminRolesView, { path: '/admin/roles' });
}

function saveButtonOf(wrapper: Awaited<ReturnType<typeof openRolesPage>>['wrapper'], name: string) {
  return wrapper.get(`button[aria-label="Save roles for ${name}"]`);
}

beforeEach(() => {
  vi.mocked(auth.fetchSession).mockResolvedValue({ user: theAdmin, csrfToken: 't' });
  vi.mocked(admin.listUsers).mockResolvedValue([theAdmin, anAuthor]);
});

afterEach(() => {
  vi.mocked(admin.updateUserRoles).mockReset();
  vi.mocked(admin.listUsers).mockReset();
  document.body.innerHTML = '';
});

describe('AdminRolesView', () => {
  it('lists every account with a ticked box per role held', async () => {
    const { wrapper } = await openRolesPage();
    expect(wrapper.findAll('tbody tr')).toHaveLength(2);
    expect(wrapper.text()).toContain('ada.saltcote@example.test');
    expect(wrapper.get<HTMLInputElement>('#role-2-author').element.checked).toBe(true);
    expect(wrapper.get<HTMLInputElement>('#role-2-reviewer').element.checked).toBe(false);
    expect(wrapper.get('#role-2-curator').attributes('aria-label')).toBe('curator for Ada Saltcote');
  });

  it('enables Save only once a row changes, then sends the roles in their usual order', async () => {
    vi.mocked(admin.updateUserRoles).mockResolvedValue({ ...anAuthor, roles: ['author', 'reviewer'] });
    const { wrapper } = await openRolesPage();
    expect(saveButtonOf(wrapper, 'Ada Saltcote').attributes('disabled')).toBeDefined();
    await wrapper.get('#role-2-reviewer').setValue(true);
    expect(saveButtonOf(wrapper, 'Ada Saltcote').attributes('disabled')).toBeUndefined();
    await saveButtonOf(wrapper, 'Ada Saltcote').trigger('click');
    await flushPromises();
    expect(admin.updateUserRoles).toHaveBeenCalledWith(2, ['author', 'reviewer']);
    expect(wrapper.get<HTMLInputElement>('#role-2-reviewer').element.checked).toBe(true);
    expect(saveButtonOf(wrapper, 'Ada Saltcote').attributes('disabled')).toBeDefined();
  });

  it('keeps the change and shows the reason when saving fails', async () => {
    vi.mocked(admin.updateUserRoles).mockRejectedValue(new ApiError(403, 'FORBIDDEN', 'Only admins can change roles.'));
    const { wrapper } = await openRolesPage();
    await wrapper.get('#role-2-curator').setValue(true);
    await saveButtonOf(wrapper, 'Ada Saltcote').trigger('click');
    await flushPromises();
    expect(wrapper.get('[role="alert"]').text()).toContain('Only admins can change roles.');
    expect(wrapper.get<HTMLInputElement>('#role-2-curator').element.checked).toBe(true);
  });

  it('undoes unsaved changes of a row', async () => {
    const { wrapper } = await openRolesPage();
    await wrapper.get('#role-2-author').setValue(false);
    await wrapper.get('button[aria-label="Undo role changes for Ada Saltcote"]').trigger('click');
    expect(wrapper.get<HTMLInputElement>('#role-2-author').element.checked).toBe(true);
    expect(admin.updateUserRoles).not.toHaveBeenCalled();
  });

  it('refreshes the session when admins change their own roles', async () => {
    vi.mocked(admin.updateUserRoles).mockResolvedValue({ ...theAdmin, roles: ['curator', 'admin'] });
    const { wrapper } = await openRolesPage();
    const sessionLoadsBefore = vi.mocked(auth.fetchSession).mock.calls.length;
    await wrapper.get('#role-1-curator').setValue(true);
    await saveButtonOf(wrapper, 'Tomas Reedbeck').trigger('click');
    await flushPromises();
    expect(admin.updateUserRoles).toHaveBeenCalledWith(1, ['curator', 'admin']);
    expect(vi.mocked(auth.fetchSession).mock.calls.length).toBe(sessionLoadsBefore + 1);
  });

  it("does not offer admins their own admin box, which the server would refuse", async () => {
    const { wrapper } = await openRolesPage();
    const ownAdmin = wrapper.get('#role-1-admin');
    expect(ownAdmin.attributes('disabled')).toBeDefined();
    expect(ownAdmin.attributes('aria-describedby')).toBe('own-admin-note');
    expect(wrapper.get('#role-2-admin').attributes('disabled')).toBeUndefined();
  });

  it('shows an error with a retry when the accounts cannot be loaded', async () => {
    vi.mocked(admin.listUsers).mockRejectedValueOnce(new ApiError(0, 'NETWORK_ERROR', 'The server could not be reached.'));
    const { wrapper } = await openRolesPage();
    expect(wrapper.get('[role="alert"]').text()).toContain('The server could not be reached.');
    vi.mocked(admin.listUsers).mockResolvedValue([anAuthor]);
    await wrapper.get('[role="alert"] button').trigger('click');
    await flushPromises();
    expect(wrapper.findAll('tbody tr')).toHaveLength(1);
  });

  it('says so when there are no accounts', async () => {
    vi.mocked(admin.listUsers).mockResolvedValue([]);
    const { wrapper } = await openRolesPage();
    expect(wrapper.text()).toContain('No accounts yet');
  });

  it('shows a loading state while the accounts are on their way', async () => {
    vi.mocked(admin.listUsers).mockReturnValue(new Promise(() => {}));
    const { wrapper } = await openRolesPage();
    expect(wrapper.get('[aria-busy="true"]').text()).toContain('Loading accounts');
  });
});
