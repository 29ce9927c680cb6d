import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { flushPromises } from '@vue/test-utils';
import ImportView from '@web/views/ImportView.vue';
import * as auth from '@web/services/auth';
import { ApiError } from '@web/services/http';
import * as imports from '@web/services/imports';
import { demoUser, mountWithApp } from './mount-app';

vi.mock('@web/services/auth', () => ({ fetchSession: vi.fn(), GITHUB_SIGN_IN_PATH: '/auth/github' }));
vi.mock('@web/services/imports', () => ({ previewImport: vi.fn(), importFiles: vi.fn() }));

const bromine = new File(['B1: Br• + O3 -> BrO• + O2\n'], 'salt-lake-bromine.steps', { type: 'text/plain' });
const preview: imports.ImportPreview = {
  file: 'salt-lake-bromine.steps', title: 'Salt-lake bromine cycle', slug: 'salt-lake-bromine', steps: 5,
  routes: ['2 O3 → 3 O2'], errors: 0, diagnostics: [], matchesExport: null, refusal: null,
};

async function chooseFiles(files: File[]) {
  vi.mocked(auth.fetchSession).mockResolvedValue({ user: demoUser(['author']), csrfToken: 't' });
  const { wrapper } = await mountWithApp(ImportView, { path: '/import' });
  const input = wrapper.get('input[type="file"]');
  Object.defineProperty(input.element, 'files', { value: files });
  await input.trigger('change');
  await flushPromises();
  return wrapper;
}

beforeEach(() => {
  vi.mocked(imports.previewImport).mockResolvedValue([preview]);
});
afterEach(() => {
  vi.mocked(imports.importFiles).mockReset();
  document.body.innerHTML = '';
});

describe('ImportView', () => {
  it('previews the chosen files, then imports them with the chosen visibility', async () => {
    vi.mocked(imports.importFiles).mockResolvedValue([{ file: 'salt-lake-bromine.steps', slug: 'salt-lake-bromine', title: 'Salt-lake bromine cycle' }]);
    const wrapper = await chooseFiles([bromine]);
    expect(imports.previewImport).toHaveBeenCalledWith([bromine]);
    expect(wrapper.get('tbody').text()).toContain('2 O3 → 3 O2');
    await wrapper.get('button.p-button:not(.p-togglebutton)').trigger('click');
    await flushPromises();
    expect(imports.importFiles).toHaveBeenCalledWith([bromine], 'private');
    expect(wrapper.get('section[aria-label="Imported"] a').attributes('href')).toBe('/m/salt-lake-bromine');
  });

  it('shows the server’s reason when a file is refused', async () => {
    vi.mocked(imports.previewImport).mockRejectedValue(new ApiError(415, 'NOT_TEXT', 'picture.steps: not UTF-8 text; upload .steps files or a JSON export'));
    const wrapper = await chooseFiles([new File([new Uint8Array([0x89, 0x50])], 'picture.steps')]);
    expect(wrapper.get('[role="alert"]').text()).toContain('picture.steps: not UTF-8 text');
    expect(wrapper.find('tbody').exists()).toBe(false);
  });

  it('refuses an empty file in its row and keeps the Import button off', async () => {
    const empty = new File([''], 'empty.steps', { type: 'text/plain' });
    vi.mocked(imports.previewImport).mockResolvedValue([
      { ...preview, file: 'empty.steps', title: 'empty', slug: 'empty', steps: 0, routes: [], refusal: 'the file is empty' },
      preview,
    ]);
    const wrapper = await chooseFiles([empty, bromine]);
    expect(wrapper.get('tbody').text()).toContain('refused: the file is empty');
    expect(wrapper.get('[role="alert"]').text()).toContain('empty.steps: the file is empty');
    const importButton = wrapper.get('button.p-button:not(.p-togglebutton)');
    expect(importButton.attributes('disabled')).toBeDefined();
    await importButton.trigger('click');
    expect(imports.importFiles).not.toHaveBeenCalled();
  });
});
