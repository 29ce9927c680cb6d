import type { Token } from 'moo';

/**
 * Memoises parse trees by the sequence of token types. The grammar matches tokens by type only
 * and is unambiguous, so two lines with the same type sequence have trees of the same shape that
 * differ only in their tokens. A template is such a tree with each token replaced by its index;
 * reading it with another line's tokens gives exactly the tree nearley would build.
 */
interface TokenRef {
  __tokenRef: true;
  token: number;
}

type Template = TokenRef | null | string | number | boolean | Template[] | { [key: string]: Template };

/** Most line shapes kept (trie nodes); beyond this the shapes are forgotten and parsed again. */
const MAX_SHAPE_NODES = 32_768;

/**
 * A line shape: a node of a trie over token types, reached by walking the types of a line's
 * tokens. Walking allocates nothing for a shape seen before, where joining the types into a key
 * made a list and a string on every line of a large text.
 */
export interface LineShape {
  readonly next: Map<string | undefined, LineShape>;
  template?: Template;
  failure?: KnownFailure;
}

// Every node has both fields from the start (one object shape for all of them).
const newShape = (): LineShape => ({ next: new Map(), template: undefined, failure: undefined });

let root = newShape();
let nodes = 1;

export function shapeOf(tokens: readonly Token[]): LineShape {
  if (nodes + tokens.length > MAX_SHAPE_NODES) {
    root = newShape();
    nodes = 1;
  }
  let node = root;
  for (let index = 0; index < tokens.length; index += 1) {
    const type = tokens[index].type;
    let child = node.next.get(type);
    if (!child) {
      node.next.set(type, (child = newShape()));
      nodes += 1;
    }
    node = child;
  }
  return node;
}

function toTemplate(node: unknown, indexOf: Map<unknown, number>): Template {
  if (node === null || typeof node !== 'object') return node as Template;
  const index = indexOf.get(node);
  if (index !== undefined) return { __tokenRef: true, token: index };
  if (Array.isArray(node)) return node.map((item) => toTemplate(item, indexOf));
  const copy: { [key: string]: Template } = {};
  for (const key of Object.keys(node)) copy[key] = toTemplate((node as Record<string, unknown>)[key], indexOf);
  return copy;
}

/** The template of a line with the same token types, if one was parsed before. */
export function knownTemplate(shape: LineShape): unknown {
  return shape.template;
}

/** Turns the tree nearley built for `tokens` into a template and remembers it when `keep`. */
export function templateOf(shape: LineShape, tokens: readonly Token[], tree: unknown, keep: boolean): unknown {
  const indexOf = new Map<unknown, number>(tokens.map((token, index) => [token, index]));
  const template = toTemplate(tree, indexOf);
  if (keep) shape.template = template;
  return template;
}

/** Where parsing failed for a token-type sequence: the unexpected token's index (null: the line ended) and what was expected. */
export interface KnownFailure {
  tokenIndex: number | null;
  expected: string[];
}

/** The failure of a line with the same token types, if one was parsed before (faulty lines cost no second parse). */
export function knownFailure(shape: LineShape): KnownFailure | undefined {
  return shape.failure;
}

export function rememberFailure(shape: LineShape, failure: KnownFailure): void {
  shape.failure = failure;
}
