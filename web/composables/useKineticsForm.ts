import { computed, reactive, toValue, watch, type MaybeRefOrGetter } from 'vue';
import type { MechanismAnalysis } from '@api/analysis/analysis.schemas';
import { defaultForm, simulableSpecies, type KineticsForm } from '@web/components/workbench/kinetics/kineticsForm';

const forms = new Map<string, KineticsForm>();

/** Keeps what was typed for species still there, adds empty fields for new ones, drops the rest. */
function followSpecies(form: KineticsForm, analysis: MechanismAnalysis): void {
  const keys = simulableSpecies(analysis).map((s) => s.key);
  form.initial = Object.fromEntries(keys.map((key) => [key, form.initial[key] ?? '']));
  form.fixed = form.fixed.filter((key) => keys.includes(key));
}

/**
 * The kinetics form of one mechanism and revision, kept while the person switches panels, and
 * following the species list as the mechanism is edited.
 */
export function useKineticsForm(key: MaybeRefOrGetter<string>, analysis: MaybeRefOrGetter<MechanismAnalysis | null>) {
  const form = computed(() => {
    const id = toValue(key);
    let existing = forms.get(id);
    if (!existing) {
      existing = reactive(defaultForm(toValue(analysis) ?? ({ conditions: { T: null, P: null, M: null }, species: [] } as never)));
      forms.set(id, existing);
    }
    return existing;
  });
  watch(
    () => [form.value, toValue(analysis)?.species.map((s) => s.key).join('|')] as const,
    () => {
      const current = toValue(analysis);
      if (current) followSpecies(form.value, current);
    },
    { immediate: true },
  );
  return form;
}
