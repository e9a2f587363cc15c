/**
 * The note attached to a cell whose ZC formula the pane replaced with its value, so that a reader
 * without the add-in keeps the number and its provenance: the original formula, the full model
 * spec(s) and the zcell version. The formula is written as a JSON string, so a formula of several
 * lines comes back whole. Notes written by 0.1 and 0.2 are still read: they begin "Frozen by zcell"
 * (the pane's words then), and the oldest hold the formula as it was, which may run over several
 * lines up to the Model line.
 * What a note says is only a claim: Thaw writes its formula back only when `restorableFormula`
 * allows it.
 */

/**
 * @param formula the cell's ZC formula before it was replaced
 * @param models canonical spec text of each model the formula used (explicit or the workbook's)
 * @param version zcell version
 * @param date the day of the replacement (ISO)
 */
export function provenanceNote(formula: string, models: string[], version: string, date: string): string {
  const unique = [...new Set(models)];
  return [
    `Replaced with its value by zcell ${version} on ${date}.`,
    `Formula: ${JSON.stringify(formula)}`,
    `Model: ${unique.length ? unique.join(" | ") : "none (no cosmology needed)"}`,
    "Value computed under that cosmology; recompute with the add-in if the model changes.",
  ].join("\n");
}

/** What a provenance note records, read back from its text. */
export interface Provenance {
  /** The ZC formula before it was replaced, with its "=". */
  formula: string;
  /** The spec text of each model it used (none when it needed no cosmology). */
  models: string[];
}

/**
 * Reads a note written by `provenanceNote` (undefined for any other text, so a person's own notes
 * are never taken for ours).
 * @param text the note's (or comment's) content
 */
export function parseProvenanceNote(text: string): Provenance | undefined {
  if (text.length > maxNoteLength) return undefined;
  const lines = text.split(/\r?\n/);
  if (!/^(?:Replaced with its value|Frozen) by zcell \S+ on /.test(lines[0])) return undefined;
  const start = lines.findIndex((l) => l.startsWith("Formula: "));
  let end = lines.length - 1;
  while (end > start && !lines[end].startsWith("Model: ")) end--;
  if (start < 0 || end <= start) return undefined;
  const written = lines[start].slice("Formula: ".length);
  let formula: unknown;
  if (written.startsWith('"')) {
    try {
      formula = JSON.parse(written);
    } catch {
      return undefined;
    }
  } else {
    formula = lines.slice(start, end).join("\n").slice("Formula: ".length); // an earlier note: the formula as it was
  }
  if (typeof formula !== "string" || !formula.startsWith("=")) return undefined;
  const model = lines[end].slice("Model: ".length);
  return { formula, models: model.startsWith("none (") ? [] : model.split(" | ") };
}

/** Longer than any note zcell writes (a formula of at most 8,192 characters and its models). */
const maxNoteLength = 65_536;
