// User formulas — r(theta) for polar wheels, y(x) for function tracks — parsed with mathjs and then
// compiled to a plain closure by our own walk over an allow-list of node types, so no mathjs
// evaluation, assignment, function definition, import, unit or matrix can ever run. Evaluation is
// a straight-line closure (no loops), so its time is bounded by the node count.

import { parse, type MathNode } from "mathjs";
import { EngineError } from "./errors";

export const MAX_FORMULA_LENGTH = 500;
export const MAX_FORMULA_NODES = 300;
const MAX_DEPTH = 60;

type Fn = (...args: number[]) => number;

const FUNCTIONS: Record<string, { fn: Fn; arity: [number, number] }> = {
  sin: { fn: Math.sin, arity: [1, 1] },
  cos: { fn: Math.cos, arity: [1, 1] },
  tan: { fn: Math.tan, arity: [1, 1] },
  sec: { fn: (x) => 1 / Math.cos(x), arity: [1, 1] },
  csc: { fn: (x) => 1 / Math.sin(x), arity: [1, 1] },
  cot: { fn: (x) => 1 / Math.tan(x), arity: [1, 1] },
  asin: { fn: Math.asin, arity: [1, 1] },
  acos: { fn: Math.acos, arity: [1, 1] },
  atan: { fn: Math.atan, arity: [1, 1] },
  atan2: { fn: Math.atan2, arity: [2, 2] },
  sinh: { fn: Math.sinh, arity: [1, 1] },
  cosh: { fn: Math.cosh, arity: [1, 1] },
  tanh: { fn: Math.tanh, arity: [1, 1] },
  asinh: { fn: Math.asinh, arity: [1, 1] },
  acosh: { fn: Math.acosh, arity: [1, 1] },
  atanh: { fn: Math.atanh, arity: [1, 1] },
  exp: { fn: Math.exp, arity: [1, 1] },
  log: { fn: (x, b) => (b === undefined ? Math.log(x) : Math.log(x) / Math.log(b)), arity: [1, 2] },
  log10: { fn: Math.log10, arity: [1, 1] },
  log2: { fn: Math.log2, arity: [1, 1] },
  sqrt: { fn: Math.sqrt, arity: [1, 1] },
  cbrt: { fn: Math.cbrt, arity: [1, 1] },
  abs: { fn: Math.abs, arity: [1, 1] },
  sign: { fn: Math.sign, arity: [1, 1] },
  min: { fn: Math.min, arity: [2, 8] },
  max: { fn: Math.max, arity: [2, 8] },
  hypot: { fn: Math.hypot, arity: [2, 8] },
  pow: { fn: Math.pow, arity: [2, 2] },
};

const CONSTANTS: Record<string, number> = { pi: Math.PI, e: Math.E };

type Compiled = (v: number) => number;

/**
 * The parser's own complaint as a sentence that says what to change. Its wording is mathjs's; the
 * character position it gives counts from 1.
 */
export function parseProblem(raw: string): string {
  const at = /\(char (\d+)\)/.exec(raw);
  const place = at ? ` at character ${at[1]}` : "";
  if (/Parenthesis \) expected/.test(raw)) return `A bracket is opened but not closed${place}: add the missing ")".`;
  if (/Unexpected end of expression/.test(raw))
    return `The formula stops too soon${place}: something is missing after the last sign or bracket.`;
  if (/Value expected/.test(raw))
    return `A number or a name is missing${place}, between two signs or after an opening bracket.`;
  const part = /Unexpected part "([^"]*)"/.exec(raw);
  if (part) return `"${part[1]}"${place} follows without a sign: write the multiplication out, e.g. "2*x", not "2 x".`;
  const op = /Unexpected operator (\S+)/.exec(raw);
  if (op) return `The sign "${op[1]}"${place} is out of place: check the brackets and signs around it.`;
  return `The formula cannot be read${place}. Write it like 100 + 20*cos(theta).`;
}

function fail(message: string, where: string): never {
  throw new EngineError("bad-formula", message, where);
}

/**
 * Compiles `source` to a function of the one variable `variable` ("theta" or "x").
 * `where` names the spec field for error messages.
 */
export function compileFormula(source: string, variable: string, where: string): Compiled {
  if (typeof source !== "string" || source.trim() === "") fail("The formula is empty.", where);
  if (source.length > MAX_FORMULA_LENGTH)
    fail(`The formula is ${source.length} characters long; at most ${MAX_FORMULA_LENGTH} are allowed.`, where);
  let root: MathNode;
  try {
    root = parse(source);
  } catch (e) {
    fail(`The formula does not parse. ${parseProblem((e as Error).message)}`, where);
  }
  let nodes = 0;
  const build = (node: MathNode, depth: number): Compiled => {
    if (++nodes > MAX_FORMULA_NODES) fail(`The formula has more than ${MAX_FORMULA_NODES} parts.`, where);
    if (depth > MAX_DEPTH) fail("The formula is nested too deeply.", where);
    const n = node as unknown as {
      type: string;
      value?: unknown;
      name?: string;
      op?: string;
      fn?: { type?: string; name?: string } | string;
      args?: MathNode[];
      content?: MathNode;
    };
    switch (n.type) {
      case "ConstantNode": {
        const v = n.value;
        if (typeof v !== "number" || !Number.isFinite(v))
          fail(`Only numbers are allowed, not ${JSON.stringify(v)}.`, where);
        return () => v;
      }
      case "SymbolNode": {
        const name = n.name!;
        if (name === variable) return (x) => x;
        if (name in CONSTANTS) {
          const c = CONSTANTS[name];
          return () => c;
        }
        fail(`Unknown name "${name}": use ${variable}, pi, e and numbers.`, where);
      }
      // falls through (fail never returns)
      case "ParenthesisNode":
        return build(n.content!, depth + 1);
      case "OperatorNode": {
        const args = (n.args ?? []).map((a) => build(a, depth + 1));
        const op = n.op;
        if (args.length === 1) {
          const [a] = args;
          if (op === "-") return (x) => -a(x);
          if (op === "+") return a;
        } else if (args.length === 2) {
          const [a, b] = args;
          if (op === "+") return (x) => a(x) + b(x);
          if (op === "-") return (x) => a(x) - b(x);
          if (op === "*") return (x) => a(x) * b(x);
          if (op === "/") return (x) => a(x) / b(x);
          if (op === "^") return (x) => Math.pow(a(x), b(x));
        }
        fail(`The operator "${op}" is not allowed: use + - * / ^ and parentheses.`, where);
      }
      // falls through
      case "FunctionNode": {
        const fnNode = n.fn;
        const name = typeof fnNode === "object" && fnNode?.type === "SymbolNode" ? fnNode.name! : "";
        const spec = Object.prototype.hasOwnProperty.call(FUNCTIONS, name) ? FUNCTIONS[name] : undefined;
        if (!spec) fail(`The function "${name || "?"}" is not allowed.`, where);
        const args = (n.args ?? []).map((a) => build(a, depth + 1));
        if (args.length < spec.arity[0] || args.length > spec.arity[1])
          fail(
            `${name} takes ${spec.arity[0] === spec.arity[1] ? spec.arity[0] : `${spec.arity[0]} to ${spec.arity[1]}`} argument(s), not ${args.length}.`,
            where,
          );
        const f = spec.fn;
        if (args.length === 1) {
          const [a] = args;
          return (x) => f(a(x));
        }
        if (args.length === 2) {
          const [a, b] = args;
          return (x) => f(a(x), b(x));
        }
        return (x) => f(...args.map((g) => g(x)));
      }
      default:
        fail(
          `"${n.type.replace(/Node$/, "")}" is not allowed in a formula: only arithmetic and elementary functions.`,
          where,
        );
    }
  };
  return build(root, 0);
}
