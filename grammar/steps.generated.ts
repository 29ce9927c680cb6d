// Generated automatically by nearley, version 2.20.1
// http://github.com/Hardmath123/nearley
// Bypasses TS6133. Allow declared but unused functions.
// @ts-ignore
function id(d: any[]): any { return d[0]; }
declare var arrow: any;
declare var label: any;
declare var colon: any;
declare var plus: any;
declare var number: any;
declare var photon: any;
declare var thirdBody: any;
declare var star: any;
declare var electron: any;
declare var word: any;
declare var lparen: any;
declare var rparen: any;
declare var lbracket: any;
declare var rbracket: any;
declare var stateTag: any;
declare var radical: any;
declare var charge: any;
declare var at: any;
declare var rateText: any;
declare var bar: any;
declare var titleDirective: any;
declare var text: any;
declare var assignDirective: any;
declare var listDirective: any;
declare var speciesDirective: any;
declare var equals: any;
declare var comma: any;
declare var value: any;

import moo from 'moo';

const NAME_END = '(?![A-Za-z0-9_])';

// Single-character literals come first: moo matches them by table lookup, before its regex.
// `(` stays in the regex because a state tag such as `(3P)` also starts with it. Blanks are
// literals too, one token per character: a regex match would build a result array for each of
// the half of a line's tokens that are blanks, and the wrapper below drops them all anyway.
const baseLexer = moo.states({
  main: {
    colon: ':',
    rparen: ')',
    lbracket: '[',
    rbracket: ']',
    plus: '+',
    star: '*',
    comma: ',',
    equals: '=',
    radical: ['•', '.'],
    at: { match: '@', next: 'rate' },
    ws: [' ', '\t'],
    label: /[A-Za-z][A-Za-z0-9_.\-]*(?=[ \t]*:)/,
    photon: /hν|hv(?![A-Za-z0-9_])/,
    electron: /e\^-/,
    word: { match: /[A-Za-z][A-Za-z0-9_]*/, type: moo.keywords({ thirdBody: 'M' }) },
    number: /[0-9]+(?:\.[0-9]+)?(?:\/[0-9]+)?/,
    arrow: ['->', '→', '<=>', '⇌'],
    stateTag: /\((?=[0-9a-z\u00C0-\uFFFF])[^()\s]*\)/,
    lparen: '(',
    charge: /\^[0-9]*[+-]/,
    comment: /#.*/,
    titleDirective: { match: new RegExp('%title' + NAME_END), next: 'text' },
    assignDirective: { match: new RegExp('%(?:units|conditions)' + NAME_END), next: 'assign' },
    listDirective: new RegExp('%(?:terminal|intermediates)' + NAME_END),
    speciesDirective: new RegExp('%species' + NAME_END),
    unknownDirective: /%[A-Za-z_]*/,
    invalid: moo.error,
  },
  rate: {
    bar: '|',
    rateText: /[^|#\n]+/,
    comment: /#.*/,
    invalid: moo.error,
  },
  text: {
    text: /[^#\n]+/,
    comment: /#.*/,
    invalid: moo.error,
  },
  assign: {
    equals: '=',
    comma: ',',
    ws: [' ', '\t'],
    value: /[^,=#\n]+/,
    comment: /#.*/,
    invalid: moo.error,
  },
});

/** Blanks and comments, which the grammar never sees (two comparisons: this runs for every token). */
function skipped(token: moo.Token): boolean {
  return token.type === 'ws' || token.type === 'comment';
}

/** The moo lexer without blanks and comments: whitespace is checked inside species by parse.ts. */
export const lexer = {
  reset: (chunk: string, state?: moo.LexerState) => baseLexer.reset(chunk, state),
  next: (): moo.Token | undefined => {
    let token = baseLexer.next();
    while (token && skipped(token)) token = baseLexer.next();
    return token;
  },
  save: () => baseLexer.save(),
  formatError: (token: moo.Token, message?: string) => baseLexer.formatError(token, message),
  has: (type: string) => baseLexer.has(type),
};

const cons = (tail: unknown, head: unknown) => ({ head, tail });
const nil = () => null;

interface NearleyToken {
  value: any;
  [key: string]: any;
};

interface NearleyLexer {
  reset: (chunk: string, info: any) => void;
  next: () => NearleyToken | undefined;
  save: () => any;
  formatError: (token: never) => string;
  has: (tokenType: string) => boolean;
};

interface NearleyRule {
  name: string;
  symbols: NearleySymbol[];
  postprocess?: (d: any[], loc?: number, reject?: {}) => any;
};

type NearleySymbol = string | { literal: any } | { test: (token: any) => boolean };

interface Grammar {
  Lexer: NearleyLexer | undefined;
  ParserRules: NearleyRule[];
  ParserStart: string;
};

const grammar: Grammar = {
  Lexer: lexer,
  ParserRules: [
    {"name": "line", "symbols": ["step"], "postprocess": id},
    {"name": "line", "symbols": ["directive"], "postprocess": id},
    {"name": "step$ebnf$1", "symbols": ["label"], "postprocess": id},
    {"name": "step$ebnf$1", "symbols": [], "postprocess": () => null},
    {"name": "step$ebnf$2", "symbols": ["rate"], "postprocess": id},
    {"name": "step$ebnf$2", "symbols": [], "postprocess": () => null},
    {"name": "step", "symbols": ["step$ebnf$1", "side", (lexer.has("arrow") ? {type: "arrow"} : arrow), "side", "step$ebnf$2"], "postprocess": ([label, reactants, arrow, products, rate]) => ({ kind: 'step', label, reactants, arrow, products, rate })},
    {"name": "label", "symbols": [(lexer.has("label") ? {type: "label"} : label), (lexer.has("colon") ? {type: "colon"} : colon)], "postprocess": ([token]) => token},
    {"name": "side", "symbols": ["term"], "postprocess": ([term]) => cons(null, term)},
    {"name": "side", "symbols": ["side", (lexer.has("plus") ? {type: "plus"} : plus), "term"], "postprocess": ([tail, , term]) => cons(tail, term)},
    {"name": "term$ebnf$1", "symbols": [(lexer.has("number") ? {type: "number"} : number)], "postprocess": id},
    {"name": "term$ebnf$1", "symbols": [], "postprocess": () => null},
    {"name": "term", "symbols": ["term$ebnf$1", "particle"], "postprocess": ([coefficient, particle]) => ({ coefficient, particle })},
    {"name": "particle", "symbols": ["species"], "postprocess": id},
    {"name": "particle", "symbols": [(lexer.has("photon") ? {type: "photon"} : photon)], "postprocess": ([token]) => ({ kind: 'photon', token })},
    {"name": "particle", "symbols": [(lexer.has("thirdBody") ? {type: "thirdBody"} : thirdBody)], "postprocess": ([token]) => ({ kind: 'third-body', token })},
    {"name": "particle", "symbols": [(lexer.has("star") ? {type: "star"} : star)], "postprocess": ([token]) => ({ kind: 'site', token })},
    {"name": "particle", "symbols": [(lexer.has("electron") ? {type: "electron"} : electron)], "postprocess": ([token]) => ({ kind: 'electron', token })},
    {"name": "species", "symbols": ["formula", "stateTags", "marks"], "postprocess": ([formula, states, marks]) => ({ kind: 'species', formula, states, marks })},
    {"name": "formula", "symbols": ["part"], "postprocess": ([part]) => cons(null, part)},
    {"name": "formula", "symbols": ["formula", "part"], "postprocess": ([tail, part]) => cons(tail, part)},
    {"name": "part", "symbols": [(lexer.has("word") ? {type: "word"} : word)], "postprocess": ([token]) => ({ kind: 'word', token })},
    {"name": "part$ebnf$1", "symbols": [(lexer.has("number") ? {type: "number"} : number)], "postprocess": id},
    {"name": "part$ebnf$1", "symbols": [], "postprocess": () => null},
    {"name": "part", "symbols": [(lexer.has("lparen") ? {type: "lparen"} : lparen), "formula", (lexer.has("rparen") ? {type: "rparen"} : rparen), "part$ebnf$1"], "postprocess": ([open, formula, close, count]) => ({ kind: 'group', open, formula, close, count })},
    {"name": "part$ebnf$2", "symbols": [(lexer.has("number") ? {type: "number"} : number)], "postprocess": id},
    {"name": "part$ebnf$2", "symbols": [], "postprocess": () => null},
    {"name": "part", "symbols": [(lexer.has("lbracket") ? {type: "lbracket"} : lbracket), "formula", (lexer.has("rbracket") ? {type: "rbracket"} : rbracket), "part$ebnf$2"], "postprocess": ([open, formula, close, count]) => ({ kind: 'group', open, formula, close, count })},
    {"name": "stateTags", "symbols": [], "postprocess": nil},
    {"name": "stateTags", "symbols": ["stateTags", (lexer.has("stateTag") ? {type: "stateTag"} : stateTag)], "postprocess": ([tail, token]) => cons(tail, token)},
    {"name": "marks", "symbols": [], "postprocess": nil},
    {"name": "marks", "symbols": ["marks", "mark"], "postprocess": ([tail, mark]) => cons(tail, mark)},
    {"name": "mark", "symbols": [(lexer.has("radical") ? {type: "radical"} : radical)], "postprocess": ([token]) => ({ kind: 'radical', token })},
    {"name": "mark", "symbols": [(lexer.has("charge") ? {type: "charge"} : charge)], "postprocess": ([token]) => ({ kind: 'charge', token })},
    {"name": "mark$ebnf$1", "symbols": [(lexer.has("number") ? {type: "number"} : number)], "postprocess": id},
    {"name": "mark$ebnf$1", "symbols": [], "postprocess": () => null},
    {"name": "mark", "symbols": [(lexer.has("star") ? {type: "star"} : star), "mark$ebnf$1"], "postprocess": ([token, count]) => ({ kind: 'adsorbed', token, count })},
    {"name": "rate", "symbols": [(lexer.has("at") ? {type: "at"} : at), (lexer.has("rateText") ? {type: "rateText"} : rateText)], "postprocess": ([at, forward]) => ({ at, forward, reverse: null })},
    {"name": "rate", "symbols": [(lexer.has("at") ? {type: "at"} : at), (lexer.has("rateText") ? {type: "rateText"} : rateText), (lexer.has("bar") ? {type: "bar"} : bar), (lexer.has("rateText") ? {type: "rateText"} : rateText)], "postprocess": ([at, forward, , reverse]) => ({ at, forward, reverse })},
    {"name": "directive", "symbols": [(lexer.has("titleDirective") ? {type: "titleDirective"} : titleDirective), (lexer.has("text") ? {type: "text"} : text)], "postprocess": ([name, text]) => ({ kind: 'title', name, text })},
    {"name": "directive", "symbols": [(lexer.has("assignDirective") ? {type: "assignDirective"} : assignDirective), "assignments"], "postprocess": ([name, assignments]) => ({ kind: 'assign', name, assignments })},
    {"name": "directive", "symbols": [(lexer.has("listDirective") ? {type: "listDirective"} : listDirective), "speciesList"], "postprocess": ([name, list]) => ({ kind: 'list', name, list })},
    {"name": "directive", "symbols": [(lexer.has("speciesDirective") ? {type: "speciesDirective"} : speciesDirective), (lexer.has("word") ? {type: "word"} : word)], "postprocess": ([name, word]) => ({ kind: 'declare', name, word, species: null })},
    {"name": "directive", "symbols": [(lexer.has("speciesDirective") ? {type: "speciesDirective"} : speciesDirective), (lexer.has("word") ? {type: "word"} : word), (lexer.has("equals") ? {type: "equals"} : equals), "species"], "postprocess": ([name, word, , species]) => ({ kind: 'declare', name, word, species })},
    {"name": "assignments", "symbols": ["assignment"], "postprocess": ([item]) => cons(null, item)},
    {"name": "assignments", "symbols": ["assignments", (lexer.has("comma") ? {type: "comma"} : comma), "assignment"], "postprocess": ([tail, , item]) => cons(tail, item)},
    {"name": "assignment", "symbols": [(lexer.has("value") ? {type: "value"} : value), (lexer.has("equals") ? {type: "equals"} : equals), (lexer.has("value") ? {type: "value"} : value)], "postprocess": ([key, , value]) => ({ key, value })},
    {"name": "speciesList", "symbols": ["listItem"], "postprocess": ([item]) => cons(null, item)},
    {"name": "speciesList", "symbols": ["speciesList", (lexer.has("comma") ? {type: "comma"} : comma), "listItem"], "postprocess": ([tail, , item]) => cons(tail, item)},
    {"name": "listItem", "symbols": ["species"], "postprocess": id},
    {"name": "listItem", "symbols": [(lexer.has("star") ? {type: "star"} : star)], "postprocess": ([token]) => ({ kind: 'site', token })}
  ],
  ParserStart: "line",
};

export default grammar;
