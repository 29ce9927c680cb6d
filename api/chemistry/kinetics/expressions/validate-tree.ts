import type { MathNode } from 'mathjs';
/** Variables a rate expression may use: temperature (K), pressure (atm), third-body concentration. */
export const RATE_VARIABLES = ['T', 'P', 'M'] as const;

/** Functions a rate expression may call, with the number of arguments each takes. */
const FUNCTION_ARITY: Record<string, number> = { exp: 1, log: 1, log10: 1, sqrt: 1, falloff: 3 };

const OPERATORS = new Set(['add', 'subtract', 'multiply', 'divide', 'pow', 'unaryMinus', 'unaryPlus']);

/** Why a node is refused, and the token to point at in the source text. */
export interface TreeViolation {
  message: string;
  token: string | RegExp;
}

/** Node types with nothing to check beyond their children. */
const PASS_THROUGH = new Set(['ParenthesisNode']);

const REFUSED_KINDS: Record<string, TreeViolation> = {
  AssignmentNode: { message: 'assignment is not allowed in a rate expression', token: '=' },
  FunctionAssignmentNode: { message: 'defining a function is not allowed in a rate expression', token: '=' },
  AccessorNode: { message: 'property or index access is not allowed in a rate expression', token: /\[|\.(?=[A-Za-z_])/ },
  IndexNode: { message: 'index access is not allowed in a rate expression', token: '[' },
  ArrayNode: { message: 'matrices and lists are not allowed in a rate expression', token: '[' },
  ObjectNode: { message: 'objects are not allowed in a rate expression', token: '{' },
  ConditionalNode: { message: 'conditional expressions are not allowed in a rate expression', token: '?' },
  RangeNode: { message: 'ranges are not allowed in a rate expression', token: ':' },
  BlockNode: { message: 'a rate expression is a single expression (no ";" or line breaks)', token: ';' },
  RelationalNode: { message: 'comparisons are not allowed in a rate expression', token: '<' },
};

function checkConstant(node: MathNode & { value?: unknown }): TreeViolation | null {
  if (typeof node.value === 'number') return null;
  if (typeof node.value === 'string') return { message: 'strings are not allowed in a rate expression', token: '"' };
  return { message: `the constant ${String(node.value)} is not a number`, token: String(node.value) };
}

function checkSymbol(name: string): TreeViolation | null {
  if ((RATE_VARIABLES as readonly string[]).includes(name)) return null;
  return { message: `unknown symbol "${name}": only T, P and M may be used`, token: name };
}

function checkFunction(node: MathNode & { fn?: MathNode & { name?: string }; args?: MathNode[] }): TreeViolation | null {
  const name = node.fn?.type === 'SymbolNode' ? node.fn.name : undefined;
  if (name === undefined) return { message: 'only named functions may be called', token: '(' };
  const arity = FUNCTION_ARITY[name];
  if (arity === undefined) {
    const allowed = Object.keys(FUNCTION_ARITY).join(', ');
    return { message: `function "${name}" is not allowed: use ${allowed}`, token: name };
  }
  const given = node.args?.length ?? 0;
  if (given !== arity) return { message: `${name} takes ${arity} argument(s), not ${given}`, token: name };
  return null;
}

function checkOperator(node: MathNode & { fn?: string; op?: string }): TreeViolation | null {
  if (OPERATORS.has(node.fn ?? '')) return null;
  return { message: `the operator "${node.op}" is not allowed in a rate expression`, token: node.op ?? '' };
}

/** The first refused node of a tree in source order (depth first), or null when all are allowed. */
export function findViolation(node: MathNode): TreeViolation | null {
  const own = checkNode(node);
  if (own) return own;
  for (const child of childrenOf(node)) {
    const found = findViolation(child);
    if (found) return found;
  }
  return null;
}

function checkNode(node: MathNode): TreeViolation | null {
  if (PASS_THROUGH.has(node.type)) return null;
  const refused = REFUSED_KINDS[node.type];
  if (refused) return refused;
  switch (node.type) {
    case 'ConstantNode':
      return checkConstant(node);
    case 'SymbolNode':
      return checkSymbol((node as MathNode & { name: string }).name);
    case 'FunctionNode':
      return checkFunction(node);
    case 'OperatorNode':
      return checkOperator(node);
    default:
      return { message: `"${node.type}" is not allowed in a rate expression`, token: '' };
  }
}

function childrenOf(node: MathNode): MathNode[] {
  const children: MathNode[] = [];
  node.forEach((child) => children.push(child));
  return node.type === 'FunctionNode' ? children.filter((child) => child !== (node as { fn?: MathNode }).fn) : children;
}
