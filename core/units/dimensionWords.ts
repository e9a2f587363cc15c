/**
 * What a unit measures, in the words of the trade ("a flux density", "a length per angle"), for the
 * messages that refuse a conversion between units of different kinds.
 */

/** Exponents of the base dimensions, in the order m, kg, s, K, rad. */
export type Dimensions = readonly [number, number, number, number, number];

/** Dimensions from the exponents of m, kg, s, K and rad. */
export const dimensionsOf = (m: number, kg: number, s: number, K = 0, rad = 0): Dimensions => [m, kg, s, K, rad];

const d = dimensionsOf;

/** The kinds astronomers name, with their article (common practice). */
const kinds: readonly [Dimensions, string][] = [
  [d(1, 0, 0), "a length"],
  [d(2, 0, 0), "an area"],
  [d(3, 0, 0), "a volume"],
  [d(-3, 0, 0), "a number density"],
  [d(0, 0, 1), "a time"],
  [d(0, 1, 0), "a mass"],
  [d(0, 0, 0, 1), "a temperature"],
  [d(0, 0, 0, 0, 1), "an angle"],
  [d(0, 0, 0, 0, 2), "a solid angle"],
  [d(2, 1, -3), "a luminosity or power"],
  [d(0, 1, -3), "a flux"],
  [d(0, 1, -2), "a flux density"],
  [d(-1, 1, -3), "a flux density per wavelength (f_λ)"],
  [d(0, 0, -1), "a frequency"],
  [d(1, 0, -1), "a speed"],
  [d(1, 0, -2), "an acceleration"],
  [d(-3, 1, 0), "a density"],
  [d(-2, 1, 0), "a surface density"],
  [d(0, 0, 0), "a pure number"],
];

/** J and W/Hz share their dimensions: a unit that names a frequency (Hz) is the spectral luminosity. */
const energy = d(2, 1, -2);

/** True when two units have the same dimensions (powers compared to 1e-12: fractional powers). */
export function sameDimensions(a: Dimensions, b: Dimensions): boolean {
  return a.every((x, i) => Math.abs(x - b[i]) < 1e-12);
}

function named(dims: Dimensions, text: string): string | undefined {
  if (sameDimensions(dims, energy)) return /Hz/.test(text) ? "a spectral luminosity" : "an energy";
  return kinds.find(([x]) => sameDimensions(x, dims))?.[1];
}

const superscripts: Record<string, string> = { 2: "²", 3: "³", 4: "⁴", 5: "⁵", 6: "⁶" };
const baseWords = ["length", "mass", "time", "temperature", "angle"];

/** A power of a base dimension in words: length, length², length^0.5. */
function power(word: string, exponent: number): string {
  if (exponent === 1) return word;
  return `${word}${superscripts[exponent] ?? `^${exponent}`}`;
}

/**
 * What a unit measures, in words: a named kind ("a flux density"), a named kind per angle or per solid
 * angle ("a spectral luminosity per solid angle"), or else the base dimensions spelled out
 * ("a quantity of dimension mass·length²/time²").
 * @param dims the unit's exponents of m, kg, s, K and rad
 * @param text the unit as typed (to tell a spectral luminosity, W/Hz, from an energy, J)
 * @returns the words, with an article
 * @example dimensionWords([2, 1, -2, 0, -2], "W/Hz/sr") // "a spectral luminosity per solid angle"
 */
export function dimensionWords(dims: Dimensions, text: string): string {
  const whole = named(dims, text);
  if (whole) return whole;
  const perAngle = dims[4] === -1 ? "per angle" : dims[4] === -2 ? "per solid angle" : undefined;
  const rest = perAngle && named(d(dims[0], dims[1], dims[2], dims[3]), text);
  if (rest && !sameDimensions(d(dims[0], dims[1], dims[2], dims[3]), d(0, 0, 0))) return `${rest} ${perAngle}`;
  const up: string[] = [];
  const down: string[] = [];
  dims.forEach((e, i) => {
    if (e > 0) up.push(power(baseWords[i], e));
    if (e < 0) down.push(power(baseWords[i], -e));
  });
  const below = down.length === 0 ? "" : down.length === 1 ? `/${down[0]}` : `/(${down.join("·")})`;
  return `a quantity of dimension ${up.length > 0 ? up.join("·") : "1"}${below}`;
}
