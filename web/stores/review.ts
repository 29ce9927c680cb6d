import { defineStore } from 'pinia';
import { computed, ref } from 'vue';
import * as reviews from '@web/services/reviews';
import type { Remark, RoundDetail, RoundListItem, Verdict } from '@web/services/reviews';
import { useReviewActivityStore } from './reviewActivity';

const ACTIVE = ['open', 'revise-requested', 'endorsed'];
const toError = (caught: unknown) => (caught instanceof Error ? caught : new Error(String(caught)));

/**
 * The review of the mechanism open on the workbench: its rounds, the current one (the round in
 * progress, else the latest) and that round's remarks. One store, so the remarks panel, the round
 * panel and the editor's gutter show the same remarks and refresh together.
 */
export const useReviewStore = defineStore('review', () => {
  const activity = useReviewActivityStore();
  const slug = ref<string | null>(null);
  const rounds = ref<RoundListItem[]>([]);
  const round = ref<RoundDetail | null>(null);
  const remarks = ref<Remark[]>([]);
  const pending = ref(false);
  const error = ref<Error | null>(null);

  /** A remark another part of the workbench asked to show; the Remarks section brings it into view, then clears it. */
  const shownRemarkId = ref<number | null>(null);

  const isActive = computed(() => round.value !== null && ACTIVE.includes(round.value.state));

  /** Loads the review of a mechanism (again); a slug of null forgets it. */
  async function load(nextSlug: string | null): Promise<void> {
    if (nextSlug !== slug.value) reset(nextSlug);
    if (!nextSlug) return;
    pending.value = true;
    error.value = null;
    try {
      rounds.value = await reviews.listRounds(nextSlug);
      const current = rounds.value.find((r) => ACTIVE.includes(r.state)) ?? rounds.value[0];
      // Both together, so the round and its remarks never show different revisions.
      const [detail, list] = current ? await Promise.all([reviews.getRound(current.id), reviews.listRemarks(current.id)]) : [null, []];
      round.value = detail;
      remarks.value = list;
    } catch (caught) {
      error.value = toError(caught);
    } finally {
      pending.value = false;
    }
  }

  function reset(nextSlug: string | null): void {
    slug.value = nextSlug;
    rounds.value = [];
    round.value = null;
    remarks.value = [];
    error.value = null;
  }

  const reload = () => load(slug.value);

  /** Runs one act on the round and shows the round as the server answers it; errors are thrown to the caller's form. */
  async function act(action: (roundId: number) => Promise<RoundDetail>): Promise<void> {
    if (!round.value) throw new Error('There is no review round to act on');
    round.value = await action(round.value.id);
    activity.record();
    await reload();
  }

  async function openRound(revision?: number): Promise<void> {
    if (!slug.value) return;
    await reviews.openRound(slug.value, revision);
    activity.record();
    await reload();
  }

  const assignReviewer = (userId: number) => act((id) => reviews.assignReviewer(id, userId));
  const giveVerdict = (verdict: Verdict, comment: string) => act((id) => reviews.giveVerdict(id, verdict, comment));
  const withdraw = () => act(reviews.withdrawRound);
  const adopt = () => act(reviews.adoptRound);

  async function addRemark(step: string, body: string): Promise<void> {
    if (!round.value) throw new Error('There is no review round to remark on');
    await reviews.addRemark(round.value.id, step, body);
    remarks.value = await reviews.listRemarks(round.value.id);
  }

  async function reply(remarkId: number, body: string): Promise<void> {
    await reviews.replyToRemark(remarkId, body);
    if (round.value) remarks.value = await reviews.listRemarks(round.value.id);
  }

  async function settle(remarkId: number): Promise<void> {
    await reviews.settleRemark(remarkId);
    if (round.value) remarks.value = await reviews.listRemarks(round.value.id);
  }

  const showRemark = (remarkId: number | null) => {
    shownRemarkId.value = remarkId;
  };

  return {
    slug, rounds, round, remarks, pending, error, isActive, shownRemarkId,
    load, showRemark, reload, openRound, assignReviewer, giveVerdict, withdraw, adopt, addRemark, reply, settle,
  };
});
