import { describe, expect, it } from 'vitest';
import { analyseMechanism } from '@api/chemistry/analyse';
import { caseCorrections } from '@api/chemistry/formula-spelling';

describe('case corrections of a mistyped formula', () => {
  it('cases the letters as element symbols, one-letter symbols first', () => {
    expect(caseCorrections('CL2')).toEqual(['Cl2']);
    expect(caseCorrections('NACl')).toEqual(['NaCl']);
    expect(caseCorrections('co')).toEqual(['CO', 'Co']);
    expect(caseCorrections('ch3o2')).toContain('CH3O2');
    expect(caseCorrections('Xx2')).toEqual([]);
    expect(caseCorrections('Cl2')).toEqual([]);
  });

  it('puts the suggestion in the finding, for typos only', () => {
    const messages = (text: string) => analyseMechanism(text).diagnostics.map((item) => item.message).join('\n');
    expect(messages('CL2 + hν -> 2 Cl•')).toContain('(symbols are case-sensitive; did you mean Cl2?)');
    expect(messages('co + OH• -> CO2 + H•')).toContain('co is neither a formula nor a declared name (did you mean CO or Co?)');
    expect(messages('Sub -> Prod')).not.toContain('did you mean');
  });
});
