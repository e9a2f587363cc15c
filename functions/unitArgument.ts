/**
 * A unit argument of the worksheet functions: the conversion of the unit the user gave into the
 * argument's reference unit (cached by argument and text), or the reason it has none, in the user's
 * units: the argument's default unit named, the kind of each unit in words, and for a flux or
 * luminosity of the other kind (spectral or bolometric) the function that takes it.
 */
import { scaledConversion, unitKind, type AnglePart } from "../core/index.js";
import { CellError } from "./cellError.js";
import type { ArgSpec } from "./FunctionDef.js";
import { messages } from "./messages.js";
import { isBlank, isModelText } from "./modelArgument.js";

/**
 * How a number argument is converted into its reference unit: the factor, the power of h = H0/100 of
 * the cell's model still to apply (h-scaled units such as Mpc/h; 0 otherwise), the unit the user gave,
 * and for a position the part (RA or Dec) that a scalar text decides.
 */
export type Conversion = { factor: number; hPower: number; unit: string; part?: AnglePart };

/** Unit conversions already worked out, by argument and unit text (a sheet uses a handful of units). */
const conversionCache = new Map<Extract<ArgSpec, { kind: "unit" }>, Map<string, Conversion>>();

/** The reference unit of the other kind of a flux or luminosity argument: spectral for bolometric, and the reverse. */
const otherKindUnit: Readonly<Record<string, string>> = { "W/m2": "Jy", W: "W/Hz", Jy: "W/m2", "W/m2/Hz": "W/m2", "W/Hz": "W" };

/**
 * Why a unit argument's text does not convert, in the user's units: the text does not parse, or it is
 * of another kind than the argument's default (named in words); for a flux or luminosity of the other
 * kind, bolometric or spectral, which function takes it.
 */
function unitProblem(fn: string, spec: Extract<ArgSpec, { kind: "unit" }>, text: string, e: unknown): string {
  let detail = (e as Error).message;
  try {
    if (spec.applies === "result") scaledConversion(spec.default, text);
    else scaledConversion(text, spec.default);
  } catch (shown) {
    detail = (shown as Error).message;
  }
  if ((spec.unit === "rad" || spec.unit === "deg") && spec.applies !== "result" && /^(h|hr|hrs|hour|hours)$/i.test(text.trim())) {
    // hours of time given for an angle: a right ascension in hours is the hour angle (15°)
    detail = messages.hoursForAngle(text.trim());
  }
  const use = messages.otherKindFunctions(fn);
  const other = otherKindUnit[spec.unit];
  if (use && other && spec.applies !== "result") {
    try {
      scaledConversion(text, other);
      detail = messages.otherKind(detail, unitKind(text), use);
    } catch {
      // not the other kind either
    }
  }
  return messages.unitArgument(spec.name, detail);
}

/**
 * A unit argument read: its conversion into the argument's reference unit (cached).
 * @param fn the function's name (for the function that takes the other kind of a flux)
 * @param spec the unit argument
 * @param given its single cell's value (blank or omitted: the default unit)
 * @throws CellError (#VALUE!) naming the argument: not text, not a unit, a unit of another kind, a model typed there, MJy
 */
export function unitConversion(fn: string, spec: Extract<ArgSpec, { kind: "unit" }>, given: unknown): Conversion {
  const text = isBlank(given) ? spec.default : given;
  if (typeof text !== "string") throw new CellError("value", messages.notText(spec.name, text));
  let known = conversionCache.get(spec);
  const cached = known?.get(text);
  if (cached) return cached;
  let conversion: Conversion;
  try {
    const { factor, hPower } = spec.applies === "result" ? scaledConversion(spec.unit, text) : scaledConversion(text, spec.unit);
    conversion = { factor, hPower, unit: text.trim() };
  } catch (e) {
    throw new CellError("value", isModelText(text) ? messages.modelInUnitSlot(spec.name, text) : unitProblem(fn, spec, text, e));
  }
  if ((spec.unit === "Jy" || spec.unit === "W/m2/Hz") && /(^|[^A-Za-z])MJy(?![A-Za-z])/.test(text)) {
    // a source's flux density in megajansky is almost surely mJy typed in the wrong case (10⁹ apart)
    throw new CellError("value", messages.megajansky(spec.name, text));
  }
  if (!known) conversionCache.set(spec, (known = new Map()));
  if (known.size < 64) known.set(text, conversion);
  return conversion;
}
