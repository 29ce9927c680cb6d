import { afterEach, describe, expect, it, vi } from 'vitest';
import { flushPromises } from '@vue/test-utils';
import WorkbenchHistoryPanel from '@web/components/workbench/history/WorkbenchHistoryPanel.vue';
import * as attachments from '@web/services/attachments';
import * as auth from '@web/services/auth';
import * as mechanisms from '@web/services/mechanisms';
import { demoUser, eventually } from '../mount-app';
import { demoMechanism } from '../review/review-fixtures';
import { mountWithProps } from '../review/mount-with-props';

vi.mock('@web/services/auth', () => ({ fetchSession: vi.fn(), GITHUB_SIGN_IN_PATH: '/auth/github' }));
vi.mock('@web/services/mechanisms', () => ({ listRevisions: vi.fn() }));
vi.mock('@web/services/attachments', () => ({ listAttachments: vi.fn(), uploadAttachment: vi.fn(), attachmentDownloadUrl: (id: number) => `/a/${id}` }));

afterEach(() => {
  vi.clearAllMocks();
  document.body.innerHTML = '';
});

const revision = (number: number): mechanisms.RevisionListItem => ({
  id: number, number, changeNote: `note ${number}`, createdAt: '2026-11-20T10:00:00.000Z', authorId: 1, authorName: 'Rosalind Samphire', stepCount: 6, errorCount: 0,
});

async function mountPanel(youCanEdit = true) {
  vi.mocked(auth.fetchSession).mockResolvedValue({ user: demoUser(['author'], { id: 1 }), csrfToken: 't' });
  vi.mocked(mechanisms.listRevisions).mockResolvedValue([revision(1), revision(2), revision(3)]);
  vi.mocked(attachments.listAttachments).mockResolvedValue([]);
  const mechanism = demoMechanism({ latestRevisionNumber: 3, youCanEdit });
  const mounted = await mountWithProps(WorkbenchHistoryPanel, { mechanism, revision: null, source: '', analysis: null, selectedStep: null });
  await flushPromises();
  return mounted;
}

const compareButton = (wrapper: Awaited<ReturnType<typeof mountPanel>>['wrapper']) =>
  wrapper.findAll('button').find((b) => b.text().startsWith('Compare'))!;

async function tick(wrapper: Awaited<ReturnType<typeof mountPanel>>['wrapper'], n: number): Promise<void> {
  await wrapper.get(`input[aria-label="Pick r${n} to compare"]`).trigger('change');
  await flushPromises();
}

describe('WorkbenchHistoryPanel', () => {
  it('has a box on each revision and none to select them all', async () => {
    const { wrapper } = await mountPanel();
    expect(wrapper.findAll('thead input[type="checkbox"]')).toHaveLength(0);
    expect(wrapper.findAll('tbody input[type="checkbox"]')).toHaveLength(3);
  });

  it('compares the two revisions ticked, the third tick replacing the oldest', async () => {
    const { wrapper, router } = await mountPanel();
    expect(compareButton(wrapper).attributes('disabled')).toBeDefined();
    await tick(wrapper, 3);
    await tick(wrapper, 1);
    expect(compareButton(wrapper).text()).toBe('Compare r1 → r3');
    await tick(wrapper, 2);
    expect(compareButton(wrapper).text()).toBe('Compare r1 → r2');
    await tick(wrapper, 2);
    expect(compareButton(wrapper).attributes('disabled')).toBeDefined();
    await tick(wrapper, 3);
    expect(compareButton(wrapper).text()).toBe('Compare r1 → r3');
    await compareButton(wrapper).trigger('click');
    await eventually(() => expect(router.currentRoute.value.name).toBe('compare'));
    expect(router.currentRoute.value.query).toEqual({ from: '1', to: '3' });
  });

  it('offers an upload button, not the browser\'s bare file field, to editors only', async () => {
    const { wrapper } = await mountPanel(true);
    const upload = wrapper.findAll('button').find((b) => b.text() === 'Upload a file');
    expect(upload?.exists()).toBe(true);
    expect(wrapper.get('#attachment-file').attributes('type')).toBe('file');
    const reader = await mountPanel(false);
    expect(reader.wrapper.findAll('button').some((b) => b.text() === 'Upload a file')).toBe(false);
  });

  it('uploads the chosen file as soon as it is picked', async () => {
    vi.mocked(attachments.uploadAttachment).mockResolvedValue({} as attachments.Attachment);
    const { wrapper } = await mountPanel(true);
    const input = wrapper.get<HTMLInputElement>('#attachment-file');
    const file = new File(['NOx at noon'], 'field-notes.txt', { type: 'text/plain' });
    Object.defineProperty(input.element, 'files', { value: [file], configurable: true });
    await input.trigger('change');
    await flushPromises();
    expect(attachments.uploadAttachment).toHaveBeenCalledWith('stratospheric-nox', file, expect.any(Function));
  });
});
