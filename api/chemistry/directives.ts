import type { Assignment, DirectiveNode, ParticleNode } from '@grammar/ast';
import type { Diagnostic } from '@grammar/diagnostics';
import { finding } from './diagnostic-codes';
import { readDeclarations } from './declarations';
import type { DeclaredSpecies } from './species-resolve';

/** A species named in %terminal or %intermediates, with where it was named. */
export interface NamedParticle {
  node: ParticleNode;
  line: number;
  column: number;
}

/** What the directives of a mechanism set. */
export interface MechanismSettings {
  title: string | null;
  units: { conc: string; time: string };
  conditions: { T: number | null; P: number | null; M: number | null };
  terminal: NamedParticle[] | null;
  intermediates: NamedParticle[] | null;
  declarations: Map<string, DeclaredSpecies>;
}

const CONCENTRATION_UNITS = ['molecule cm^-3', 'mol L^-1', 'mol m^-2'];
const TIME_UNITS = ['s'];
/** Pressure units to atm (exact by definition: 1 atm = 101 325 Pa = 760 Torr; 1 bar = 10^5 Pa). */
const PRESSURE_TO_ATM: Record<string, number> = { atm: 1, bar: 100_000 / 101_325, Pa: 1 / 101_325, kPa: 1_000 / 101_325, hPa: 100 / 101_325, Torr: 1 / 760, mbar: 100 / 101_325 };
const NUMBER = '([-+]?(?:[0-9]+\\.?[0-9]*|\\.[0-9]+)(?:[eE][-+]?[0-9]+)?)';

/** Where each setting was first given and how, so that a repeat that changes it is named. */
type SetPlaces = Map<string, { line: number; text: string }>;

function noteRepeat(places: SetPlaces, what: string, position: { line: number; column: number }, text: string, diagnostics: Diagnostic[]): void {
  const first = places.get(what);
  if (!first) {
    places.set(what, { line: position.line, text });
    return;
  }
  if (first.text === text) return;
  const message = `${what} is set again (line ${first.line} set it to ${first.text}); the later value, ${text}, is used`;
  diagnostics.push(finding('directive-repeated', position, message, { found: text }));
  places.set(what, { line: position.line, text });
}

function badValue(diagnostics: Diagnostic[], assignment: Assignment, message: string): void {
  diagnostics.push(finding('bad-directive', assignment.value, message, { found: assignment.value.text }));
}

function readUnits(assignments: Assignment[], settings: MechanismSettings, places: SetPlaces, diagnostics: Diagnostic[]): void {
  for (const assignment of assignments) {
    const value = assignment.value.text.replace(/\s+/g, ' ');
    const key = assignment.key.text;
    const allowed = key === 'conc' ? CONCENTRATION_UNITS : key === 'time' ? TIME_UNITS : null;
    if (!allowed) diagnostics.push(finding('bad-directive', assignment.key, `%units knows conc and time, not ${key}`, { found: key, expected: ['conc', 'time'] }));
    else if (!allowed.includes(value)) badValue(diagnostics, assignment, `${key} must be one of: ${allowed.join(', ')}`);
    else {
      noteRepeat(places, `%units ${key}`, assignment.value, value, diagnostics);
      settings.units[key as 'conc' | 'time'] = value;
    }
  }
}

function readCondition(assignment: Assignment, diagnostics: Diagnostic[]): number | null {
  const key = assignment.key.text;
  // M is in the mechanism's concentration unit, which may be written after it (checked once
  // every %units line is read: see checkThirdBodyUnit).
  const units = key === 'T' ? '(K)?' : key === 'P' ? `(${Object.keys(PRESSURE_TO_ATM).join('|')})?` : '(.*)';
  const match = new RegExp(`^${NUMBER}\\s*${units}$`).exec(assignment.value.text);
  const value = match ? Number(match[1]) : NaN;
  if (!match || !Number.isFinite(value) || value <= 0) {
    badValue(diagnostics, assignment, `${key} must be a positive number${key === 'T' ? ' in K' : key === 'P' ? ' with a pressure unit (atm, bar, Pa, kPa, hPa, Torr, mbar)' : ''}`);
    return null;
  }
  return key === 'P' ? value * PRESSURE_TO_ATM[match[2] ?? 'atm'] : value;
}

/** A value that cannot be read is reported and leaves an earlier valid one in place. */
function readConditions(assignments: Assignment[], settings: MechanismSettings, places: SetPlaces, diagnostics: Diagnostic[]): Assignment | null {
  let thirdBody: Assignment | null = null;
  for (const assignment of assignments) {
    const key = assignment.key.text;
    if (key !== 'T' && key !== 'P' && key !== 'M') {
      diagnostics.push(finding('bad-directive', assignment.key, `%conditions knows T, P and M, not ${key}`, { found: key, expected: ['T', 'P', 'M'] }));
      continue;
    }
    const value = readCondition(assignment, diagnostics);
    if (value === null) continue;
    noteRepeat(places, `%conditions ${key}`, assignment.value, assignment.value.text.replace(/\s+/g, ' ').trim(), diagnostics);
    settings.conditions[key] = value;
    if (key === 'M') thirdBody = assignment;
  }
  return thirdBody;
}

/**
 * A unit written after M must be the mechanism's concentration unit: M = 2.46e19 molecule cm^-3
 * in a mechanism in mol L^-1 would otherwise be read as 2.46e19 mol L^-1 (it is not converted:
 * the author writes M in the mechanism's unit).
 */
function checkThirdBodyUnit(assignment: Assignment, settings: MechanismSettings, diagnostics: Diagnostic[]): void {
  const unit = new RegExp(`^${NUMBER}\\s*(.*)$`).exec(assignment.value.text)?.[2].replace(/\s+/g, ' ').trim() ?? '';
  if (unit === '' || unit === settings.units.conc || settings.conditions.M === null) return;
  badValue(diagnostics, assignment, `M is in the mechanism's concentration unit, ${settings.units.conc}; "${unit}" is not it (write M in ${settings.units.conc}, or change %units)`);
  settings.conditions.M = null;
}

function named(items: ParticleNode[]): NamedParticle[] {
  return items.map((node) => ({ node, line: node.line, column: node.column }));
}

/**
 * Reads the directives in order. A later %title, unit or condition replaces an earlier one (a
 * warning names the change); several %terminal or %intermediates lines add up, so that a long
 * list can be split over lines.
 */
export function readDirectives(directives: readonly DirectiveNode[], diagnostics: Diagnostic[]): MechanismSettings {
  const settings: MechanismSettings = {
    title: null,
    units: { conc: CONCENTRATION_UNITS[0], time: 's' },
    conditions: { T: null, P: null, M: null },
    terminal: null,
    intermediates: null,
    declarations: readDeclarations(directives, diagnostics),
  };
  let thirdBody: Assignment | null = null;
  const places: SetPlaces = new Map();
  for (const directive of directives) {
    if (directive.kind === 'title') {
      if (directive.text.trim() === '') {
        diagnostics.push(finding('bad-directive', directive, '%title needs the title after it', { expected: ['%title TEXT'] }));
        continue;
      }
      noteRepeat(places, '%title', directive, directive.text, diagnostics);
      settings.title = directive.text;
    } else if (directive.kind === 'units') readUnits(directive.assignments, settings, places, diagnostics);
    else if (directive.kind === 'conditions') thirdBody = readConditions(directive.assignments, settings, places, diagnostics) ?? thirdBody;
    else if (directive.kind === 'terminal') settings.terminal = [...(settings.terminal ?? []), ...named(directive.items)];
    else if (directive.kind === 'intermediates') settings.intermediates = [...(settings.intermediates ?? []), ...named(directive.items)];
  }
  if (thirdBody) checkThirdBodyUnit(thirdBody, settings, diagnostics);
  return settings;
}
