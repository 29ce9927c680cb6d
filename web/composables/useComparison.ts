import { computed, watch } from 'vue';
import { getMechanism, type MechanismSummary } from '@web/services/mechanisms';
import { compareRevisions, type Comparison } from '@web/services/revisions';
import { useLoader } from './useLoader';

/** Revision numbers read from the address: positive integers only. */
export function revisionNumber(value: unknown): number | null {
  const text = Array.isArray(value) ? value[0] : value;
  const n = Number(text);
  return Number.isInteger(n) && n > 0 ? n : null;
}

/**
 * The comparison of two revisions of one mechanism, loaded again when any of the three changes,
 * and the mechanism itself (its title heads the page; the address names it only by slug).
 */
export function useComparison(params: () => { slug: string; from: number | null; to: number | null }) {
  const valid = computed(() => {
    const { from, to } = params();
    return from !== null && to !== null;
  });
  const loader = useLoader<Comparison | null>(() => {
    const { slug, from, to } = params();
    return from !== null && to !== null ? compareRevisions(slug, from, to) : Promise.resolve(null);
  }, null);
  const mechanism = useLoader<MechanismSummary | null>(() => getMechanism(params().slug), null);
  watch(params, () => void loader.load(), { immediate: true, deep: true });
  watch(() => params().slug, () => void mechanism.load(), { immediate: true });
  return { comparison: loader.data, mechanism: mechanism.data, pending: loader.pending, error: loader.error, reload: loader.load, valid };
}
