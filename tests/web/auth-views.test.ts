import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { flushPromises } from '@vue/test-utils';
import SignInView from '@web/views/SignInView.vue';
import SignUpView from '@web/views/SignUpView.vue';
import * as auth from '@web/services/auth';
import { ApiError } from '@web/services/http';
import { demoUser, eventually, mountWithApp } from './mount-app';

vi.mock('@web/services/auth', () => ({
  fetchSession: vi.fn(),
  signIn: vi.fn(),
  signUp: vi.fn(),
  GITHUB_SIGN_IN_PATH: '/auth/github',
}));

const signedIn = { user: demoUser(['author']), csrfToken: 'after' };

beforeEach(() => {
  vi.mocked(auth.fetchSession).mockResolvedValue({ user: null, csrfToken: 'before' });
});

afterEach(() => {
  vi.mocked(auth.signIn).mockReset();
  vi.mocked(auth.signUp).mockReset();
  document.body.innerHTML = '';
});

describe('SignInView', () => {
  it('signs in with the typed e-mail and password and goes where the person wanted', async () => {
    vi.mocked(auth.signIn).mockResolvedValue(signedIn);
    const { wrapper, router } = await mountWithApp(SignInView, { path: '/sign-in?redirect=/account' });
    await wrapper.get('#sign-in-email').setValue(' ines.marlow@example.test ');
    await wrapper.get('#sign-in-password').setValue('tidal-flats-42');
    await wrapper.get('form').trigger('submit');
    expect(auth.signIn).toHaveBeenCalledWith({ email: 'ines.marlow@example.test', password: 'tidal-flats-42' });
    await eventually(() => expect(router.currentRoute.value.fullPath).toBe('/account'));
  });

  it("shows the server's message when the credentials are wrong, and stays", async () => {
    vi.mocked(auth.signIn).mockRejectedValue(new ApiError(401, 'INVALID_CREDENTIALS', 'Wrong e-mail or password.'));
    const { wrapper, router } = await mountWithApp(SignInView, { path: '/sign-in' });
    await wrapper.get('form').trigger('submit');
    await flushPromises();
    expect(wrapper.get('[role="alert"]').text()).toBe('Wrong e-mail or password.');
    expect(router.currentRoute.value.name).toBe('sign-in');
  });

  it('explains a failed GitHub round trip from ?error=github', async () => {
    const { wrapper } = await mountWithApp(SignInView, { path: '/sign-in?error=github' });
    expect(wrapper.get('[role="alert"]').text()).toContain('Signing in with GitHub did not finish');
  });

  it('offers GitHub as a plain link to the server round trip', async () => {
    const { wrapper } = await mountWithApp(SignInView, { path: '/sign-in' });
    const github = wrapper.get('a[href="/auth/github"]');
    expect(github.text()).toBe('Sign in with GitHub');
  });
});

describe('SignUpView', () => {
  it('shows the password rules before anything is sent', async () => {
    const { wrapper } = await mountWithApp(SignUpView, { path: '/sign-up' });
    expect(wrapper.get('#sign-up-password-hint').text()).toContain('At least 10 characters');
    expect(wrapper.get('#sign-up-password').attributes('aria-describedby')).toBe('sign-up-password-hint');
  });

  it("puts the server's field errors under their fields", async () => {
    const details = [
      { path: ['password'], message: 'Use at least 10 characters.' },
      { path: ['password'], message: 'Mix letters with digits or symbols.' },
      { path: ['email'], message: 'Enter a valid e-mail address.' },
    ];
    vi.mocked(auth.signUp).mockRejectedValue(new ApiError(400, 'VALIDATION_FAILED', 'Invalid input', details));
    const { wrapper } = await mountWithApp(SignUpView, { path: '/sign-up' });
    await wrapper.get('form').trigger('submit');
    await flushPromises();
    expect(wrapper.get('#sign-up-password-error').text()).toBe('Use at least 10 characters.');
    expect(wrapper.get('#sign-up-email-error').text()).toBe('Enter a valid e-mail address.');
    expect(wrapper.find('#sign-up-name-error').exists()).toBe(false);
    expect(wrapper.get('[role="alert"]').text()).toBe('Check the fields marked below.');
  });

  it('creates the account and opens the library', async () => {
    vi.mocked(auth.signUp).mockResolvedValue(signedIn);
    const { wrapper, router } = await mountWithApp(SignUpView, { path: '/sign-up' });
    await wrapper.get('#sign-up-name').setValue('Ines Marlow');
    await wrapper.get('#sign-up-email').setValue('ines.marlow@example.test');
    await wrapper.get('#sign-up-password').setValue('tidal-flats-42');
    await wrapper.get('form').trigger('submit');
    expect(auth.signUp).toHaveBeenCalledWith({ name: 'Ines Marlow', email: 'ines.marlow@example.test', password: 'tidal-flats-42' });
    await eventually(() => expect(router.currentRoute.value.name).toBe('library'));
  });
});
