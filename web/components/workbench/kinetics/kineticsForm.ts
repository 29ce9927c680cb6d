import type { MechanismAnalysis } from '@api/analysis/analysis.schemas';
import type { LightProfile, SimulationInputs } from '@api/simulations/simulations.schemas';

export type LightKind = 'constant' | 'windows' | 'diurnal';

/**
 * What the kinetics form holds. Numbers are kept as typed text ("2.5e12") so that scientific
 * notation survives editing; `formToInputs` reads them and names every field it cannot read.
 */
export interface KineticsForm {
  T: string;
  pressureMode: 'P' | 'M';
  P: string;
  M: string;
  tEnd: string;
  points: string;
  spacing: 'linear' | 'log';
  lightKind: LightKind;
  lightOn: boolean;
  windows: { start: string; end: string }[];
  latitudeDeg: string;
  declinationDeg: string;
  /** Hours after the start of the run. */
  noonHours: string;
  initial: Record<string, string>;
  fixed: string[];
  steadyState: boolean;
  rtol: string;
  atol: string;
}

/** Species that take an initial concentration: not the photon, the third body or a surface-free marker. */
export function simulableSpecies(analysis: MechanismAnalysis): MechanismAnalysis['species'] {
  return analysis.species.filter((s) => s.kind !== 'photon' && s.kind !== 'third-body');
}

/** A form filled from the mechanism's own %conditions, one empty concentration per species. */
export function defaultForm(analysis: MechanismAnalysis): KineticsForm {
  const { T, P, M } = analysis.conditions;
  return {
    T: String(T ?? 298.15), pressureMode: M !== null ? 'M' : 'P', P: String(P ?? 1), M: M !== null ? String(M) : '',
    tEnd: '3600', points: '200', spacing: 'log',
    lightKind: 'constant', lightOn: true, windows: [{ start: '0', end: '1800' }],
    latitudeDeg: '40', declinationDeg: '0', noonHours: '12',
    initial: Object.fromEntries(simulableSpecies(analysis).map((s) => [s.key, ''])),
    fixed: [], steadyState: true, rtol: '1e-6', atol: '',
  };
}

export type FormErrors = Record<string, string>;

/** Reads one number; records why in `errors` under `field` when it is not one or breaks `rule`. */
export function readNumber(text: string, field: string, errors: FormErrors, rule?: { min?: number; positive?: boolean; integer?: boolean }): number | undefined {
  const trimmed = text.trim();
  if (trimmed === '') return undefined;
  const value = Number(trimmed.replace(/[−–]/g, '-').replace(/×\s*10\^?/g, 'e'));
  if (!Number.isFinite(value)) errors[field] = `“${trimmed}” is not a number`;
  else if (rule?.positive && value <= 0) errors[field] = 'must be greater than 0';
  else if (rule?.min !== undefined && value < rule.min) errors[field] = `must be at least ${rule.min}`;
  else if (rule?.integer && !Number.isInteger(value)) errors[field] = 'must be a whole number';
  else return value;
  return undefined;
}

function required(value: number | undefined, field: string, errors: FormErrors): number {
  if (value === undefined && !errors[field]) errors[field] = 'is required';
  return value ?? 0;
}

function lightOf(form: KineticsForm, errors: FormErrors): LightProfile {
  if (form.lightKind === 'constant') return { kind: 'constant', level: form.lightOn ? 1 : 0 };
  if (form.lightKind === 'windows') {
    const on = form.windows.map((w, i) => {
      const start = required(readNumber(w.start, `windows.${i}.start`, errors, { min: 0 }), `windows.${i}.start`, errors);
      const end = required(readNumber(w.end, `windows.${i}.end`, errors, { min: 0 }), `windows.${i}.end`, errors);
      if (end <= start && !errors[`windows.${i}.end`]) errors[`windows.${i}.end`] = 'must come after the start';
      return { start, end };
    });
    if (on.length === 0) errors.windows = 'add at least one light window';
    return { kind: 'windows', on };
  }
  return {
    kind: 'diurnal',
    latitudeDeg: required(readNumber(form.latitudeDeg, 'latitudeDeg', errors, { min: -90 }), 'latitudeDeg', errors),
    declinationDeg: required(readNumber(form.declinationDeg, 'declinationDeg', errors, { min: -23.5 }), 'declinationDeg', errors),
    noon: required(readNumber(form.noonHours, 'noonHours', errors, { min: 0 }), 'noonHours', errors) * 3600,
  };
}

function initialOf(form: KineticsForm, errors: FormErrors): Record<string, number> {
  const initial: Record<string, number> = {};
  for (const [key, text] of Object.entries(form.initial)) {
    const value = readNumber(text, `initial.${key}`, errors, { min: 0 });
    if (value !== undefined) initial[key] = value;
  }
  if (Object.keys(initial).length === 0 && !Object.keys(errors).some((f) => f.startsWith('initial.'))) {
    errors.initial = 'give at least one initial concentration';
  }
  for (const key of form.fixed) if (!(key in initial) && !errors[`initial.${key}`]) errors[`initial.${key}`] = 'a fixed species needs its concentration';
  return initial;
}

/** The `inputs` of `POST /api/simulations` from the form, or the fields it could not read and why. */
export function formToInputs(form: KineticsForm): { inputs: SimulationInputs | null; errors: FormErrors } {
  const errors: FormErrors = {};
  const T = readNumber(form.T, 'T', errors, { positive: true });
  const pressure = form.pressureMode === 'P' ? { P: readNumber(form.P, 'P', errors, { positive: true }) } : { M: readNumber(form.M, 'M', errors, { positive: true }) };
  const inputs: SimulationInputs = {
    conditions: Object.fromEntries(Object.entries({ T, ...pressure }).filter(([, v]) => v !== undefined)),
    initial: initialOf(form, errors),
    fixed: [...form.fixed],
    tEnd: required(readNumber(form.tEnd, 'tEnd', errors, { positive: true }), 'tEnd', errors),
    points: required(readNumber(form.points, 'points', errors, { min: 2, integer: true }), 'points', errors),
    spacing: form.spacing,
    light: lightOf(form, errors),
    steadyState: form.steadyState,
    rtol: required(readNumber(form.rtol, 'rtol', errors, { positive: true }), 'rtol', errors),
  };
  const atol = readNumber(form.atol, 'atol', errors, { positive: true });
  if (atol !== undefined) inputs.atol = atol;
  return Object.keys(errors).length > 0 ? { inputs: null, errors } : { inputs, errors };
}
