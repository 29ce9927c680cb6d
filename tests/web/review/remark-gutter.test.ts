import { readFileSync } from 'node:fs';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { defineComponent, h, nextTick, onMounted, ref } from 'vue';
import { flushPromises } from '@vue/test-utils';
import { EditorState } from '@codemirror/state';
import { EditorView } from '@codemirror/view';
import { analyseMechanism } from '@api/chemistry/analyse';
import type { MechanismAnalysis } from '@api/analysis/analysis.schemas';
import { remarkGutter } from '@web/components/workbench/review/remarkGutter';
import * as auth from '@web/services/auth';
import { useReviewStore } from '@web/stores/review';
import { demoUser } from '../mount-app';
import { demoRemark, demoRound } from './review-fixtures';
import { mountWithProps } from './mount-with-props';

vi.mock('@web/services/auth', () => ({ fetchSession: vi.fn(), GITHUB_SIGN_IN_PATH: '/auth/github' }));

const source = readFileSync('examples/stratospheric-nox.steps', 'utf8');
const analysis = JSON.parse(JSON.stringify(analyseMechanism(source), (_k, v) => (typeof v === 'bigint' ? Number(v) : v))) as MechanismAnalysis;

/** The smallest editor host: the gutter is set up while the component mounts, as in the workbench. */
const EditorHost = defineComponent(() => {
  const host = ref<HTMLDivElement>();
  onMounted(() => {
    new EditorView({ parent: host.value!, state: EditorState.create({ doc: source, extensions: [remarkGutter(() => analysis)] }) });
  });
  return () => h('div', { ref: host });
});

afterEach(() => {
  document.body.innerHTML = '';
});

describe('remarkGutter', () => {
  it('marks the lines of the remarked steps and follows new remarks', async () => {
    vi.mocked(auth.fetchSession).mockResolvedValue({ user: demoUser(['author']), csrfToken: 't' });
    const { wrapper, pinia } = await mountWithProps(EditorHost, {}, '/m/stratospheric-nox/compare');
    const review = useReviewStore(pinia);
    review.slug = 'stratospheric-nox';
    review.round = demoRound();
    review.remarks = [demoRemark()];
    await nextTick();
    await flushPromises();
    const markers = () => wrapper.findAll('.cm-remark-gutter .cm-remark-marker');
    expect(markers()).toHaveLength(1);
    expect(markers()[0].attributes('title')).toContain('Kofi Glasswort (open): Check the **rate**');
    const c2 = analysis.steps.find((step) => step.id === 'C2')!;
    review.remarks = [demoRemark(), demoRemark({ id: 40, stepLabel: 'C2', stepNormalised: c2.normalised, state: 'settled' })];
    await nextTick();
    expect(markers()).toHaveLength(2);
    expect(markers()[0].classes()).toContain('cm-remark-marker--settled');
  });
});
