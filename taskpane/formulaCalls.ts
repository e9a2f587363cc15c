/**
 * A tokenizer for Excel formulas and a finder of the function calls in them (for the cell
 * inspector). Handles strings with doubled quotes, sheet-qualified ('My sheet'!A1) and absolute
 * ($A$1) references, whole rows/columns (A:A, 1:3), structured names, nested calls, array
 * constants ({1,2;3,4}), error literals, and both argument separators (',' and ';').
 */

/** Kinds of token. */
export type TokenKind = "number" | "string" | "bool" | "error" | "ref" | "name" | "func" | "open" | "close" | "sep" | "array" | "op" | "space";

/** One token, with its place in the formula. */
export interface Token {
  kind: TokenKind;
  text: string;
  start: number;
}

/** One function call found in a formula. */
export interface FormulaCall {
  /** Function name as written, upper-cased (e.g. "ZC.DIST_LUM"). */
  name: string;
  /** Source text of each argument ("" for an omitted one). */
  args: string[];
  /** Tokens of each argument, spaces dropped. */
  argTokens: Token[][];
  /** Nesting depth (0 for a call at the top of the formula). */
  depth: number;
  /** The call's own source text, e.g. "ZC.KCORRECTION(B2, -0.5)". */
  text: string;
}

/**
 * Excel's error literals, in any case of ASCII letters only: a letter beyond ASCII that upper-cases to
 * one (ſ → S) does not make one (the `i` flag without `u` never folds across ASCII, ECMA-262 Canonicalize).
 */
const errorPattern = /#(?:NULL!|DIV\/0!|VALUE!|REF!|NAME\?|NUM!|N\/A|GETTING_DATA|SPILL!|CALC!|FIELD!|BUSY!|CONNECT!|BLOCKED!|UNKNOWN!)/iy;
const cellPart = String.raw`\$?[A-Za-z]{1,3}\$?\d+`;
const columnPart = String.raw`\$?[A-Za-z]{1,3}`;
const rowPart = String.raw`\$?\d+`;
// Each pattern is sticky (y): it is tried at one place of the formula, never on a copy of the rest of it,
// and each reads only as far as the token it finds (or one word past it), so tokenizing is linear.
const rangePattern = new RegExp(String.raw`(?:${cellPart}(?::${cellPart})?|${columnPart}:${columnPart}|${rowPart}:${rowPart})(?![A-Za-z0-9_.(])`, "y");
const sheetPattern = /(?:'(?:[^']|'')+'|[A-Za-z_\u00C0-\uFFFF][\w.\u00C0-\uFFFF]*)!/y;
const numberPattern = /(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?%?/y;
const namePattern = /[A-Za-z_\\\u00C0-\uFFFF][\w.\u00C0-\uFFFF]*/y;
const spacePattern = /\s+/y;

/** The text a sticky pattern matches at `at`, or undefined (`test` moves lastIndex to the match's end without building a match array). */
function matchAt(pattern: RegExp, s: string, at: number): string | undefined {
  pattern.lastIndex = at;
  return pattern.test(s) ? s.slice(at, pattern.lastIndex) : undefined;
}

/**
 * Splits a formula into tokens, in time linear in its length (a crafted formula of 8,192 characters
 * takes a few milliseconds at most, the first time; scripts/benchTokenizer.ts).
 * @param formula the formula, with or without its leading "="
 * @returns the tokens in order
 * @throws SyntaxError for an unterminated string, sheet name or array constant
 */
export function tokenize(formula: string): Token[] {
  const offset = formula.startsWith("=") ? 1 : 0;
  const s = formula;
  const tokens: Token[] = [];
  let i = offset;
  const push = (kind: TokenKind, text: string) => {
    tokens.push({ kind, text, start: i });
    i += text.length;
  };
  while (i < s.length) {
    const c = s[i];
    if (c === '"') {
      let j = i + 1;
      for (;;) {
        if (j >= s.length) throw new SyntaxError(`unterminated string at ${i}`);
        if (s[j] === '"') {
          if (s[j + 1] === '"') j += 2;
          else break;
        } else j++;
      }
      push("string", s.slice(i, j + 1));
    } else if (c === "{") {
      let j = i + 1;
      let inString = false;
      while (j < s.length && (inString || s[j] !== "}")) {
        if (s[j] === '"') inString = !inString;
        j++;
      }
      if (j >= s.length) throw new SyntaxError(`unterminated array constant at ${i}`);
      push("array", s.slice(i, j + 1));
    } else if (c === " " || c === "\n" || c === "\r" || c === "\t") {
      push("space", matchAt(spacePattern, s, i)!);
    } else if (c === "(") push("open", c);
    else if (c === ")") push("close", c);
    else if (c === "," || c === ";") push("sep", c);
    else if (c === "#") {
      push("error", matchAt(errorPattern, s, i) ?? c);
    } else if ((c === "<" || c === ">") && s[i + 1] === "=") push("op", c + "=");
    else if (c === "<" && s[i + 1] === ">") push("op", "<>");
    else {
      // only the patterns that can start with this character are tried; a character that starts
      // none of them (an operator such as + or :, or a stray ! $ @ |) is an operator of its own
      const code = s.charCodeAt(i);
      const letter = (code | 32) >= 97 && (code | 32) <= 122;
      const digit = code >= 48 && code <= 57;
      const wordStart = letter || c === "_" || code >= 0xc0;
      const sheet = c === "'" || wordStart ? matchAt(sheetPattern, s, i) : undefined;
      if (c === "'" && !sheet) throw new SyntaxError(`unterminated sheet name at ${i}`);
      const afterSheet = i + (sheet?.length ?? 0);
      const range = sheet || letter || digit || c === "$" ? matchAt(rangePattern, s, afterSheet) : undefined;
      if (range) push("ref", (sheet ?? "") + range);
      else if (sheet) push("ref", sheet + (matchAt(namePattern, s, afterSheet) ?? ""));
      else if (digit || (c === "." && /\d/.test(s[i + 1] ?? ""))) push("number", matchAt(numberPattern, s, i)!);
      else {
        const name = wordStart || c === "\\" ? matchAt(namePattern, s, i) : undefined;
        if (!name) {
          push("op", c);
          continue;
        }
        const next = s[i + name.length];
        if (next === "(") push("func", name);
        else if ((name.length === 4 || name.length === 5) && /^(?:TRUE|FALSE)$/i.test(name)) push("bool", name);
        else if (next === "[") {
          // structured reference Table1[Column]
          const close = s.indexOf("]", i);
          push("ref", s.slice(i, close < 0 ? s.length : close + 1));
        } else push("name", name);
      }
    }
  }
  return tokens;
}

/** A call found in a formula; its arguments' tokens are sliced when first read (a deeply nested formula would otherwise copy them at every level). */
class Call implements FormulaCall {
  args: string[] = [];
  text = "";
  /** Each argument's place in the formula's tokens without spaces: [first, end). */
  readonly spans: [number, number][] = [];
  private sliced?: Token[][];
  constructor(
    readonly name: string,
    readonly depth: number,
    private readonly solid: Token[],
  ) {}
  get argTokens(): Token[][] {
    return (this.sliced ??= this.spans.map(([from, to]) => this.solid.slice(from, to)));
  }
}

/**
 * Every function call in a formula, outermost first, with its arguments split at top-level
 * separators. One pass over the tokens with a stack of the open calls and parenthesised groups.
 * @param formula the formula text, e.g. '=ZC.DIST_LUM(A2, "P18-BAO; H0=73")'
 * @returns the calls found (nested ones too)
 */
export function findCalls(formula: string): FormulaCall[] {
  const tokens = tokenize(formula);
  const solid: Token[] = [];
  const calls: Call[] = [];
  /** Open calls (with where their current argument starts) and open groups "(" inside a call (no call; one shape for both). */
  type Frame = { call: Call | undefined; argFrom: number; solidFrom: number; opened: number };
  const stack: Frame[] = [];
  let callDepth = 0;
  const finishArg = (call: Call, frame: Frame, endToken: number) => {
    const from = tokens[frame.argFrom]?.start ?? formula.length;
    const to = endToken < tokens.length ? tokens[endToken].start : formula.length;
    call.args.push(formula.slice(from, to).trim());
    call.spans.push([frame.solidFrom, solid.length]);
  };
  for (let i = 0; i < tokens.length; i++) {
    const t = tokens[i];
    const top = stack[stack.length - 1];
    if (t.kind === "func" && tokens[i + 1]?.kind === "open") {
      const call = new Call(t.text.toUpperCase(), callDepth, solid);
      calls.push(call);
      solid.push(t, tokens[i + 1]);
      stack.push({ call, argFrom: i + 2, solidFrom: solid.length, opened: i + 1 });
      callDepth++;
      i++;
      continue;
    }
    if (t.kind === "open" && top) stack.push({ call: undefined, argFrom: 0, solidFrom: 0, opened: 0 });
    else if (t.kind === "close" && top) {
      const call = top.call;
      if (call) {
        // a call with no argument at all ("ZC.AGE()") has none; "ZC.AGE( )" has one blank
        if (call.args.length > 0 || solid.length > top.solidFrom || top.opened + 1 !== i) finishArg(call, top, i);
        call.text = formula.slice(tokens[top.opened - 1].start, t.start + 1);
        callDepth--;
      }
      stack.pop();
    } else if (t.kind === "sep" && top?.call) {
      finishArg(top.call, top, i);
      top.argFrom = i + 1;
      top.solidFrom = solid.length + 1;
    }
    if (t.kind !== "space") solid.push(t);
  }
  // calls left open run to the end of the formula
  for (const frame of stack.reverse()) {
    const call = frame.call;
    if (!call) continue;
    finishArg(call, frame, tokens.length);
    call.text = formula.slice(tokens[frame.opened - 1].start);
  }
  return calls;
}

/** Parses an array constant such as {1,2;3,"a"} into rows of numbers, text and booleans. */
export function parseArrayConstant(text: string): (number | string | boolean)[][] {
  const inner = text.slice(1, -1);
  const rows: (number | string | boolean)[][] = [[]];
  let i = 0;
  let item = "";
  const flush = () => {
    const t = item.trim();
    item = "";
    let value: number | string | boolean;
    if (t.startsWith('"')) value = t.slice(1, -1).replaceAll('""', '"');
    else if (/^(TRUE|FALSE)$/i.test(t)) value = t.toUpperCase() === "TRUE";
    else value = Number(t);
    rows[rows.length - 1].push(value);
  };
  while (i < inner.length) {
    const c = inner[i];
    if (c === '"') {
      let j = i + 1;
      while (j < inner.length && !(inner[j] === '"' && inner[j + 1] !== '"')) j += inner[j] === '"' ? 2 : 1;
      item += inner.slice(i, j + 1);
      i = j + 1;
    } else if (c === "," || c === "\\") {
      flush();
      i++;
    } else if (c === ";") {
      flush();
      rows.push([]);
      i++;
    } else {
      item += c;
      i++;
    }
  }
  flush();
  return rows;
}
