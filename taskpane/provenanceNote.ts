/**
 * The note attached to a frozen cell, so that a reader without the add-in keeps the number and its
 * provenance: the original formula, the full model spec(s) and the zcell version.
 */

/**
 * @param formula the cell's ZC formula before freezing
 * @param models canonical spec text of each model the formula used (explicit or the workbook's)
 * @param version zcell version
 * @param date the day of freezing (ISO)
 */
export function provenanceNote(formula: string, models: string[], version: string, date: string): string {
  const unique = [...new Set(models)];
  return [
    `Frozen by zcell ${version} on ${date}.`,
    `Formula: ${formula}`,
    `Model: ${unique.length ? unique.join(" | ") : "none (no cosmology needed)"}`,
    "Value computed under that cosmology; recompute with the add-in if the model changes.",
  ].join("\n");
}

/** What a provenance note records, read back from its text. */
export interface Provenance {
  /** The ZC formula before freezing, with its "=". */
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
  const lines = text.split(/\r?\n/);
  if (!/^Frozen by zcell \S+ on /.test(lines[0] ?? "")) return undefined;
  const formula = lines.find((l) => l.startsWith("Formula: ="))?.slice("Formula: ".length);
  const model = lines.find((l) => l.startsWith("Model: "))?.slice("Model: ".length);
  if (!formula || model === undefined) return undefined;
  return { formula, models: model.startsWith("none (") ? [] : model.split(" | ") };
}
