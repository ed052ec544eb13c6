/**
 * Renders a calculation-trace formula (a mathjs expression, the same string the analysis
 * evaluates) as readable text, and the same expression with the traced values substituted, so
 * the report never retypes a formula by hand:
 *
 *     formulaText('q * s^2 / (2 * t^2)')             // "q · s²/(2 · t²)"
 *     substitutedText('q * s^2 / (2 * t^2)', { q: { value: 11.25, unit: 'kPa' },
 *       s: { value: 6, unit: 'm' }, t: { value: 0.45, unit: 'm' } })
 *                                                     // "11.25 kPa · (6 m)²/(2 · (0.45 m)²)"
 *
 * Multiplication is "·", integer powers are superscripts, sqrt is "√", Greek symbol names are
 * letters (`sigma_h` → "σh"). Throws a SyntaxError for an expression mathjs cannot parse.
 */
import { create, parseDependencies, type MathNode } from 'mathjs';
import { PRECISION, numberText, superscript } from './number-text';
import { symbolText } from './symbol-text';
import { withUnit } from './unit-text';

// The parser alone (formulas are only parsed and walked here, never evaluated).
const math = create({ parseDependencies }, {});

export type TraceValues = Record<string, { value: number; unit: string }>;

interface RenderContext {
  values: TraceValues | null;
}

type Role = 'top' | 'operand' | 'powBase' | 'divisor' | 'argument';

const OPERATOR_TEXT: Record<string, string> = {
  '+': ' + ', '-': ' − ', '*': ' · ', '/': '/', '.*': ' · ', './': '/', '%': ' mod ',
  '==': ' = ', '!=': ' ≠ ', '<': ' < ', '>': ' > ', '<=': ' ≤ ', '>=': ' ≥ ',
};

const FUNCTION_TEXT: Record<string, string> = { log: 'ln', log10: 'log₁₀', log2: 'log₂' };

interface AnyNode {
  type: string;
  name?: string;
  op?: string;
  fn?: unknown;
  args?: AnyNode[];
  content?: AnyNode;
  value?: unknown;
  implicit?: boolean;
  condition?: AnyNode;
  trueExpr?: AnyNode;
  falseExpr?: AnyNode;
}

function exponentText(node: AnyNode, ctx: RenderContext): string {
  const inner = node.type === 'ParenthesisNode' && node.content ? node.content : node;
  if (inner.type === 'ConstantNode' && typeof inner.value === 'number' && Number.isInteger(inner.value)) {
    return superscript(String(inner.value));
  }
  if (inner.type === 'OperatorNode' && inner.fn === 'unaryMinus' && inner.args?.[0]?.type === 'ConstantNode') {
    const v = inner.args[0].value;
    if (typeof v === 'number' && Number.isInteger(v)) return superscript(`-${v}`);
  }
  const text = render(node, ctx, 'argument');
  const simple = inner.type === 'ConstantNode' || inner.type === 'SymbolNode' || node.type === 'ParenthesisNode';
  return simple ? `^${text}` : `^(${text})`;
}

function render(node: AnyNode, ctx: RenderContext, role: Role): string {
  switch (node.type) {
    case 'ConstantNode': {
      const v = node.value;
      return typeof v === 'number' ? numberText(v, 12) : String(v);
    }
    case 'SymbolNode': {
      const name = node.name ?? '';
      const given = ctx.values?.[name];
      if (!given) return symbolText(name);
      const text = withUnit(numberText(given.value, PRECISION.trace), given.unit);
      const hasUnit = text.includes(' ') || /[°%]$/.test(text);
      const negative = given.value < 0;
      if ((role === 'powBase' && (hasUnit || negative)) || (role === 'divisor' && hasUnit) || (negative && role !== 'top' && role !== 'argument')) {
        return `(${text})`;
      }
      return text;
    }
    case 'ParenthesisNode':
      return `(${render(node.content as AnyNode, ctx, 'argument')})`;
    case 'OperatorNode': {
      const args = node.args ?? [];
      const op = node.op ?? '';
      if (args.length === 1) {
        const sign = node.fn === 'unaryMinus' ? '−' : node.fn === 'unaryPlus' ? '+' : op;
        const inner = render(args[0] as AnyNode, ctx, 'operand');
        return role === 'powBase' ? `(${sign}${inner})` : `${sign}${inner}`;
      }
      if (op === '^' || op === '.^') {
        const base = render(args[0] as AnyNode, ctx, 'powBase');
        return `${base}${exponentText(args[1] as AnyNode, ctx)}`;
      }
      const text = args
        .map((a, i) => render(a, ctx, op === '/' && i > 0 ? 'divisor' : 'operand'))
        .join(OPERATOR_TEXT[op] ?? ` ${op} `);
      return role === 'powBase' ? `(${text})` : text;
    }
    case 'FunctionNode': {
      const fnNode = node.fn as AnyNode | undefined;
      const name = fnNode?.name ?? String(node.fn);
      const args = (node.args ?? []).map((a) => render(a, ctx, 'argument'));
      if (name === 'sqrt' && args.length === 1) {
        const a0 = node.args?.[0];
        const bare = a0 && (a0.type === 'SymbolNode' && !ctx.values?.[a0.name ?? ''] || a0.type === 'ConstantNode');
        return bare ? `√${args[0]}` : a0?.type === 'ParenthesisNode' ? `√${args[0]}` : `√(${args[0]})`;
      }
      if (name === 'abs' && args.length === 1) return `|${args[0]}|`;
      return `${FUNCTION_TEXT[name] ?? symbolText(name)}(${args.join(', ')})`;
    }
    case 'ConditionalNode':
      return `${render(node.condition as AnyNode, ctx, 'argument')} ? ${render(node.trueExpr as AnyNode, ctx, 'argument')} : ${render(node.falseExpr as AnyNode, ctx, 'argument')}`;
    default:
      return (node as unknown as MathNode).toString();
  }
}

/** Parses the expression with mathjs (throws SyntaxError on a bad expression). */
export function parseFormula(expression: string): MathNode {
  return math.parse(expression);
}

export function formulaText(expression: string): string {
  return render(parseFormula(expression) as unknown as AnyNode, { values: null }, 'top');
}

export function substitutedText(expression: string, values: TraceValues): string {
  return render(parseFormula(expression) as unknown as AnyNode, { values }, 'top');
}

/** The symbols an expression uses (excluding function names), in order of first use. */
export function formulaSymbols(expression: string): string[] {
  const names: string[] = [];
  parseFormula(expression).traverse((node, _path, parent) => {
    const n = node as unknown as AnyNode;
    const p = parent as unknown as AnyNode | null;
    if (n.type === 'SymbolNode' && !(p?.type === 'FunctionNode' && p.fn === node)) {
      if (n.name && !names.includes(n.name)) names.push(n.name);
    }
  });
  return names;
}
