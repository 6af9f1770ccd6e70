import {
  create,
  isConstantNode,
  isFunctionNode,
  isOperatorNode,
  isParenthesisNode,
  isSymbolNode,
  parseDependencies,
  type FunctionNode,
  type MathNode,
  type SymbolNode,
} from 'mathjs';
import { EngineInputError } from './errors.js';
import type { Scalar } from './scalar.js';

/*
 * Formula models: W(I1, I2) as a quality engineer types it, parsed once by mathjs and turned
 * into a closure tree over the engine's scalar interface, so stresses and tangents come from
 * the complex step like every built-in model. Nothing is differentiated symbolically.
 */

// mathjs types its dependency maps as possibly undefined; this one always exists.
const { parse } = create({ parseDependencies: parseDependencies! });

interface Scope<T> {
  readonly i1: T;
  readonly i2: T;
  readonly constants: Readonly<Record<string, T | number>>;
}

type Evaluate = <T extends Scalar<T>>(scope: Scope<T>) => T;

interface Translation {
  readonly evaluate: Evaluate;
  /** Every name the energy refers to other than I1 and I2. */
  readonly symbols: ReadonlySet<string>;
}

const NAMED_NUMBERS: Readonly<Record<string, number>> = { pi: Math.PI, e: Math.E };

/** Functions of the scalar interface; `log` and `ln` are both the natural logarithm. */
const FUNCTIONS: Readonly<Record<string, <T extends Scalar<T>>(x: T) => T>> = {
  exp: (x) => x.exp(),
  log: (x) => x.log(),
  ln: (x) => x.log(),
  sqrt: (x) => x.sqrt(),
  sin: (x) => x.sin(),
  cos: (x) => x.cos(),
  sinh: (x) => x.sinh(),
  cosh: (x) => x.cosh(),
  tanh: (x) => x.tanh(),
  coth: (x) => x.coth(),
  abs: (x) => x.abs(),
};

const BINARY: Readonly<Record<string, <T extends Scalar<T>>(a: T, b: T) => T>> = {
  add: (a, b) => a.add(b),
  subtract: (a, b) => a.sub(b),
  multiply: (a, b) => a.mul(b),
  divide: (a, b) => a.div(b),
  pow: (a, b) => a.pow(b),
};

function unsupported(what: string): EngineInputError {
  return new EngineInputError('energy', `${what} is not allowed in an energy function`);
}

function symbol(name: string, symbols: Set<string>): Evaluate {
  if (name === 'I1') return (s) => s.i1;
  if (name === 'I2') return (s) => s.i2;
  symbols.add(name);
  const named = NAMED_NUMBERS[name];
  return (s) => {
    const value = s.constants[name] ?? named;
    if (value === undefined) throw new EngineInputError('constants', `no value for ${name}`);
    return typeof value === 'number' ? s.i1.constant(value) : value;
  };
}

/** A name that is not a function, followed by one parenthesised factor. */
function isImplicitProduct(node: MathNode): node is FunctionNode<SymbolNode, [MathNode]> {
  return (
    isFunctionNode(node) &&
    isSymbolNode(node.fn) &&
    !(node.fn.name in FUNCTIONS) &&
    node.args.length === 1
  );
}

function translate(node: MathNode, symbols: Set<string>): Evaluate {
  if (isParenthesisNode(node)) return translate(node.content, symbols);
  if (isConstantNode(node)) {
    const value = node.value;
    if (typeof value !== 'number') throw unsupported(`the value ${String(value)}`);
    return (s) => s.i1.constant(value);
  }
  if (isSymbolNode(node)) return symbol(node.name, symbols);
  if (isOperatorNode(node)) {
    const [base, exponent] = node.args;
    if (node.fn === 'pow' && base && exponent && isImplicitProduct(base)) {
      // `C2 (I1 - 3)^2` parses as (C2(I1 - 3))^2; ordinary notation means C2·(I1 − 3)².
      const factor = symbol(base.fn.name, symbols);
      const [x, e] = [translate(base.args[0]!, symbols), translate(exponent, symbols)];
      return (s) => factor(s).mul(x(s).pow(e(s)));
    }
    const args = node.args.map((arg) => translate(arg, symbols));
    const [a, b] = args;
    if (node.fn === 'unaryMinus' && a) return (s) => a(s).neg();
    if (node.fn === 'unaryPlus' && a) return a;
    const op = BINARY[node.fn];
    if (op && a && b && args.length === 2) return (s) => op(a(s), b(s));
    throw unsupported(`the operator ${node.op}`);
  }
  if (isImplicitProduct(node)) {
    // mathjs reads `C01 (I2 - 3)` as a call; in an energy it is a product.
    const [factor, x] = [symbol(node.fn.name, symbols), translate(node.args[0]!, symbols)];
    return (s) => factor(s).mul(x(s));
  }
  if (isFunctionNode(node) && isSymbolNode(node.fn)) {
    const f = FUNCTIONS[node.fn.name];
    const [arg] = node.args;
    if (!f || !arg || node.args.length !== 1) {
      throw unsupported(`${node.fn.name} with ${node.args.length} arguments`);
    }
    const x = translate(arg, symbols);
    return (s) => f(x(s));
  }
  throw unsupported(`a ${node.type.replace(/Node$/, '').toLowerCase()} expression`);
}

/** 0-based index of the offending character in a mathjs syntax error, else null. */
function errorPosition(error: unknown): number | null {
  const char = (error as { char?: unknown }).char;
  return typeof char === 'number' ? char - 1 : null;
}

type Parsed =
  { readonly tree: MathNode } | { readonly message: string; readonly position: number | null };

function parseEnergy(energy: string): Parsed {
  try {
    return { tree: parse(energy) };
  } catch (error) {
    return { message: (error as Error).message, position: errorPosition(error) };
  }
}

function translateEnergy(energy: string): Translation {
  const parsed = parseEnergy(energy);
  if (!('tree' in parsed)) throw new EngineInputError('energy', parsed.message);
  const symbols = new Set<string>();
  return { evaluate: translate(parsed.tree, symbols), symbols };
}

const translations = new Map<string, Translation>();
const TRANSLATION_CACHE_SIZE = 64;

function translated(energy: string): Translation {
  let translation = translations.get(energy);
  if (!translation) {
    translation = translateEnergy(energy);
    if (translations.size >= TRANSLATION_CACHE_SIZE) translations.clear();
    translations.set(energy, translation);
  }
  return translation;
}

/** Throws EngineInputError unless the energy parses and every name in it has a value. */
export function requireFormula(energy: string, constants: Readonly<Record<string, unknown>>): void {
  const unknown = [...translated(energy).symbols].filter(
    (name) => !(name in constants) && !(name in NAMED_NUMBERS),
  );
  if (unknown.length > 0)
    throw new EngineInputError('energy', `unknown names: ${unknown.join(', ')}`);
}

/** W(I1, I2) of a formula model, evaluated in T. */
export function formulaEnergy<T extends Scalar<T>>(
  energy: string,
  constants: Readonly<Record<string, T | number>>,
  i1: T,
  i2: T,
): T {
  return translated(energy).evaluate({ i1, i2, constants });
}

export interface FormulaCheck {
  /** True when the energy parses, uses only supported operations and every name is known. */
  readonly ok: boolean;
  /** What is wrong, with the 0-based character position for syntax errors (else null). */
  readonly error: { readonly message: string; readonly position: number | null } | null;
  /** Names that are neither I1, I2, pi, e nor one of the constants. */
  readonly unknownSymbols: readonly string[];
  /** Constants the energy never uses (a fit cannot determine them). */
  readonly unusedConstants: readonly string[];
}

/** Checks an energy as typed, for the desk's formula editor. */
export function checkFormula(energy: string, constantNames: readonly string[]): FormulaCheck {
  const failed = (message: string, position: number | null): FormulaCheck => ({
    ok: false,
    error: { message, position },
    unknownSymbols: [],
    unusedConstants: [],
  });
  const parsed = parseEnergy(energy);
  if (!('tree' in parsed)) return failed(parsed.message, parsed.position);
  const symbols = new Set<string>();
  try {
    translate(parsed.tree, symbols);
  } catch (error) {
    if (error instanceof EngineInputError) return failed(error.reason, null);
    throw error;
  }
  const known = new Set(constantNames);
  const unknownSymbols = [...symbols].filter(
    (name) => !known.has(name) && !(name in NAMED_NUMBERS),
  );
  return {
    ok: unknownSymbols.length === 0,
    error: null,
    unknownSymbols,
    unusedConstants: constantNames.filter((name) => !symbols.has(name)),
  };
}
