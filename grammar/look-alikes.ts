/**
 * Characters and marks that look like the notation's own but are not (typed from a word processor,
 * or copied from a paper), with what to write instead.
 */
const LOOK_ALIKES: Record<string, string> = {
  '·': '•',
  '∙': '•',
  '⋅': '•',
  '⟶': '→',
  '⇒': '→',
  '=': '->', // (not on a directive line, where `=` assigns)
  '↔': '⇌',
  '⇄': '⇌',
  '\u00a0': ' ', // a no-break space, as word processors put between a number and its unit
  '\u2009': ' ',
  '\u202f': ' ',
  // Mathematical italic and bold nu, as equation editors write hν.
  '\u{1D708}': 'ν',
  '\u{1D742}': 'ν',
  '\u{1D77C}': 'ν',
  '\u{1D7B6}': 'ν',
};

const SUPERSCRIPT_DIGITS = '⁰¹²³⁴⁵⁶⁷⁸⁹';
const SUBSCRIPT_DIGITS = '₀₁₂₃₄₅₆₇₈₉';
// Unicode minus and dashes, as word processors turn a hyphen into.
const MINUS_LIKE = '−–—';

const SUPERSCRIPT_RUN = /^([⁰¹²³⁴⁵⁶⁷⁸⁹]*)([⁺⁻]?)/u;
const SUBSCRIPT_RUN = /^[₀₁₂₃₄₅₆₇₈₉]+/u;
const CHARGE_WITH_MINUS_LIKE = /^\^([0-9]*)[−–—]/u;
const ARROW_WITH_MINUS_LIKE = /^[−–—]>/u;

function plainDigits(run: string, digits: string): string {
  return [...run].map((char) => String(digits.indexOf(char))).join('');
}

/**
 * What to write instead of the look-alike at the start of `rest` (the text from the place the
 * parser stopped): the run found and its replacement, or null when nothing there is a look-alike.
 * Runs are read whole, so that `Fe³⁺` gets `^3+` rather than one character at a time.
 */
export function lookAlikeAt(rest: string): { found: string; write: string } | null {
  const superscript = SUPERSCRIPT_RUN.exec(rest);
  if (superscript && superscript[0] !== '') {
    const [run, digits, sign] = superscript;
    const plain = plainDigits(digits, SUPERSCRIPT_DIGITS);
    return { found: run, write: sign ? `^${plain}${sign === '⁺' ? '+' : '-'}` : plain };
  }
  const subscript = SUBSCRIPT_RUN.exec(rest);
  if (subscript) return { found: subscript[0], write: plainDigits(subscript[0], SUBSCRIPT_DIGITS) };
  const charge = CHARGE_WITH_MINUS_LIKE.exec(rest);
  if (charge) return { found: charge[0], write: `^${charge[1]}-` };
  const arrow = ARROW_WITH_MINUS_LIKE.exec(rest);
  if (arrow) return { found: arrow[0], write: '->' };
  const char = String.fromCodePoint(rest.codePointAt(0) ?? 0);
  if (MINUS_LIKE.includes(char)) return { found: char, write: '-' };
  const write = LOOK_ALIKES[char];
  return write ? { found: char, write } : null;
}
