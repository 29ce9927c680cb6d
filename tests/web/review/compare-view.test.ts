import { readFileSync } from 'node:fs';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { flushPromises } from '@vue/test-utils';
import { compareRevisions as compareOnServer } from '@api/comparison/compare';
import { analyseSource } from '@api/revisions/analyse-source';
import CompareView from '@web/views/CompareView.vue';
import * as auth from '@web/services/auth';
import { ApiError } from '@web/services/http';
import * as mechanisms from '@web/services/mechanisms';
import * as revisions from '@web/services/revisions';
import type { Comparison } from '@web/services/revisions';
import { demoUser, eventually } from '../mount-app';
import { mountWithProps } from './mount-with-props';
import { demoMechanism } from './review-fixtures';

vi.mock('@web/services/auth', () => ({ fetchSession: vi.fn(), GITHUB_SIGN_IN_PATH: '/auth/github' }));
vi.mock('@web/services/revisions', () => ({ compareRevisions: vi.fn() }));
vi.mock('@web/services/mechanisms', () => ({ getMechanism: vi.fn() }));

const r1 = readFileSync('examples/stratospheric-nox.steps', 'utf8');
// r2: a new rate for N1, the O + O3 loss step dropped, chlorine's ozone step added.
const r2 = r1
  .replace('3.0e-12 * exp(-1500 / T)', '3.0e-12 * exp(-1400 / T)')
  .replace(/^C4:.*\n/m, '')
  .concat('X1: Cl• + O3 -> ClO• + O2           @ 2.3e-11 * exp(-200 / T)\n');

/** The comparison exactly as the API sends it: the server's own function, through JSON. */
function realComparison(): Comparison {
  const revision = (number: number, source: string) => ({ number, source, analysis: analyseSource(source).analysis });
  return JSON.parse(JSON.stringify(compareOnServer(revision(1, r1), revision(2, r2)))) as Comparison;
}

afterEach(() => {
  vi.clearAllMocks();
  document.body.innerHTML = '';
});

describe('CompareView', () => {
  it('renders the step, route and role changes and the line diff of a real comparison', async () => {
    vi.mocked(auth.fetchSession).mockResolvedValue({ user: demoUser(['author']), csrfToken: 't' });
    vi.mocked(revisions.compareRevisions).mockResolvedValue(realComparison());
    const { wrapper } = await mountWithProps(CompareView, {}, '/m/stratospheric-nox/compare?from=1&to=2');
    await flushPromises();
    expect(revisions.compareRevisions).toHaveBeenCalledWith('stratospheric-nox', 1, 2);
    const steps = wrapper.get('.compare-view-steps');
    expect(steps.text()).toContain('1 changed · 1 added · 1 removed');
    const changed = steps.get('.compare-view-steps__item--changed');
    expect(changed.text()).toContain('N1');
    expect(changed.text()).toContain('exp(-1500 / T)');
    expect(changed.text()).toContain('exp(-1400 / T)');
    expect(changed.text()).toContain('matched by label');
    expect(steps.get('.compare-view-steps__item--added').text()).toContain('X1');
    expect(steps.get('.compare-view-steps__item--removed').text()).toContain('C4');
    expect(wrapper.get('.compare-view-routes__roles').text()).toMatch(/Species.*\+\s*Cl/s);
    const removedLines = wrapper.findAll('.compare-view-lines__row--removed').map((row) => row.text());
    expect(removedLines.some((text) => text.includes('C4: O(3P) + O3 -> 2 O2'))).toBe(true);
    expect(wrapper.findAll('.compare-view-lines__row--added').some((row) => row.text().includes('X1: Cl•'))).toBe(true);
  });

  it('asks for two revisions when the address names none', async () => {
    vi.mocked(auth.fetchSession).mockResolvedValue({ user: demoUser(['author']), csrfToken: 't' });
    const { wrapper } = await mountWithProps(CompareView, {}, '/m/stratospheric-nox/compare');
    expect(wrapper.text()).toContain('Pick two revisions');
    expect(revisions.compareRevisions).not.toHaveBeenCalled();
  });

  it("is headed by the mechanism's title, not the slug of its address", async () => {
    vi.mocked(auth.fetchSession).mockResolvedValue({ user: demoUser(['author']), csrfToken: 't' });
    vi.mocked(mechanisms.getMechanism).mockResolvedValue(demoMechanism());
    // The comparison itself is not what this test reads: it may fail without hiding the heading.
    vi.mocked(revisions.compareRevisions).mockRejectedValue(new ApiError(503, 'HTTP_503', 'down'));
    const { wrapper } = await mountWithProps(CompareView, {}, '/m/stratospheric-nox/compare?from=1&to=2');
    await eventually(() => expect(wrapper.get('h1').text()).toContain('Ozone production and catalytic loss by nitrogen oxides'));
    expect(wrapper.get('h1').text()).not.toContain('stratospheric-nox');
    expect(wrapper.get('h1').text()).toContain('Compare revisions');
    expect(mechanisms.getMechanism).toHaveBeenCalledWith('stratospheric-nox');
  });
});
