/**
 * The two spellings of a ZC call. A person types `=ZC.DIST_LUM(B3)`; Excel saves a resolved
 * JavaScript custom function in the file as `_xldudf_` + namespace + `_` + name, `_xldudf_ZC_DIST_LUM(B3)`,
 * and shows that spelling (with #NAME?) while the add-in is not loaded; a formula saved with the bare
 * `ZC.` name stays #NAME? until it is entered again (OfficeDev/office-js issues 3558 and 6355).
 * Text inside string literals ("…", with "" for a quote) and quoted sheet names ('…', with '' for an
 * apostrophe: a sheet may be called x"y) is never changed.
 */

const typed = /(?<![\w.])ZC\.([A-Za-z_][A-Za-z0-9_]*)(\s*\()/gi;
const stored = /(?<![\w.])_xldudf_ZC_([A-Za-z_][A-Za-z0-9_]*)(\s*\()/gi;

/**
 * Applies `replace` to the code of a formula: everything outside string literals, quoted sheet
 * names and brackets (`[…]` of a structured reference or another workbook, nested, where `'`
 * escapes the next character). One left open runs to the end. Linear in the formula's length.
 */
function outsideQuotes(formula: string, replace: (code: string) => string): string {
  let out = "";
  let start = 0; // where the current stretch of code began
  let i = 0;
  while (i < formula.length) {
    const c = formula[i];
    if (c !== '"' && c !== "'" && c !== "[") {
      i++;
      continue;
    }
    const end = c === "[" ? bracketsEnd(formula, i) : quotedEnd(formula, i, c);
    out += replace(formula.slice(start, i)) + formula.slice(i, end);
    i = start = end;
  }
  return out + replace(formula.slice(start));
}

/** Where the text quoted by `quote` from `i` ends (past its closing quote; a doubled one stands for itself), or the formula's end. */
function quotedEnd(formula: string, i: number, quote: string): number {
  for (let j = i + 1; j < formula.length; j++) {
    if (formula[j] !== quote) continue;
    if (formula[j + 1] !== quote) return j + 1;
    j++;
  }
  return formula.length;
}

/** Where the brackets opened at `i` close (nested; `'` escapes the next character), or the formula's end. */
function bracketsEnd(formula: string, i: number): number {
  let depth = 0;
  for (let j = i; j < formula.length; j++) {
    const c = formula[j];
    if (c === "'") j++;
    else if (c === "[") depth++;
    else if (c === "]" && --depth === 0) return j + 1;
  }
  return formula.length;
}

/**
 * The formula as Excel stores it in a saved workbook.
 * @param formula formula text as typed, e.g. "ZC.DIST_LUM(B3)" or "=ZC.AGE()"
 * @returns e.g. "_xldudf_ZC_DIST_LUM(B3)"
 */
export function storedFormula(formula: string): string {
  return outsideQuotes(formula, (code) => code.replace(typed, (_, name: string, paren: string) => `_xldudf_ZC_${name.toUpperCase()}${paren}`));
}

/**
 * The formula as a person types it (the stored spelling turned back).
 * @param formula e.g. "=_xldudf_ZC_DIST_LUM(B3)"
 * @returns e.g. "=ZC.DIST_LUM(B3)"
 */
export function typedFormula(formula: string): string {
  return outsideQuotes(formula, (code) => code.replace(stored, (_, name: string, paren: string) => `ZC.${name.toUpperCase()}${paren}`));
}

/** True when a cell's formula (text starting with "=") calls a ZC function, in either spelling. */
export function callsZcFunction(formula: unknown): boolean {
  if (typeof formula !== "string" || !formula.startsWith("=")) return false;
  let found = false;
  outsideQuotes(formula, (code) => {
    found ||= new RegExp(typed.source, "i").test(code) || new RegExp(stored.source, "i").test(code);
    return code;
  });
  return found;
}
