import { afterEach, describe, expect, it, vi } from 'vitest';
import { flushPromises } from '@vue/test-utils';
import ReviewVerdictForm from '@web/components/review/ReviewVerdictForm.vue';
import * as auth from '@web/services/auth';
import { ApiError } from '@web/services/http';
import { demoUser } from '../mount-app';
import { mountWithProps } from './mount-with-props';

vi.mock('@web/services/auth', () => ({ fetchSession: vi.fn(), GITHUB_SIGN_IN_PATH: '/auth/github' }));

afterEach(() => {
  vi.clearAllMocks();
  document.body.innerHTML = '';
});

async function mountForm(submit = vi.fn().mockResolvedValue(undefined)) {
  vi.mocked(auth.fetchSession).mockResolvedValue({ user: demoUser(['reviewer']), csrfToken: 't' });
  const { wrapper } = await mountWithProps(ReviewVerdictForm, { revision: 2, submit });
  const choose = async (label: string) => {
    await wrapper.findAll('.p-togglebutton').find((b) => b.text().includes(label))!.trigger('click');
  };
  return { wrapper, submit, choose };
}

describe('ReviewVerdictForm', () => {
  it.each(['Revise', 'Decline'])('refuses %s without a comment and says why', async (label) => {
    const { wrapper, submit, choose } = await mountForm();
    await choose(label);
    expect(wrapper.get('label[for="verdict-comment"]').text()).toContain('(required)');
    await wrapper.get('form').trigger('submit');
    await flushPromises();
    expect(submit).not.toHaveBeenCalled();
    expect(wrapper.get('#verdict-comment-error').text()).toBe('Say why: a comment is required with revise and decline');
  });

  it('sends revise with its comment', async () => {
    const { wrapper, submit, choose } = await mountForm();
    await choose('Revise');
    await wrapper.get('#verdict-comment').setValue('  N1 needs the JPL rate  ');
    await wrapper.get('form').trigger('submit');
    await flushPromises();
    expect(submit).toHaveBeenCalledWith('revise', 'N1 needs the JPL rate');
  });

  it('sends endorse without a comment', async () => {
    const { wrapper, submit, choose } = await mountForm();
    await choose('Endorse');
    expect(wrapper.get('label[for="verdict-comment"]').text()).toContain('(optional)');
    await wrapper.get('form').trigger('submit');
    await flushPromises();
    expect(submit).toHaveBeenCalledWith('endorse', '');
  });

  it('shows the server\'s refusal and keeps the comment', async () => {
    const refusal = new ApiError(409, 'INVALID_STATE', 'This review round is adopted; you cannot give a verdict');
    const { wrapper, choose } = await mountForm(vi.fn().mockRejectedValue(refusal));
    await choose('Decline');
    await wrapper.get('#verdict-comment').setValue('Out of scope');
    await wrapper.get('form').trigger('submit');
    await flushPromises();
    expect(wrapper.get('[role="alert"]').text()).toContain('you cannot give a verdict');
    expect((wrapper.get('#verdict-comment').element as HTMLTextAreaElement).value).toBe('Out of scope');
  });
});
