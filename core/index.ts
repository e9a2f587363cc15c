/**
 * zcell core: the public surface of the cosmology engine (plain numbers; RangeError/TypeError).
 * Every export is listed here by name.
 */
export {
  abZeroPointJy,
  angstromM,
  auM,
  bolometricZeroPointW,
  cmbDipoleGalacticDeg,
  cmbDipoleSpeedKmPerS,
  electronVoltJ,
  galacticFrameDeg,
  gravitationalConstantSI,
  janskySI,
  julianYearS,
  megaparsecM,
  parsecM,
  planckConstantJs,
  radPerArcsec,
  secondsPerGyr,
  solarLuminosityW,
  solarMassKg,
  speedOfLightKmPerS,
  speedOfLightMPerS,
} from "./constants.js";
export { cmbFrameRedshift, cosAngleToCmbApex, galacticCoordinatesRad } from "./cmbFrame.js";
export { Cosmology, type InvertibleQuantity } from "./Cosmology.js";
export {
  angularDiameterDistanceSlopeMpc,
  comovingDistanceSlopeMpc,
  luminosityDistanceLogSlope,
  luminosityDistanceSlopeMpc,
  transverseComovingDistanceSlopeMpc,
} from "./distanceSlopes.js";
export { ExpansionRate, type DensityComponent } from "./ExpansionRate.js";
export { fermiDiracDensityFactor } from "./fermiDirac.js";
export { limitingRedshift, limitingRedshiftMag, maxVolumeMpc3 } from "./fluxLimit.js";
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
  restFrameSpectralLuminosityWHz,
  spectralLuminosityWHz,
  spectralSurfaceBrightnessDimmingMag,
  surfaceBrightnessDimmingMag,
} from "./photometry.js";
export { findPreset, presets, type Preset } from "./presets.js";
export { checkRedshift, checkSourceRedshift } from "./redshift.js";
export { type InverseWording } from "./redshiftInverse.js";
export {
  absoluteMagnitudeErrorMag,
  luminosityDistanceErrorMpc,
  luminosityErrorW,
  properSizeErrorMpc,
  spectralLuminosityErrorWHz,
} from "./uncertainties.js";
export { conversionFactor, convertUnit, frequencyHz, parseUnit, scaledConversion, type Unit } from "./units.js";
