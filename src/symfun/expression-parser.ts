/**
 * Parser of the symmetric-function expression language (grammar in EXPRESSION_GRAMMAR).
 * Every node keeps the 1-based column where it starts, so that errors can point at it.
 */
import { InputError } from '../core/errors.js';

export type Node =
  | { readonly kind: 'num'; readonly value: bigint; readonly col: number }
  | { readonly kind: 'var'; readonly name: 'q' | 't'; readonly col: number }
  | { readonly kind: 'neg'; readonly arg: Node; readonly col: number }
  | { readonly kind: 'bin'; readonly op: '+' | '-' | '*' | '/'; readonly left: Node; readonly right: Node; readonly col: number }
  | { readonly kind: 'pow'; readonly base: Node; readonly exp: number; readonly col: number }
  | { readonly kind: 'call'; readonly name: string; readonly args: readonly Arg[]; readonly col: number };

export type Arg =
  | { readonly kind: 'expr'; readonly expr: Node; readonly col: number }
  | { readonly kind: 'assign'; readonly name: string; readonly value: Node; readonly col: number };

export const EXPRESSION_GRAMMAR = `expression  := term (("+" | "-") term)*
term        := factor (("*" | "/") factor)*        "/" only by a non-zero integer
factor      := "-" factor | power
power       := atom ("^" integer)?
atom        := integer | "q" | "t" | "(" expression ")" | name "(" arguments? ")"
arguments   := argument ("," argument)*
argument    := expression | ("q" | "t") "=" expression`;

interface Token {
  readonly type: 'num' | 'id' | 'op' | 'end';
  readonly text: string;
  readonly col: number;
}

function lex(src: string): Token[] {
  const out: Token[] = [];
  let i = 0;
  while (i < src.length) {
    const ch = src[i]!;
    if (/\s/.test(ch)) {
      i++;
      continue;
    }
    const col = i + 1;
    if (/\d/.test(ch)) {
      let j = i;
      while (j < src.length && /\d/.test(src[j]!)) j++;
      out.push({ type: 'num', text: src.slice(i, j), col });
      i = j;
    } else if (/[A-Za-z_]/.test(ch)) {
      let j = i;
      while (j < src.length && /[A-Za-z_0-9]/.test(src[j]!)) j++;
      out.push({ type: 'id', text: src.slice(i, j), col });
      i = j;
    } else if ('+-*/^(),='.includes(ch)) {
      out.push({ type: 'op', text: ch, col });
      i++;
    } else {
      throw new InputError(`column ${col}: unexpected character "${ch}"`, 'expression');
    }
  }
  out.push({ type: 'end', text: '', col: src.length + 1 });
  return out;
}

/** Deepest nesting read (parentheses, calls, signs, chains of operations): far above any formula, far below the stack. */
export const MAX_NESTING = 200;

export function parseExpression(src: string): Node {
  const toks = lex(src);
  let pos = 0;
  let depth = 0;
  const enter = (tok: Token): void => {
    if (++depth > MAX_NESTING) throw new InputError(`column ${tok.col}: the expression nests deeper than ${MAX_NESTING} levels`, 'expression');
  };
  const peek = (): Token => toks[pos]!;
  const fail = (tok: Token, what: string): never => {
    const got = tok.type === 'end' ? 'the end of the expression' : `"${tok.text}"`;
    throw new InputError(`column ${tok.col}: expected ${what}, found ${got}`, 'expression');
  };
  const isOp = (text: string): boolean => peek().type === 'op' && peek().text === text;
  const expect = (text: string): Token => {
    if (!isOp(text)) fail(peek(), `"${text}"`);
    return toks[pos++]!;
  };

  const expression = (): Node => {
    let left = term();
    while (isOp('+') || isOp('-')) {
      const op = toks[pos++]!;
      left = { kind: 'bin', op: op.text as '+' | '-', left, right: term(), col: op.col };
    }
    return left;
  };
  const term = (): Node => {
    let left = factor();
    while (isOp('*') || isOp('/')) {
      const op = toks[pos++]!;
      left = { kind: 'bin', op: op.text as '*' | '/', left, right: factor(), col: op.col };
    }
    return left;
  };
  const factor = (): Node => {
    if (isOp('-')) {
      const op = toks[pos++]!;
      enter(op);
      const arg = factor();
      depth--;
      return { kind: 'neg', arg, col: op.col };
    }
    return power();
  };
  const power = (): Node => {
    const base = atom();
    if (!isOp('^')) return base;
    const op = toks[pos++]!;
    const e = peek();
    if (e.type !== 'num') fail(e, 'a non-negative integer exponent');
    pos++;
    const exp = Number(e.text);
    if (exp > 1000) throw new InputError(`column ${e.col}: exponent must be at most 1000 (got ${e.text})`, 'expression');
    return { kind: 'pow', base, exp, col: op.col };
  };
  const atom = (): Node => {
    const tok = peek();
    if (tok.type === 'num') {
      pos++;
      return { kind: 'num', value: BigInt(tok.text), col: tok.col };
    }
    if (tok.type === 'op' && tok.text === '(') {
      pos++;
      enter(tok);
      const inner = expression();
      expect(')');
      depth--;
      return inner;
    }
    if (tok.type === 'id') {
      pos++;
      if (isOp('(')) {
        pos++;
        enter(tok);
        const args: Arg[] = [];
        if (!isOp(')')) {
          for (;;) {
            args.push(argument());
            if (isOp(',')) {
              pos++;
              continue;
            }
            if (!isOp(')')) fail(peek(), '"," or ")"');
            break;
          }
        }
        expect(')');
        depth--;
        return { kind: 'call', name: tok.text, args, col: tok.col };
      }
      if (tok.text === 'q' || tok.text === 't') return { kind: 'var', name: tok.text, col: tok.col };
      throw new InputError(
        `column ${tok.col}: unknown name "${tok.text}" (the variables are q and t; functions are called with parentheses, as s(2,1))`,
        'expression',
      );
    }
    return fail(tok, 'a number, q, t, a function such as s(2,1), or "("');
  };
  const argument = (): Arg => {
    const tok = peek();
    const next = toks[pos + 1];
    if (tok.type === 'id' && next && next.type === 'op' && next.text === '=') {
      pos += 2;
      return { kind: 'assign', name: tok.text, value: expression(), col: tok.col };
    }
    return { kind: 'expr', expr: expression(), col: tok.col };
  };

  if (peek().type === 'end') throw new InputError('column 1: the expression is empty', 'expression');
  const root = expression();
  if (peek().type !== 'end') fail(peek(), 'an operator (+, -, *, /, ^) or the end of the expression');
  // a long chain a+b+c+… is a deep tree for the evaluator: bound the whole depth, not only the nesting
  if (treeDepth(root) > 4 * MAX_NESTING) throw new InputError(`the expression is ${treeDepth(root)} operations deep; at most ${4 * MAX_NESTING} are evaluated (sum fewer terms at once)`, 'expression');
  return root;
}

function children(n: Node): Node[] {
  switch (n.kind) {
    case 'bin':
      return [n.left, n.right];
    case 'neg':
      return [n.arg];
    case 'pow':
      return [n.base];
    case 'call':
      return n.args.map((a) => (a.kind === 'assign' ? a.value : a.expr));
    default:
      return [];
  }
}

/** Depth of the tree, walked without recursion. */
function treeDepth(root: Node): number {
  let deepest = 0;
  const stack: [Node, number][] = [[root, 1]];
  while (stack.length) {
    const [n, d] = stack.pop()!;
    deepest = Math.max(deepest, d);
    for (const c of children(n)) stack.push([c, d + 1]);
  }
  return deepest;
}
