import { elementBySymbol } from './elements';

const MAX_SPELLINGS = 2;

/**
 * The ways a mistyped word reads as element symbols once its letters are cased as symbols are
 * (`CL2` → `Cl2`, `NACl` → `NaCl`, `co` → `CO` or `Co`), at most two, the word itself left out.
 * One-letter symbols are tried first, so that `co` offers carbon monoxide before cobalt.
 */
export function caseCorrections(word: string): string[] {
  if (!/^[A-Za-z][A-Za-z0-9]*$/.test(word)) return [];
  const found: string[] = [];
  const read = (at: number, written: string): void => {
    if (found.length >= MAX_SPELLINGS) return;
    if (at === word.length) {
      if (written !== word && !found.includes(written)) found.push(written);
      return;
    }
    const digits = /^[0-9]+/.exec(word.slice(at))?.[0];
    if (digits) return read(at + digits.length, written + digits);
    const one = word[at].toUpperCase();
    if (elementBySymbol(one)) read(at + 1, written + one);
    const next = word[at + 1];
    if (next && /[A-Za-z]/.test(next)) {
      const two = one + next.toLowerCase();
      if (elementBySymbol(two)) read(at + 2, written + two);
    }
  };
  read(0, '');
  return found;
}

/** `did you mean Cl2?`, or nothing when no casing of the word reads as symbols. */
export function didYouMean(word: string): string {
  const spellings = caseCorrections(word);
  return spellings.length > 0 ? `did you mean ${spellings.join(' or ')}?` : '';
}
