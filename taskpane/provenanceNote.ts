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
