/**
 * Velocities, redshifts and the rest frame: a redshift as a velocity in the optical, radio or
 * relativistic convention and back, two redshifts composed, a peculiar velocity, and observed values
 * moved into the source's frame and back. Each entry: the arguments in the order of the ZC.* signature
 * (built from argumentKinds.ts) and what one cell computes in reference units; the declaration with
 * its JSDoc is in ../declarations/velocities.ts.
 */
import {
  combinedRedshift,
  conversionFactor,
  dopplerConventions,
  observedFrameValue,
  peculiarVelocityKmPerS,
  redshiftOfVelocity,
  restFrameQuantities,
  restFrameValue,
  velocityKmPerS,
  type DopplerConvention,
  type RestFrameQuantity,
} from "../../core/index.js";
import type { Args, ArgSpec, FunctionDef } from "../FunctionDef.js";
import { messages } from "../messages.js";
import { n, num, optionalText, textOr, textWithDefault, unit } from "./argumentKinds.js";

/** A redshift of a source that may be blueshifted: > −1. */
const anyRedshift = (name: string) => num(name, { min: -1, minExclusive: true });
/** The Doppler convention: blank means "optical" (cz). */
const convention = textWithDefault("convention", "optical", { choices: dopplerConventions });
const conventionOf = (a: Args) => textOr(a, convention) as DopplerConvention;

/**
 * Each rest-frame quantity's units of reference (any unit of the same kind as one of them may be given)
 * and examples for messages. A photon energy E = hν moves as its frequency, and so does an equivalent
 * width in energy (X-ray lines in eV): both go with "frequency".
 */
const kindOf: Record<RestFrameQuantity, { units: readonly string[]; examples: string }> = {
  wavelength: { units: ["Angstrom"], examples: "a length (Angstrom, nm, um)" },
  frequency: { units: ["GHz", "keV"], examples: "a frequency (GHz, MHz, Hz) or a photon energy (keV, eV)" },
  duration: { units: ["d"], examples: "a time (d, s, yr)" },
  equivalent_width: { units: ["Angstrom"], examples: "a length (Angstrom, nm)" },
};

/** Why a unit does not convert to `reference` ("" when it does). */
function whyNot(unit: string, reference: string): string {
  try {
    conversionFactor(unit, reference);
    return "";
  } catch (e) {
    return (e as Error).message;
  }
}

/** The last unit checked against a quantity, so a column of one quantity checks its unit once. */
let lastChecked = { unit: "", quantity: "" };

/** Refuses a unit of another kind than the quantity (the value keeps its unit: (1 + z) has none). */
function checkUnit(a: Args): RestFrameQuantity {
  const quantity = a.quantity as RestFrameQuantity;
  const text = a.unit as string;
  if (text && (text !== lastChecked.unit || quantity !== lastChecked.quantity)) {
    const { units, examples } = kindOf[quantity];
    const reasons = units.map((u) => whyNot(text, u));
    if (reasons.every(Boolean)) {
      const article = quantity === "equivalent_width" ? "an" : "a";
      const what = quantity === "equivalent_width" ? "an equivalent width in energy" : "a photon energy";
      const energy = quantity !== "frequency" && !whyNot(text, "keV") ? `; ${what} scales as a frequency: give quantity "frequency"` : "";
      throw new TypeError(messages.unitArgument("unit", `${reasons[0]}; ${article} ${quantity.replace("_", " ")} takes ${examples}${energy}`));
    }
    lastChecked = { unit: text, quantity };
  }
  return quantity;
}

const restFrameArgs: ArgSpec[] = [num("value"), anyRedshift("z"), { kind: "text", name: "quantity", choices: restFrameQuantities }, optionalText("unit", { words: "not checked: the value keeps its own unit" })];

/** Velocity and rest-frame functions, in the order of their declarations. */
export const velocities: FunctionDef[] = [
  {
    name: "VELOCITY",
    args: [anyRedshift("z"), convention, unit("unit", "km/s")],
    compute: (a) => velocityKmPerS(n(a, "z"), conventionOf(a)),
    kernel: { arg: "z", of: (a, x) => velocityKmPerS(x, conventionOf(a)) },
  },
  {
    name: "Z_FROM_VELOCITY",
    args: [num("v"), convention, unit("unit", "km/s", "km/s", "v")],
    compute: (a) => redshiftOfVelocity(n(a, "v"), conventionOf(a)),
    kernel: { arg: "v", of: (a, x) => redshiftOfVelocity(x, conventionOf(a)) },
  },
  {
    name: "Z_COMBINE",
    args: [anyRedshift("z1"), anyRedshift("z2")],
    compute: (a) => combinedRedshift(n(a, "z1"), n(a, "z2")),
  },
  {
    name: "VELOCITY_PECULIAR",
    args: [anyRedshift("z_obs"), anyRedshift("z_cosmo"), unit("unit", "km/s")],
    compute: (a) => peculiarVelocityKmPerS(n(a, "z_obs"), n(a, "z_cosmo")),
  },
  {
    name: "REST_FRAME",
    args: restFrameArgs,
    compute: (a) => restFrameValue(n(a, "value"), n(a, "z"), checkUnit(a)),
  },
  {
    name: "OBSERVED_FRAME",
    args: restFrameArgs,
    compute: (a) => observedFrameValue(n(a, "value"), n(a, "z"), checkUnit(a)),
  },
];
