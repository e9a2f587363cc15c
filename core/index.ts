/**
 * zcell core: the public surface of the cosmology engine (plain numbers; RangeError/TypeError).
 * Every export is listed here by name.
 */
export {
  abZeroPointJy,
  auM,
  bolometricZeroPointW,
  gravitationalConstantSI,
  janskySI,
  julianYearS,
  megaparsecM,
  parsecM,
  radPerArcsec,
  secondsPerGyr,
  solarLuminosityW,
  solarMassKg,
  speedOfLightKmPerS,
  speedOfLightMPerS,
} from "./constants.js";
export { Cosmology, type InvertibleQuantity } from "./Cosmology.js";
export { ExpansionRate, type DensityComponent } from "./ExpansionRate.js";
export { fermiDiracDensityFactor } from "./fermiDirac.js";
export { type ModelParameters, parameterKeys, type ParameterKey } from "./ModelParameters.js";
export { formatModelSpec, parseModelSpec, withChanges, type NamedModels } from "./modelSpec.js";
export { NoSolutionError } from "./NoSolutionError.js";
export {
  abFluxDensityJy,
  abMagnitude,
  absoluteMagnitude,
  apparentMagnitude,
  bolometricAbsoluteMagnitude,
  bolometricLuminosityW,
  fluxWm2,
  kCorrectionPowerLawMag,
  luminosityW,
  spectralLuminosityWHz,
} from "./photometry.js";
export { findPreset, presets, type Preset } from "./presets.js";
export { checkRedshift, checkSourceRedshift } from "./redshift.js";
export { type InverseWording } from "./redshiftInverse.js";
export { conversionFactor, convertUnit, parseUnit, type Unit } from "./units.js";
