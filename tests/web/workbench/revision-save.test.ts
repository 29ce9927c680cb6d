import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { ref } from 'vue';
import { useRevisionSave } from '@web/composables/useRevisionSave';
import { readDraft } from '@web/composables/useDraftStorage';
import { ApiError } from '@web/services/http';
import * as mechanisms from '@web/services/mechanisms';

vi.mock('@web/services/mechanisms', () => ({ saveRevision: vi.fn() }));

const TEXT_R2 = 'B1: Br• + O3 -> BrO• + O2\nB2: BrO• + BrO• -> 2 Br• + O2';
const MINE = 'B1: Br• + O3 -> BrO• + O2\nB5: Br2 + hν -> 2 Br•';

function setup() {
  const slug = ref<string | null>('salt-lake-bromine');
  const base = ref<number | null>(1);
  const source = ref(MINE);
  return { slug, base, source, save: useRevisionSave(slug, base, source) };
}

const conflict = () =>
  new ApiError(409, 'CONFLICT', 'r1 is no longer the latest revision (r2 is); rebase your text on it', {
    latest: { number: 2, source: TEXT_R2, changeNote: 'Self-reaction of BrO', authorId: 3 },
    yours: { rejectedSubmissionId: 9, base: 1, source: MINE, changeNote: 'Daytime source' },
  });

beforeEach(() => localStorage.clear());
afterEach(() => vi.mocked(mechanisms.saveRevision).mockReset());

describe('useRevisionSave', () => {
  it('saves the text on the revision the editor started from and forgets the draft', async () => {
    const saved = { id: 5, number: 2, source: MINE };
    vi.mocked(mechanisms.saveRevision).mockResolvedValue(saved as never);
    const { save } = setup();
    expect(await save.save('Daytime source')).toBe(saved);
    expect(mechanisms.saveRevision).toHaveBeenCalledWith('salt-lake-bromine', { base: 1, source: MINE, changeNote: 'Daytime source' });
    expect(readDraft('salt-lake-bromine')).toBeNull();
    expect(save.conflict.value).toBeNull();
  });

  it('keeps the draft and shows both texts when someone saved first (409)', async () => {
    vi.mocked(mechanisms.saveRevision).mockRejectedValue(conflict());
    const { save } = setup();
    expect(await save.save('Daytime source')).toBeNull();
    expect(save.conflict.value?.latest.source).toBe(TEXT_R2);
    expect(save.conflict.value?.yours.source).toBe(MINE);
    expect(readDraft('salt-lake-bromine')).toMatchObject({ source: MINE, base: 1 });
  });

  it('rebases: the editor takes the latest text and number, the author\'s text stays beside it', async () => {
    vi.mocked(mechanisms.saveRevision).mockRejectedValue(conflict());
    const { save, base, source } = setup();
    await save.save('');
    save.takeLatest();
    expect(source.value).toBe(TEXT_R2);
    expect(base.value).toBe(2);
    expect(save.keptText.value).toBe(MINE);
    expect(save.conflict.value).toBeNull();
  });

  it('keeps the draft and reports any other failure without a conflict', async () => {
    vi.mocked(mechanisms.saveRevision).mockRejectedValue(new ApiError(0, 'NETWORK_ERROR', 'The Cyclewright server could not be reached.'));
    const { save } = setup();
    expect(await save.save('')).toBeNull();
    expect(save.error.value?.message).toContain('could not be reached');
    expect(save.conflict.value).toBeNull();
    expect(readDraft('salt-lake-bromine')?.source).toBe(MINE);
  });

  it('refuses a text over the size limit without sending it, and keeps it as a draft', async () => {
    const { save, source } = setup();
    source.value = `# ${'x'.repeat(500_000)}\n`;
    expect(await save.save('')).toBeNull();
    expect(mechanisms.saveRevision).not.toHaveBeenCalled();
    expect(save.error.value?.message).toBe('The text has 500,003 characters; a revision holds at most 500,000');
    expect(readDraft('salt-lake-bromine')?.source).toBe(source.value);
  });

  it('saves once at a time', async () => {
    let finish: (value: never) => void = () => {};
    vi.mocked(mechanisms.saveRevision).mockReturnValue(new Promise((resolve) => (finish = resolve)));
    const { save } = setup();
    const first = save.save('');
    expect(await save.save('')).toBeNull();
    finish({ number: 2 } as never);
    await first;
    expect(mechanisms.saveRevision).toHaveBeenCalledTimes(1);
  });
});
