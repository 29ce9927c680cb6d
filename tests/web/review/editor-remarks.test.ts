import { afterEach, describe, expect, it, vi } from 'vitest';
import { defineComponent, h, nextTick, onMounted, ref } from 'vue';
import { flushPromises } from '@vue/test-utils';
import { EditorState } from '@codemirror/state';
import { EditorView } from '@codemirror/view';
import type { Remark } from '@web/services/reviews';
import { editorRemarks } from '@web/components/workbench/review/editorRemarks';
import * as auth from '@web/services/auth';
import { useReviewStore } from '@web/stores/review';
import { demoUser } from '../mount-app';
import { analysedAsJson, demoRemark, demoRound, NOX_SOURCE } from './review-fixtures';
import { mountWithProps } from './mount-with-props';

vi.mock('@web/services/auth', () => ({ fetchSession: vi.fn(), GITHUB_SIGN_IN_PATH: '/auth/github' }));

const source = NOX_SOURCE;
const analysis = analysedAsJson(source);

const opened = vi.fn<(remarkId: number) => void>();
let view: EditorView;

/** The smallest editor host: the remarks are set up while the component mounts, as in the workbench. */
const EditorHost = defineComponent(() => {
  const host = ref<HTMLDivElement>();
  const extension = editorRemarks(() => analysis, opened);
  onMounted(() => {
    view = new EditorView({ parent: host.value!, state: EditorState.create({ doc: source, extensions: [extension] }) });
  });
  return () => h('div', { ref: host });
});

async function editorWith(remarks: Remark[]) {
  vi.mocked(auth.fetchSession).mockResolvedValue({ user: demoUser(['author']), csrfToken: 't' });
  const { wrapper, pinia } = await mountWithProps(EditorHost, {}, '/m/stratospheric-nox/compare');
  const review = useReviewStore(pinia);
  review.slug = 'stratospheric-nox';
  review.round = demoRound();
  review.remarks = remarks;
  await nextTick();
  await flushPromises();
  return { wrapper, review };
}

const c2 = analysis.steps.find((step) => step.id === 'C2')!;
const n1 = analysis.steps.find((step) => step.id === 'N1')!;

afterEach(() => {
  document.body.innerHTML = '';
});

describe('the remarks in the step editor', () => {
  it('marks the lines of the remarked steps in the gutter and follows new remarks', async () => {
    const { wrapper, review } = await editorWith([demoRemark()]);
    const markers = () => wrapper.findAll('.cm-remark-gutter .cm-remark-marker');
    expect(markers()).toHaveLength(1);
    expect(markers()[0].attributes('title')).toContain('Kofi Glasswort (open): Check the **rate**');
    review.remarks = [demoRemark(), demoRemark({ id: 40, stepLabel: 'C2', stepNormalised: c2.normalised, state: 'settled' })];
    await nextTick();
    expect(markers()).toHaveLength(2);
    expect(markers()[0].classes()).toContain('cm-remark-marker--settled');
  });

  it('shows each remark under its step line: author, first line, replies and state', async () => {
    const reply = { id: 5, remarkId: 40, body: 'Done', bodyHtml: '<p>Done</p>', authorId: 1, authorName: 'Rosalind Samphire', createdAt: '2026-11-21T09:00:00.000Z' };
    const { wrapper } = await editorWith([
      demoRemark({ bodyHtml: '<p>Check the <strong>rate</strong> against the\nevaluation</p>\n<p>Second paragraph</p>' }),
      demoRemark({ id: 40, stepLabel: 'C2', stepNormalised: c2.normalised, state: 'settled', authorName: 'Mei Tidewell', bodyHtml: '<p>Termolecular: fine</p>', replies: [reply, { ...reply, id: 6 }] }),
    ]);
    const blocks = wrapper.findAll('.cm-remark-inline');
    expect(blocks).toHaveLength(2);
    const items = wrapper.findAll('.cm-remark-inline__item');
    const texts = items.map((item) => item.text().replace(/\s+/g, ' '));
    // C2 comes before N1 in the text, so its block is first.
    expect(c2.line).toBeLessThan(n1.line);
    expect(texts).toEqual([
      'Open remark: Mei Tidewell Termolecular: fine 2 replies settled',
      'Open remark: Kofi Glasswort Check the rate against the 0 replies open',
    ]);
    expect(items[0].classes()).toContain('cm-remark-inline__item--settled');
    // Each block sits right under its step's line.
    const lineAbove = (block: Element) => block.previousElementSibling?.textContent ?? '';
    expect(lineAbove(blocks[0].element)).toContain('C2:');
    expect(lineAbove(blocks[1].element)).toContain('N1:');
  });

  it('opens the thread from the button of the remark, which the keyboard reaches', async () => {
    const { wrapper } = await editorWith([demoRemark()]);
    const button = wrapper.get<HTMLButtonElement>('.cm-remark-inline__item');
    expect(button.element.tagName).toBe('BUTTON');
    expect(button.element.tabIndex).toBe(0);
    await button.trigger('click');
    expect(opened).toHaveBeenCalledWith(21);
  });

  it('keeps the block on its step while lines are typed above it, and drops it when the remark is settled away', async () => {
    const { wrapper, review } = await editorWith([demoRemark()]);
    view.dispatch({ changes: { from: 0, insert: '# a note\n# another\n' } });
    await nextTick();
    const block = wrapper.get('.cm-remark-inline').element;
    expect(block.previousElementSibling?.textContent).toContain('N1:');
    review.remarks = [];
    await nextTick();
    expect(wrapper.findAll('.cm-remark-inline')).toHaveLength(0);
  });
});
