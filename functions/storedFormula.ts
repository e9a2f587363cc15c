/**
 * The two spellings of a ZC call. A person types `=ZC.DIST_LUM(B3)`; Excel saves a resolved
 * JavaScript custom function in the file as `_xldudf_` + namespace + `_` + name, `_xldudf_ZC_DIST_LUM(B3)`,
 * and shows that spelling (with #NAME?) while the add-in is not loaded; a formula saved with the bare
 * `ZC.` name stays #NAME? until it is entered again (OfficeDev/office-js issues 3558 and 6355).
 * Text inside string literals ("…", with "" for a quote) is never changed.
 */

const typed = /(?<![\w.])ZC\.([A-Za-z_][A-Za-z0-9_]*)(\s*\()/gi;
const stored = /(?<![\w.])_xldudf_ZC_([A-Za-z_][A-Za-z0-9_]*)(\s*\()/gi;

/** Applies `replace` to the parts of a formula outside string literals. */
function outsideStrings(formula: string, replace: (code: string) => string): string {
  return formula
    .split('"')
    .map((part, i) => (i % 2 === 0 ? replace(part) : part))
    .join('"');
}

/**
 * The formula as Excel stores it in a saved workbook.
 * @param formula formula text as typed, e.g. "ZC.DIST_LUM(B3)" or "=ZC.AGE()"
 * @returns e.g. "_xldudf_ZC_DIST_LUM(B3)"
 */
export function storedFormula(formula: string): string {
  return outsideStrings(formula, (code) => code.replace(typed, (_, name: string, paren: string) => `_xldudf_ZC_${name.toUpperCase()}${paren}`));
}

/**
 * The formula as a person types it (the stored spelling turned back).
 * @param formula e.g. "=_xldudf_ZC_DIST_LUM(B3)"
 * @returns e.g. "=ZC.DIST_LUM(B3)"
 */
export function typedFormula(formula: string): string {
  return outsideStrings(formula, (code) => code.replace(stored, (_, name: string, paren: string) => `ZC.${name.toUpperCase()}${paren}`));
}

/** True when a cell's formula (text starting with "=") calls a ZC function, in either spelling. */
export function callsZcFunction(formula: unknown): boolean {
  if (typeof formula !== "string" || !formula.startsWith("=")) return false;
  let found = false;
  outsideStrings(formula, (code) => {
    found ||= new RegExp(typed.source, "i").test(code) || new RegExp(stored.source, "i").test(code);
    return code;
  });
  return found;
}
