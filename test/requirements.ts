/**
 * What a test file does when a tool it needs is missing (Debian python3-astropy, python3-mpmath,
 * python3-extinction, chromium, libxml2-utils). On a developer machine only the parts that need the tool are skipped,
 * with a one-line hint naming the package; under CI the missing tool fails the run.
 */

/** True under CI: `CI` set to any non-empty value other than "0" or "false" (as CI services set it). */
export function inCI(): boolean {
  const value = (process.env.CI ?? "").trim().toLowerCase();
  return value !== "" && value !== "0" && value !== "false";
}

/**
 * Whether the tests that need a tool can run.
 * @param available whether the tool is there
 * @param hint e.g. "Debian python3-mpmath is not installed: apt-get install -y python3-mpmath to run the 30-digit reference"
 * @throws under CI, when the tool is missing
 */
export function toolAvailable(available: boolean, hint: string): boolean {
  if (available) return true;
  if (inCI()) throw new Error(`CI needs ${hint}`);
  console.warn(`skipping: ${hint}`);
  return false;
}

/** A value computed on first use (so a skipped describe block never runs a missing tool). */
export function onFirstUse<T>(compute: () => T): () => T {
  let done = false;
  let value: T;
  return () => {
    if (!done) {
      value = compute();
      done = true;
    }
    return value;
  };
}
