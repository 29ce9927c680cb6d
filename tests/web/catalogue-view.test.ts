import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { flushPromises } from '@vue/test-utils';
import CatalogueView from '@web/views/CatalogueView.vue';
import * as auth from '@web/services/auth';
import * as catalogue from '@web/services/catalogue';
import { ApiError } from '@web/services/http';
import { demoUser, mountWithApp } from './mount-app';

vi.mock('@web/services/auth', () => ({ fetchSession: vi.fn(), GITHUB_SIGN_IN_PATH: '/auth/github' }));
vi.mock('@web/services/catalogue', () => ({
  searchCatalogue: vi.fn(), createCatalogueEntry: vi.fn(), updateCatalogueEntry: vi.fn(), depictionUrl: (id: number) => `/api/catalogue/${id}/depiction.svg`,
}));

// Ozone's formal charges −1, +1, 0 as the server reads them from [O-][O+]=O (common practice).
const ozone: catalogue.CatalogueEntry = {
  id: 3, name: 'ozone', formula: 'O3', lookupKey: 'O3', charge: 0, state: null, smiles: '[O-][O+]=O',
  dfH: 142.674, dfHUncertainty: 1.7, dfHSource: 'NIST-JANAF Thermochemical Tables', notes: '', updatedAt: '2026-11-30T10:00:00Z',
  structure: { formula: 'O3', charge: 0, formalCharges: [{ atom: 0, symbol: 'O', charge: -1 }, { atom: 1, symbol: 'O', charge: 1 }, { atom: 2, symbol: 'O', charge: 0 }], unpairedElectrons: 0, oddElectrons: false },
};

async function openAs(roles: Parameters<typeof demoUser>[0]) {
  vi.mocked(auth.fetchSession).mockResolvedValue({ user: demoUser(roles), csrfToken: 't' });
  return (await mountWithApp(CatalogueView, { path: '/catalogue' })).wrapper;
}

beforeEach(() => {
  vi.mocked(catalogue.searchCatalogue).mockResolvedValue({ total: 1, page: 1, items: [ozone] });
});
afterEach(() => {
  vi.mocked(catalogue.createCatalogueEntry).mockReset();
  document.body.innerHTML = '';
});

describe('CatalogueView', () => {
  it('lists the species and opens one with its depiction and formal charges', async () => {
    const wrapper = await openAs(['author']);
    expect(wrapper.findAll('tbody tr')).toHaveLength(1);
    expect(wrapper.text()).toContain('142.674 ± 1.7');
    await wrapper.get('tbody tr').trigger('click');
    const panel = wrapper.get('aside');
    expect(panel.get('img').attributes('src')).toBe('/api/catalogue/3/depiction.svg');
    expect(panel.text()).toContain('O1: −1');
    expect(panel.text()).toContain('O2: +1');
    expect(panel.find('button').exists()).toBe(false);
  });

  it('searches by name or formula and by SMILES fragment', async () => {
    const wrapper = await openAs(['author']);
    await wrapper.get('input[aria-label="Name or formula"]').setValue('ozone');
    await wrapper.get('input[aria-label="Contains SMILES fragment"]').setValue('OO');
    await wrapper.get('form[role="search"]').trigger('submit');
    expect(catalogue.searchCatalogue).toHaveBeenLastCalledWith({ q: 'ozone', substructure: 'OO' });
  });

  it('offers curators a form and shows the server’s reason under the field it names', async () => {
    vi.mocked(catalogue.createCatalogueEntry).mockRejectedValue(
      new ApiError(422, 'STRUCTURE_MISMATCH', 'smiles does not match formula ClO2^-', { field: 'smiles' }),
    );
    const wrapper = await openAs(['curator']);
    await wrapper.get('button.catalogue-view__add').trigger('click');
    await flushPromises();
    const form = document.querySelector('form.catalogue-entry-form') as HTMLFormElement;
    (form.querySelector('#entry-name') as HTMLInputElement).value = 'chlorite ion';
    form.querySelector('#entry-name')!.dispatchEvent(new Event('input'));
    (form.querySelector('#entry-formula') as HTMLInputElement).value = 'ClO2^-';
    form.querySelector('#entry-formula')!.dispatchEvent(new Event('input'));
    (form.querySelector('#entry-smiles') as HTMLInputElement).value = 'O=Cl=O';
    form.querySelector('#entry-smiles')!.dispatchEvent(new Event('input'));
    form.dispatchEvent(new Event('submit'));
    await flushPromises();
    expect(catalogue.createCatalogueEntry).toHaveBeenCalledWith(expect.objectContaining({ name: 'chlorite ion', formula: 'ClO2^-', smiles: 'O=Cl=O' }));
    expect(document.querySelector('#entry-smiles-error')?.textContent).toContain('smiles does not match formula ClO2^-');
  });

  it('puts each refused field’s own sentence under it, without the validator’s summary', async () => {
    vi.mocked(catalogue.createCatalogueEntry).mockRejectedValue(
      new ApiError(400, 'VALIDATION_FAILED', 'Invalid input — dfHSource: An enthalpy of formation needs its published source', [
        { path: ['dfHSource'], message: 'An enthalpy of formation needs its published source' },
        { path: ['name'], message: 'Give the species a name' },
      ]),
    );
    const wrapper = await openAs(['curator']);
    await wrapper.get('button.catalogue-view__add').trigger('click');
    await flushPromises();
    const form = document.querySelector('form.catalogue-entry-form') as HTMLFormElement;
    form.dispatchEvent(new Event('submit'));
    await flushPromises();
    expect(document.querySelector('#entry-source-error')?.textContent?.trim()).toBe('An enthalpy of formation needs its published source');
    expect(document.querySelector('#entry-name-error')?.textContent?.trim()).toBe('Give the species a name');
    expect(document.body.textContent).not.toContain('Invalid input');
  });
});
