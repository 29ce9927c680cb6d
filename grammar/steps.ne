# The step notation (see shared design: step-notation.md), one line at a time.
# parse.ts feeds each non-blank line to a fresh Parser over one compiled Grammar, so that
# one faulty line never hides another and the work per line stays bounded.
# Lists are left-recursive cons cells ({ head, tail }) flattened in parse.ts: copying arrays
# in postprocessors would be quadratic, and Earley also runs them on prefix parses.

@preprocessor typescript

@{%
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
%}

@lexer lexer

line -> step {% id %}
      | directive {% id %}

step -> label:? side %arrow side rate:?
  {% ([label, reactants, arrow, products, rate]) => ({ kind: 'step', label, reactants, arrow, products, rate }) %}

label -> %label %colon {% ([token]) => token %}

side -> term {% ([term]) => cons(null, term) %}
      | side %plus term {% ([tail, , term]) => cons(tail, term) %}

term -> %number:? particle {% ([coefficient, particle]) => ({ coefficient, particle }) %}

particle -> species {% id %}
          | %photon {% ([token]) => ({ kind: 'photon', token }) %}
          | %thirdBody {% ([token]) => ({ kind: 'third-body', token }) %}
          | %star {% ([token]) => ({ kind: 'site', token }) %}
          | %electron {% ([token]) => ({ kind: 'electron', token }) %}

species -> formula stateTags marks
  {% ([formula, states, marks]) => ({ kind: 'species', formula, states, marks }) %}

formula -> part {% ([part]) => cons(null, part) %}
         | formula part {% ([tail, part]) => cons(tail, part) %}

part -> %word {% ([token]) => ({ kind: 'word', token }) %}
      | %lparen formula %rparen %number:? {% ([open, formula, close, count]) => ({ kind: 'group', open, formula, close, count }) %}
      | %lbracket formula %rbracket %number:? {% ([open, formula, close, count]) => ({ kind: 'group', open, formula, close, count }) %}

stateTags -> null {% nil %}
           | stateTags %stateTag {% ([tail, token]) => cons(tail, token) %}

marks -> null {% nil %}
       | marks mark {% ([tail, mark]) => cons(tail, mark) %}

mark -> %radical {% ([token]) => ({ kind: 'radical', token }) %}
      | %charge {% ([token]) => ({ kind: 'charge', token }) %}
      | %star %number:? {% ([token, count]) => ({ kind: 'adsorbed', token, count }) %}

rate -> %at %rateText {% ([at, forward]) => ({ at, forward, reverse: null }) %}
      | %at %rateText %bar %rateText {% ([at, forward, , reverse]) => ({ at, forward, reverse }) %}

directive -> %titleDirective %text {% ([name, text]) => ({ kind: 'title', name, text }) %}
           | %assignDirective assignments {% ([name, assignments]) => ({ kind: 'assign', name, assignments }) %}
           | %listDirective speciesList {% ([name, list]) => ({ kind: 'list', name, list }) %}
           | %speciesDirective %word {% ([name, word]) => ({ kind: 'declare', name, word, species: null }) %}
           | %speciesDirective %word %equals species {% ([name, word, , species]) => ({ kind: 'declare', name, word, species }) %}

assignments -> assignment {% ([item]) => cons(null, item) %}
             | assignments %comma assignment {% ([tail, , item]) => cons(tail, item) %}

assignment -> %value %equals %value {% ([key, , value]) => ({ key, value }) %}

speciesList -> listItem {% ([item]) => cons(null, item) %}
             | speciesList %comma listItem {% ([tail, , item]) => cons(tail, item) %}

listItem -> species {% id %}
          | %star {% ([token]) => ({ kind: 'site', token }) %}
