/**
 * zcell core: the public surface of the cosmology engine (plain numbers; RangeError/TypeError).
 * Every export is listed here by name.
 */
export {
  abZeroPointJy,
  angstromM,
  auM,
  boltzmannJPerK,
  bolometricZeroPointW,
  cmbDipoleGalacticDeg,
  cmbDipoleSpeedKmPerS,
  eclipticObliquityJ2000Arcsec,
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
  supergalacticFrameDeg,
} from "./units/constants.js";
export { cmbFrameRedshift, cosAngleToCmbApex } from "./observables/cmbFrame.js";
export { sexagesimalDegrees, sexagesimalText, type AnglePart } from "./positions/sexagesimal.js";
export { angularSeparationDeg } from "./positions/angularSeparation.js";
export { convertSkyFrameDeg, galacticCoordinatesRad, skyFrameMatrix, skyFrames, type SkyFrame } from "./positions/skyFrames.js";
export { dopplerConventions, redshiftOfVelocity, velocityKmPerS, type DopplerConvention } from "./observables/dopplerConventions.js";
export { combinedRedshift, peculiarVelocityKmPerS } from "./observables/combinedRedshift.js";
export { observedFrameValue, restFrameQuantities, restFrameValue, type RestFrameQuantity } from "./observables/restFrame.js";
export { Cosmology, type InvertibleQuantity } from "./distances/Cosmology.js";
export {
  angularDiameterDistanceSlopeMpc,
  comovingDistanceSlopeMpc,
  luminosityDistanceLogSlope,
  luminosityDistanceSlopeMpc,
  transverseComovingDistanceSlopeMpc,
} from "./distances/distanceSlopes.js";
export { ExpansionRate, type DensityComponent } from "./model/ExpansionRate.js";
export { fermiDiracDensityFactor } from "./model/fermiDirac.js";
export { limitingRedshift, limitingRedshiftMag, maxVolumeMpc3 } from "./observables/fluxLimit.js";
export { type ModelParameters, parameterKeys, type ParameterKey } from "./model/ModelParameters.js";
export { formatModelSpec, keySuggestion, MissingParameterError, parseModelSpec, withChanges, type NamedModels } from "./model/modelSpec.js";
export { quoted, quotedText } from "./checks/quoted.js";
export { isNumberText, numberTextHint } from "./checks/numberText.js";
export { NoSolutionError } from "./checks/NoSolutionError.js";
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
} from "./observables/photometry.js";
export { defaultPresetName, findPreset, presets, type Preset } from "./model/presets.js";
export { rescaledValue, rescaleQuantities, type RescaleQuantity } from "./distances/rescale.js";
export { hubbleDistanceAtMpc, soundHorizonDragMpc, volumeAveragedDistanceMpc } from "./distances/baoScales.js";
export { criticalSurfaceDensityMsunPc2, lensingCoordinates, type LensingCoordinates } from "./observables/lensing.js";
export { growthFactor, growthNeutrinoConventions, growthRate, type GrowthNeutrinos } from "./observables/growth.js";
export { binnedLuminosityFunction, type LuminosityFunctionBin } from "./observables/luminosityFunction.js";
export { hubbleDiagramChi2 } from "./observables/hubbleDiagram.js";
export { haloMassMsun, haloOverdensity, haloRadiusMpc } from "./observables/halos.js";
export { surfaceBrightnessOffsetMag, surfaceLuminosityLsunPc2, surfaceMagnitude } from "./observables/surfaceBrightness.js";
export { spectralIndexAlpha, spectralIndexConventions, type SpectralIndexConvention } from "./observables/spectralIndex.js";
export { checkRedshift, checkSourceRedshift } from "./checks/redshift.js";
export { type InverseWording } from "./distances/redshiftInverse.js";
export {
  absoluteMagnitudeErrorMag,
  luminosityDistanceErrorMpc,
  luminosityErrorW,
  properSizeErrorMpc,
  restFrameSpectralLuminosityErrorWHz,
  spectralLuminosityErrorWHz,
} from "./observables/uncertainties.js";
export { bandInUnit, conversionFactor, convertUnit, frequencyHz, parseUnit, scaledConversion, unitKind, type Unit } from "./units/units.js";
export { fluxDensityFactorJy } from "./units/fluxDensityFactorJy.js";
export { naturalCubicSpline } from "./numerics/naturalCubicSpline.js";
export {
  defaultRv,
  extinctionLawNamed,
  extinctionLaws,
  extinctionMag,
  extinctionRangeAngstrom,
  inRange,
  type ExtinctionLaw,
} from "./dust/extinction.js";
export { spectralIndexBetween, spectralIndexBetweenError } from "./observables/spectralIndexBetween.js";
export { brightnessTemperatureK } from "./observables/brightnessTemperature.js";
