import { afterEach, describe, expect, it } from 'vitest';
import WorkbenchHeader from '@web/components/workbench/WorkbenchHeader.vue';
import { demoMechanism } from '../review/review-fixtures';
import { mountWithProps } from '../review/mount-with-props';

async function openRename() {
  const mechanism = demoMechanism({ youCanEdit: true });
  const { wrapper } = await mountWithProps(WorkbenchHeader, {
    mechanism, revisions: [], shownRevision: 1, roundState: null, canRename: true, saving: false, renaming: false,
  }, `/m/${mechanism.slug}`);
  await wrapper.get('button[aria-label="Rename the mechanism"]').trigger('click');
  return wrapper;
}

afterEach(() => {
  document.body.innerHTML = '';
});

describe('renaming a mechanism from the workbench header', () => {
  it('keeps the form open with “Give the mechanism a title” when the title is emptied', async () => {
    const wrapper = await openRename();
    await wrapper.get('#workbench-title').setValue('   ');
    await wrapper.get('form').trigger('submit');
    expect(wrapper.find('form').exists()).toBe(true);
    expect(wrapper.get('#workbench-title-error').text()).toBe('Give the mechanism a title');
    expect(wrapper.emitted('rename')).toBeUndefined();

    await wrapper.get('#workbench-title').setValue('Salt-lake bromine cycle at dawn');
    expect(wrapper.find('#workbench-title-error').exists()).toBe(false);
    await wrapper.get('form').trigger('submit');
    expect(wrapper.emitted('rename')).toEqual([['Salt-lake bromine cycle at dawn']]);
    expect(wrapper.find('form').exists()).toBe(false);
    wrapper.unmount();
  });
});
