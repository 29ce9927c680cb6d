import { describe, expect, it } from 'vitest';
import type { MechanismAnalysis } from '@api/analysis/analysis.schemas';
import { SimulationInputs } from '@api/simulations/simulations.schemas';
import saltLake from '../../../examples/salt-lake-bromine.json';
import { defaultForm, formToInputs, type KineticsForm } from '@web/components/workbench/kinetics/kineticsForm';

const analysis = saltLake as unknown as MechanismAnalysis;
const filled = (over: Partial<KineticsForm> = {}): KineticsForm => {
  const form = defaultForm(analysis);
  form.initial.O3 = '1e12';
  form.initial.Br2 = '2.5e9';
  return { ...form, ...over };
};

describe('defaultForm', () => {
  it('starts from the mechanism’s %conditions and lists every species but hν and M', () => {
    const form = defaultForm(analysis);
    expect(form.T).toBe('275');
    expect(form.P).toBe('1');
    expect(form.pressureMode).toBe('P');
    expect(Object.keys(form.initial).sort()).toEqual(['Br2', 'Br•', 'BrO•', 'O(3P)', 'O2', 'O3'].sort());
  });
});

describe('formToInputs', () => {
  it('maps the form to the request body the server’s own schema accepts unchanged', () => {
    const { inputs, errors } = formToInputs(filled({ tEnd: '600', points: '50', spacing: 'linear', atol: '1e-3' }));
    expect(errors).toEqual({});
    expect(inputs).toEqual({
      conditions: { T: 275, P: 1 }, initial: { O3: 1e12, Br2: 2.5e9 }, fixed: [], tEnd: 600, points: 50,
      spacing: 'linear', light: { kind: 'constant', level: 1 }, steadyState: true, rtol: 1e-6, atol: 1e-3,
    });
    expect(SimulationInputs.parse(inputs)).toEqual(inputs);
  });

  it('sends [M] instead of P, darkness, fixed species and a diurnal sun with noon in seconds', () => {
    const dark = formToInputs(filled({ pressureMode: 'M', M: '2.46e19', lightOn: false, fixed: ['O3'] })).inputs!;
    expect(dark.conditions).toEqual({ T: 275, M: 2.46e19 });
    expect(dark.light).toEqual({ kind: 'constant', level: 0 });
    expect(dark.fixed).toEqual(['O3']);
    const sunny = formToInputs(filled({ lightKind: 'diurnal', latitudeDeg: '38.5', declinationDeg: '23.44', noonHours: '12' })).inputs!;
    expect(sunny.light).toEqual({ kind: 'diurnal', latitudeDeg: 38.5, declinationDeg: 23.44, noon: 43_200 });
    expect(SimulationInputs.parse(sunny).light).toEqual(sunny.light);
  });

  it('reads light windows and refuses one that ends before it starts', () => {
    const ok = formToInputs(filled({ lightKind: 'windows', windows: [{ start: '0', end: '60' }, { start: '120', end: '180' }] }));
    expect(ok.inputs!.light).toEqual({ kind: 'windows', on: [{ start: 0, end: 60 }, { start: 120, end: 180 }] });
    const bad = formToInputs(filled({ lightKind: 'windows', windows: [{ start: '60', end: '10' }] }));
    expect(bad.inputs).toBeNull();
    expect(bad.errors['windows.0.end']).toBe('must come after the start');
  });

  it('names every field it cannot read, and why', () => {
    const form = filled({ T: 'warm', tEnd: '0', points: '2.5', rtol: '' });
    form.initial.O3 = '-1';
    const { inputs, errors } = formToInputs(form);
    expect(inputs).toBeNull();
    expect(errors).toEqual({
      T: '“warm” is not a number', tEnd: 'must be greater than 0', points: 'must be a whole number',
      rtol: 'is required', 'initial.O3': 'must be at least 0',
    });
  });

  it('asks for at least one concentration, and one for each fixed species', () => {
    expect(formToInputs(defaultForm(analysis)).errors.initial).toBe('give at least one initial concentration');
    expect(formToInputs(filled({ fixed: ['O2'] })).errors['initial.O2']).toBe('a fixed species needs its concentration');
  });

  it('accepts a typed minus sign and ×10^ notation', () => {
    const form = filled();
    form.initial.O3 = '1.5×10^12';
    expect(formToInputs(form).inputs!.initial.O3).toBe(1.5e12);
  });
});
