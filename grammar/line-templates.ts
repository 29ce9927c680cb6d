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

const MAX_TEMPLATES = 4_096;
const templates = new Map<string, Template>();

export function signatureOf(tokens: readonly Token[]): string {
  // Joined in one go: a string grown token by token is a chain of concatenations that the map
  // lookup must first copy into one piece.
  const types: (string | undefined)[] = new Array(tokens.length);
  for (let index = 0; index < tokens.length; index += 1) types[index] = tokens[index].type;
  return types.join(' ');
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
export function knownTemplate(signature: string): unknown {
  return templates.get(signature);
}

/** Turns the tree nearley built for `tokens` into a template and remembers it when `keep`. */
export function templateOf(signature: string, tokens: readonly Token[], tree: unknown, keep: boolean): unknown {
  if (templates.size >= MAX_TEMPLATES) templates.clear();
  const indexOf = new Map<unknown, number>(tokens.map((token, index) => [token, index]));
  const template = toTemplate(tree, indexOf);
  if (keep) templates.set(signature, template);
  return template;
}

/** Where parsing failed for a token-type sequence: the unexpected token's index (null: the line ended) and what was expected. */
export interface KnownFailure {
  tokenIndex: number | null;
  expected: string[];
}

const failures = new Map<string, KnownFailure>();

/** The failure of a line with the same token types, if one was parsed before (faulty lines cost no second parse). */
export function knownFailure(signature: string): KnownFailure | undefined {
  return failures.get(signature);
}

export function rememberFailure(signature: string, failure: KnownFailure): void {
  if (failures.size >= MAX_TEMPLATES) failures.clear();
  failures.set(signature, failure);
}
