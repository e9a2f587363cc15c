/**
 * The Levenshtein distance between two texts: the fewest single-character insertions, deletions and
 * substitutions that turn one into the other (Levenshtein 1966; the two-row dynamic programme of
 * Wagner & Fischer 1974). Its work is |a| × |b| cell updates, so callers bound the lengths they give.
 */

/**
 * Levenshtein distance (insertions, deletions, substitutions), by UTF-16 code unit.
 * @param a a text
 * @param b another text
 * @returns the number of edits, 0 … max(|a|, |b|)
 * @example editDistance("kpc", "Mpc") // 1
 */
export function editDistance(a: string, b: string): number {
  let previous = Array.from({ length: b.length + 1 }, (_, j) => j);
  for (let i = 1; i <= a.length; i++) {
    const row = [i];
    for (let j = 1; j <= b.length; j++) row[j] = Math.min(previous[j] + 1, row[j - 1] + 1, previous[j - 1] + (a[i - 1] === b[j - 1] ? 0 : 1));
    previous = row;
  }
  return previous[b.length];
}
