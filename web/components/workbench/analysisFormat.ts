import type { SpeciesRole, StepJson } from '@api/analysis/analysis.schemas';

/** kJ mol⁻¹ with one decimal and a proper minus sign; a dash when unknown. */
export function formatEnthalpy(value: number | null): string {
  if (value === null) return '—';
  return value.toFixed(1).replace('-', '−');
}

/** Why a step's ΔH is what it is, for its tooltip: not given for an unbalanced step, or the species without ΔfH. */
export function enthalpyNote(step: Pick<StepJson, 'balanced' | 'missingEnthalpies'>): string | undefined {
  if (!step.balanced) return 'No ΔH: the step is not balanced';
  return step.missingEnthalpies.length > 0 ? `No ΔfH for ${step.missingEnthalpies.join(', ')}` : undefined;
}

/** A photolysis threshold wavelength in nm, rounded to the nanometre. */
export function formatWavelength(value: number | null): string {
  return value === null ? '—' : `${Math.round(value)} nm`;
}

const signed = (value: number) => (value > 0 ? `+${value}` : `${value}`.replace('-', '−'));

/** What a step fails to conserve, in words: "Br −1, charge +1". Empty when balanced. */
export function imbalanceText(step: Pick<StepJson, 'imbalance' | 'chargeDelta' | 'siteDelta'>): string {
  const parts = Object.entries(step.imbalance).map(([element, delta]) => `${element} ${signed(delta)}`);
  if (step.chargeDelta !== 0) parts.push(`charge ${signed(step.chargeDelta)}`);
  if (step.siteDelta !== 0) parts.push(`sites ${signed(step.siteDelta)}`);
  return parts.join(', ');
}

export interface RoleLook {
  label: string;
  icon: string;
  /** A CSS modifier; catalysts amber, intermediates teal — always beside the icon and the word. */
  tone: 'catalyst' | 'intermediate' | 'plain';
}

const ROLE_LOOKS: Record<SpeciesRole, RoleLook> = {
  catalyst: { label: 'catalyst', icon: 'pi pi-replay', tone: 'catalyst' },
  intermediate: { label: 'intermediate', icon: 'pi pi-circle', tone: 'intermediate' },
  reactant: { label: 'reactant', icon: 'pi pi-sign-in', tone: 'plain' },
  product: { label: 'product', icon: 'pi pi-sign-out', tone: 'plain' },
  'third-body': { label: 'third body', icon: 'pi pi-arrows-alt', tone: 'plain' },
  photon: { label: 'photon', icon: 'pi pi-sun', tone: 'plain' },
  site: { label: 'surface site', icon: 'pi pi-stop', tone: 'plain' },
  unused: { label: 'in no route', icon: 'pi pi-minus', tone: 'plain' },
};

export function roleLook(role: SpeciesRole): RoleLook {
  return ROLE_LOOKS[role];
}

/** The step class as a reader says it. */
export function stepClassLabel(stepClass: string): string {
  return stepClass.replace(/-/g, ' ');
}
