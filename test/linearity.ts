/**
 * A shape measure for readers of untrusted text, not a speed target: the same number of characters
 * read as 8 texts of n or as 1 text of 8n takes about the same time when reading is linear, and 8
 * times longer when it is quadratic. Each side is the best of 9 interleaved samples of at least
 * 5 ms, so a busy machine slows both sides alike (test/formulaCalls.test.ts, test/strangerTextLinear.test.ts).
 */

/** Milliseconds to read `text` `times` times; a text that does not read is read just as far before it throws. */
function elapsed(read: (text: string) => unknown, text: string, times: number): number {
  const t0 = performance.now();
  for (let k = 0; k < times; k++) {
    try {
      read(text);
    } catch {
      // refused: the reader went as far as it reads
    }
  }
  return performance.now() - t0;
}

/**
 * Time of one long text over that of 8 short ones, the best of 9 interleaved samples each: about 1
 * for a linear reader, about 8 for a quadratic one (when the long text is 8 times the short one).
 * @param read the reader under test
 * @param short the short text, n characters
 * @param long the long text, 8n characters
 */
export function longOverEightShort(read: (text: string) => unknown, short: string, long: string): number {
  elapsed(read, short, 8); // warm-up: the first calls compile the code
  let repeats = 1;
  while (elapsed(read, long, repeats) < 5 && repeats < 4096) repeats *= 2;
  let shortBest = Number.POSITIVE_INFINITY;
  let longBest = Number.POSITIVE_INFINITY;
  for (let sample = 0; sample < 9; sample++) {
    shortBest = Math.min(shortBest, elapsed(read, short, 8 * repeats));
    longBest = Math.min(longBest, elapsed(read, long, repeats));
  }
  return longBest / shortBest;
}
