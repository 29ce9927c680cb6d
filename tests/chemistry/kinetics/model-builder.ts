import type { KineticModel, KineticStep, SpeciesTerm } from '@api/chemistry/kinetics/model';
import type { ConcentrationUnit } from '@api/chemistry/kinetics/units';

/**
 * Builds a kinetic model from compact lines such as `R1: 2 A + M -> B + M @ 1e-3` or
 * `R2: A <=> B @ 2 | 1`, so tests read like mechanisms. `hv` marks photolysis; M a third body.
 */
export function modelOf(lines: string[], unit: ConcentrationUnit = 'molecule cm^-3'): KineticModel {
  const species: string[] = [];
  const indexOf = (key: string) => {
    if (!species.includes(key)) species.push(key);
    return species.indexOf(key);
  };
  const side = (text: string): SpeciesTerm[] =>
    text
      .split('+')
      .map((term) => term.trim())
      .filter((term) => term !== 'M' && term !== 'hv')
      .map((term) => {
        const match = /^(\d*\.?\d*)\s*(\S+)$/.exec(term);
        if (!match) throw new Error(`bad term "${term}"`);
        return { index: indexOf(match[2]), coef: match[1] === '' ? 1 : Number(match[1]) };
      });
  const steps = lines.map((line): KineticStep => {
    const [head, rate] = line.split('@').map((part) => part.trim());
    const [label, equation] = head.split(':').map((part) => part.trim());
    const reversible = equation.includes('<=>');
    const [left, right] = equation.split(reversible ? '<=>' : '->');
    const [forward, reverse] = rate.split('|').map((part) => part.trim());
    return {
      label,
      reactants: side(left),
      products: side(right),
      thirdBody: /(^|\+)\s*M\s*(\+|$)/.test(left),
      photolysis: /(^|\+)\s*hv\s*(\+|$)/.test(left),
      forward,
      reverse: reversible ? reverse : null,
    };
  });
  return { species, steps, unit };
}
