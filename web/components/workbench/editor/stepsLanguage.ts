import { HighlightStyle, StreamLanguage, syntaxHighlighting, type StringStream } from '@codemirror/language';
import { Tag, tags } from '@lezer/highlight';

/**
 * Colouring of the step notation (step-notation.md), line by line like the grammar itself:
 * labels, species, arrows, coefficients, rate expressions, directives and comments.
 */
interface LineState {
  /** Past `@`: the rest of the line (before a comment) is a rate expression. */
  inRate: boolean;
  /** A `%directive` line: its value is coloured as one piece. */
  inDirective: boolean;
}

const stepTags = {
  label: Tag.define(tags.labelName),
  species: Tag.define(tags.atom),
  arrow: Tag.define(tags.operator),
  coefficient: Tag.define(tags.number),
  particle: Tag.define(tags.keyword),
  rate: Tag.define(tags.literal),
  directive: Tag.define(tags.meta),
};

function tokenInRate(stream: StringStream): string {
  if (stream.match(/^\d+(?:\.\d*)?(?:[eE][+-]?\d+)?/) || stream.match(/^[A-Za-z_]\w*/)) return 'rate';
  stream.next();
  return 'rate';
}

function tokenInStep(stream: StringStream, state: LineState): string | null {
  if (stream.sol() && stream.match(/^\s*[A-Za-z][\w.-]*\s*:(?!\S*\s*[-=<→⇌])/)) return 'label';
  if (stream.match(/^(?:<=>|->|→|⇌)/)) return 'arrow';
  if (stream.eat('@')) {
    state.inRate = true;
    return 'arrow';
  }
  if (stream.match(/^\+(?=\s|$)/)) return 'arrow';
  if (stream.match(/^\d+(?:\.\d+)?(?:\/\d+)?(?=\s)/)) return 'coefficient';
  if (stream.match(/^(?:hν|hv|M)(?=\s|$)/)) return 'particle';
  if (stream.match(/^[^\s#@]+/)) return 'species';
  stream.next();
  return null;
}

export const stepsLanguage = StreamLanguage.define<LineState>({
  name: 'steps',
  startState: () => ({ inRate: false, inDirective: false }),
  token(stream, state) {
    if (stream.sol()) {
      state.inRate = false;
      state.inDirective = false;
    }
    if (stream.eatSpace()) return null;
    if (stream.peek() === '#') {
      stream.skipToEnd();
      return 'comment';
    }
    if (stream.sol() && stream.match(/^%[A-Za-z_]*/)) {
      state.inDirective = true;
      return 'directive';
    }
    if (state.inDirective) {
      stream.match(/^[^#]+/);
      return 'rate';
    }
    return state.inRate ? tokenInRate(stream) : tokenInStep(stream, state);
  },
  tokenTable: stepTags,
  languageData: { commentTokens: { line: '#' } },
});

/** Our own colours, each at least 5.7:1 on white (WCAG AA). */
export const stepsHighlight = syntaxHighlighting(
  HighlightStyle.define([
    { tag: stepTags.label, color: '#213c68', fontWeight: '600' },
    { tag: stepTags.arrow, color: '#2b4b7e', fontWeight: '600' },
    { tag: stepTags.coefficient, color: '#9b1c4a' },
    { tag: stepTags.particle, color: '#5b3a99', fontStyle: 'italic' },
    { tag: stepTags.species, color: '#1b1f26' },
    { tag: stepTags.rate, color: '#3b5a1a' },
    { tag: stepTags.directive, color: '#5b3a99', fontWeight: '600' },
    { tag: tags.comment, color: '#5f6773', fontStyle: 'italic' },
  ]),
);
