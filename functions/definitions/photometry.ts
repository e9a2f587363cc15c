/**
 * Photometry: luminosities and fluxes, magnitudes, K-corrections, surface-brightness dimming.
 * Each entry: the arguments in the order of the ZC.* signature (built from argumentKinds.ts) and what one
 * cell computes in reference units; the declaration with its JSDoc is in ../declarations/photometry.ts.
 */
import {
  abFluxDensityJy,
  abMagnitude,
  absoluteMagnitude,
  apparentMagnitude,
  bolometricAbsoluteMagnitude,
  bolometricLuminosityW,
  fluxDensityFactorJy,
  fluxWm2,
  frequencyHz,
  janskySI,
  kCorrectionPowerLawMag,
  luminosityW,
  restFrameSpectralLuminosityWHz,
  spectralLuminosityWHz,
  spectralIndexAlpha,
  spectralIndexConventions,
  spectralSurfaceBrightnessDimmingMag,
  surfaceLuminosityLsunPc2,
  surfaceMagnitude,
  type SpectralIndexConvention,
  surfaceBrightnessDimmingMag,
} from "../../core/index.js";
import { CellError } from "../cellError.js";
import type { Args, FunctionDef } from "../FunctionDef.js";
import { messages } from "../messages.js";
import { num, amount, mag, model, unit, z, optionalAlpha, isGiven, m, n, inSpectralOrPowerUnit, bandUnit, fluxDensityUnit, spectralOutUnit, textOr } from "./argumentKinds.js";

/** The optional wavelength [Å] of a per-wavelength flux density (MAG_AB, FLUX_AB): NaN when not given. */
const fluxDensityWavelength = num("wavelength", {
  default: Number.NaN, blankMeansDefault: true, min: 0, minExclusive: true, unit: "Angstrom", blank: { words: "needed only with a unit per wavelength" },
});

/** The last flux-density unit and wavelength read, and their factor (a column in one unit at one band). */
let lastFactor = { text: "Jy", wavelength: Number.NaN, factor: 1 };

/**
 * The factor from the cell's flux-density unit into Jy: f_ν units directly, f_λ units at the cell's
 * wavelength (f_ν = f_λ λ²/c). Blank is Jy; "MJy" is refused as for every flux-density unit.
 */
function unitFactorJy(a: Args): number {
  const text = textOr(a, fluxDensityUnit);
  const wavelength = n(a, "wavelength");
  if (text === lastFactor.text && Object.is(wavelength, lastFactor.wavelength)) return lastFactor.factor;
  if (/(^|[^A-Za-z])MJy(?![A-Za-z])/.test(text)) throw new CellError("value", messages.megajansky("unit", text));
  let factor: number;
  try {
    factor = fluxDensityFactorJy(text, wavelength);
  } catch (e) {
    if (e instanceof TypeError && !e.message.startsWith("wavelength")) throw new TypeError(messages.unitArgument("unit", e.message));
    throw e;
  }
  lastFactor = { text, wavelength, factor };
  return factor;
}

/** Photometry functions, in the order of their declarations. */
export const photometry: FunctionDef[] = [
  {
    name: "LUMINOSITY",
    args: [amount("flux"), z, model, unit("flux_unit", "W/m2", "erg/s/cm2", "flux"), unit("lum_unit", "W", "erg/s")],
    compute: (a) => luminosityW(m(a), n(a, "flux"), n(a, "z")),
  },
  {
    name: "FLUX",
    args: [amount("lum"), z, model, unit("lum_unit", "W", "erg/s", "lum"), unit("flux_unit", "W/m2", "erg/s/cm2")],
    compute: (a) => fluxWm2(m(a), n(a, "lum"), n(a, "z")),
  },
  {
    name: "LUMINOSITY_NU",
    args: [amount("flux_density"), z, num("alpha"), model, unit("in_unit", "Jy", "Jy", "flux_density"), unit("out_unit", "W/Hz")],
    compute: (a) => spectralLuminosityWHz(m(a), n(a, "flux_density") * janskySI, n(a, "z"), n(a, "alpha")),
  },
  {
    name: "KCORRECTION",
    args: [z, num("alpha")],
    compute: (a) => kCorrectionPowerLawMag(n(a, "z"), n(a, "alpha")),
  },
  {
    name: "MAG_ABS",
    args: [mag("m"), z, num("kcorr", { default: 0, blankMeansDefault: true }), model],
    compute: (a) => absoluteMagnitude(m(a), n(a, "m"), n(a, "z"), n(a, "kcorr")),
  },
  {
    name: "MAG_APP",
    args: [mag("M"), z, num("kcorr", { default: 0, blankMeansDefault: true }), model],
    compute: (a) => apparentMagnitude(m(a), n(a, "M"), n(a, "z"), n(a, "kcorr")),
  },
  {
    name: "MAG_AB",
    args: [num("flux_density", { min: 0, minExclusive: true }), fluxDensityUnit, fluxDensityWavelength],
    compute: (a) => abMagnitude(n(a, "flux_density") * unitFactorJy(a)),
    kernel: { arg: "flux_density", of: (a, x) => abMagnitude(x * unitFactorJy(a)) },
  },
  {
    name: "FLUX_AB",
    args: [mag("m_ab"), fluxDensityUnit, fluxDensityWavelength],
    compute: (a) => abFluxDensityJy(n(a, "m_ab")) / unitFactorJy(a),
    kernel: { arg: "m_ab", of: (a, x) => abFluxDensityJy(x) / unitFactorJy(a) },
  },
  {
    name: "LUMINOSITY_REST",
    args: [
      amount("flux_density"), z, num("alpha"), num("observed"), num("rest"), model,
      bandUnit, unit("in_unit", "Jy", "Jy", "flux_density"), spectralOutUnit,
    ],
    compute: (a) => {
      const band = textOr(a, bandUnit);
      const restHz = frequencyHz(n(a, "rest"), band, "rest");
      const lnu = restFrameSpectralLuminosityWHz(
        m(a), n(a, "flux_density") * janskySI, n(a, "z"), n(a, "alpha"), frequencyHz(n(a, "observed"), band, "observed"), restHz,
      );
      return inSpectralOrPowerUnit(a, lnu, restHz);
    },
  },
  {
    name: "MAG_BOL",
    args: [num("lum", { min: 0, minExclusive: true }), unit("unit", "W", "erg/s", "lum")],
    compute: (a) => bolometricAbsoluteMagnitude(n(a, "lum")),
  },
  {
    name: "LUM_BOL",
    args: [mag("mag_bol"), unit("unit", "W", "erg/s")],
    compute: (a) => bolometricLuminosityW(n(a, "mag_bol")),
  },
  {
    name: "DIMMING",
    args: [z, optionalAlpha],
    compute: (a) => (isGiven(n(a, "alpha")) ? spectralSurfaceBrightnessDimmingMag(n(a, "z"), n(a, "alpha")) : surfaceBrightnessDimmingMag(n(a, "z"))),
  },
  {
    name: "SPECTRAL_INDEX",
    args: [num("value"), { kind: "text", name: "convention", choices: spectralIndexConventions }],
    compute: (a) => spectralIndexAlpha(n(a, "value"), a.convention as SpectralIndexConvention),
  },
  {
    name: "SURFACE_LUM",
    args: [num("mu"), z, num("sun_abs_mag"), num("kcorr", { default: 0, blankMeansDefault: true })],
    compute: (a) => surfaceLuminosityLsunPc2(n(a, "mu"), n(a, "z"), n(a, "sun_abs_mag"), n(a, "kcorr")),
  },
  {
    name: "SURFACE_MAG",
    args: [num("sigma", { min: 0, minExclusive: true }), z, num("sun_abs_mag"), num("kcorr", { default: 0, blankMeansDefault: true })],
    compute: (a) => surfaceMagnitude(n(a, "sigma"), n(a, "z"), n(a, "sun_abs_mag"), n(a, "kcorr")),
  },
];
