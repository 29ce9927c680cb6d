import type { DirectiveNode } from '@grammar/ast';
import type { Diagnostic } from '@grammar/diagnostics';
import { finding } from './diagnostic-codes';
import { countElements, looksLikeFormula } from './species-formula';
import type { RegisteredSpecies } from './species-registry';
import type { DeclaredSpecies } from './species-resolve';

type Declaration = Extract<DirectiveNode, { kind: 'declaration' }>;

function rejection(declaration: Declaration, known: ReadonlyMap<string, DeclaredSpecies>): string | null {
  const name = declaration.name.text;
  const earlier = known.get(name);
  if (earlier) return `${name} is already declared on line ${earlier.line}`;
  if (name === 'hv' || name === 'e') return `${name} is a reserved word`;
  if (looksLikeFormula(name) && countElements([{ kind: 'word', text: name, offset: 0 }]).problems.length === 0) {
    return `${name} is already a formula; a declared name must not read as element symbols`;
  }
  return null;
}

/** The declared composition, or null (an opaque name) when the formula has problems, which are reported. */
function checkedFormula(declaration: Declaration, diagnostics: Diagnostic[]): Declaration['species'] {
  if (!declaration.species) return null;
  const { problems } = countElements(declaration.species.formula);
  for (const problem of problems) {
    diagnostics.push(finding(problem.code, { line: declaration.line, column: (declaration.species?.column ?? 1) + problem.offset }, problem.message, { found: problem.found }));
  }
  return problems.length > 0 ? null : declaration.species;
}

/**
 * Collects the %species declarations. Declarations may appear anywhere in the text: a name is
 * known on every line, which keeps the result independent of the order of directives.
 */
export function readDeclarations(directives: readonly DirectiveNode[], diagnostics: Diagnostic[]): Map<string, DeclaredSpecies> {
  const declarations = new Map<string, DeclaredSpecies>();
  for (const directive of directives) {
    if (directive.kind !== 'declaration') continue;
    const problem = rejection(directive, declarations);
    if (problem) {
      diagnostics.push(finding('bad-declaration', directive.name, problem, { found: directive.name.text }));
      continue;
    }
    declarations.set(directive.name.text, { name: directive.name.text, line: directive.line, species: checkedFormula(directive, diagnostics) });
  }
  return declarations;
}

/**
 * A declared name used on a line above its %species line: read as declared (a declaration holds
 * for the whole text), but said once, at the first use, since the notation declares before use.
 */
export function reportLateDeclarations(species: readonly RegisteredSpecies[], declarations: ReadonlyMap<string, DeclaredSpecies>, diagnostics: Diagnostic[]): void {
  const told = new Set<string>();
  for (const item of species) {
    const declared = item.name === null ? undefined : declarations.get(item.name);
    if (!declared || told.has(declared.name) || item.firstLine >= declared.line) continue;
    told.add(declared.name);
    const message = `${declared.name} is used here before its declaration on line ${declared.line}; it is read as declared, but move the %species line above its first use`;
    diagnostics.push(finding('declared-after-use', { line: item.firstLine, column: item.firstColumn }, message, { found: declared.name }));
  }
}
