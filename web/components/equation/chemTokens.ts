/**
 * Splits a chemical equation or species key of the step notation into pieces to typeset:
 * counts become subscripts, charges superscripts, ASCII dots and arrows their proper glyphs.
 * Pure, so the typesetting rules are tested without a DOM.
 */
export type ChemPiece =
  | { kind: 'text'; text: string }
  | { kind: 'sub'; text: string }
  | { kind: 'sup'; text: string }
  | { kind: 'state'; text: string }
  | { kind: 'radical'; text: '•' }
  | { kind: 'coefficient'; text: string }
  | { kind: 'plus'; text: '+' }
  | { kind: 'arrow'; text: '→' | '⇌' };

const ARROW = /\s*(<=>|⇌|->|→)\s*/;
const COEFFICIENT = /^(\d+(?:\.\d+)?(?:\/\d+)?)\s+(\S.*)$/;
const CHARGE = /^\^(\d*)([+-])/;
const STATE_START = /^\((?=[0-9a-zν\u0080-\uffff])/;

/** The pieces of one species as written or as its canonical key (`Fe^3+`, `O(1D)`, `NO2•`, `CO*2`). */
export function speciesPieces(key: string): ChemPiece[] {
  if (key === 'e^-') return [{ kind: 'text', text: 'e' }, { kind: 'sup', text: '−' }];
  const pieces: ChemPiece[] = [];
  let index = 0;
  while (index < key.length) {
    index = readPiece(key, index, pieces);
  }
  return pieces;
}

function readPiece(key: string, index: number, pieces: ChemPiece[]): number {
  const rest = key.slice(index);
  const char = key[index];
  if (STATE_START.test(rest)) {
    const close = rest.indexOf(')');
    const text = close === -1 ? rest : rest.slice(0, close + 1);
    pieces.push({ kind: 'state', text });
    return index + text.length;
  }
  const charge = CHARGE.exec(rest);
  if (charge) {
    pieces.push({ kind: 'sup', text: `${charge[1]}${charge[2] === '-' ? '−' : '+'}` });
    return index + charge[0].length;
  }
  if (char === '•' || (char === '.' && index > 0)) {
    pieces.push({ kind: 'radical', text: '•' });
    return index + 1;
  }
  const digits = /^\d+/.exec(rest);
  if (digits && index > 0 && /[A-Za-z)\]*]/.test(key[index - 1])) {
    pieces.push({ kind: 'sub', text: digits[0] });
    return index + digits[0].length;
  }
  appendText(pieces, digits ? digits[0] : char);
  return index + (digits ? digits[0].length : 1);
}

function appendText(pieces: ChemPiece[], text: string): void {
  const last = pieces[pieces.length - 1];
  if (last?.kind === 'text') last.text += text;
  else pieces.push({ kind: 'text', text });
}

/** One side of an equation: terms joined by ` + ` (a charge's `+` is never surrounded by spaces). */
function sidePieces(side: string): ChemPiece[] {
  const pieces: ChemPiece[] = [];
  side.split(/\s+\+\s+/).forEach((term, position) => {
    if (position > 0) pieces.push({ kind: 'plus', text: '+' });
    const match = COEFFICIENT.exec(term.trim());
    if (match) pieces.push({ kind: 'coefficient', text: match[1] });
    pieces.push(...speciesPieces((match ? match[2] : term).trim()));
  });
  return pieces;
}

/** The pieces of a whole equation (`2 BrO• -> 2 Br• + O2`), or of a single species when there is no arrow. */
export function equationPieces(equation: string): ChemPiece[] {
  const match = ARROW.exec(equation);
  if (!match) return sidePieces(equation.trim());
  const left = equation.slice(0, match.index);
  const right = equation.slice(match.index + match[0].length);
  const arrow = match[1] === '<=>' || match[1] === '⇌' ? '⇌' : '→';
  return [...sidePieces(left.trim()), { kind: 'arrow', text: arrow }, ...sidePieces(right.trim())];
}
