/**
 * Flux densities per unit frequency (f_ν: Jy, erg/s/cm2/Hz) or per unit wavelength (f_λ:
 * erg/s/cm2/Angstrom, W/m2/um), as f_ν in Jy. A per-wavelength value needs the wavelength it was
 * measured at: f_ν = f_λ λ²/c (from f_ν |dν| = f_λ |dλ| with ν = c/λ; common practice).
 */
import { requireNonNegative } from "../checks/numberChecks.js";
import { angstromM, janskySI, speedOfLightMPerS } from "./constants.js";
import { conversionFactor, parseUnit } from "./units.js";

/** A flux-density unit, read once: its factor into SI (W m⁻² Hz⁻¹ or W m⁻² m⁻¹) and which kind it is. */
interface FluxDensityUnit {
  factorSI: number;
  perWavelength: boolean;
}

const known = new Map<string, FluxDensityUnit>();

/**
 * The wavelengths [Å] taken for a flux density per wavelength: 100 Å (extreme ultraviolet) to 1e7 Å
 * (1 mm). Our choice: f_λ is not quoted outside them, and a value there is almost surely in another
 * unit (0.5 meant as µm is 5000 Å).
 */
const fLambdaWavelengthAngstrom = [100, 1e7] as const;

/** Refuses a wavelength outside the range of f_λ, saying it is read in Angstrom. */
function checkFLambdaWavelength(angstrom: number): void {
  const [lo, hi] = fLambdaWavelengthAngstrom;
  if (angstrom >= lo && angstrom <= hi) return;
  const shown = Number(angstrom.toPrecision(6));
  const asMicron = angstrom < lo ? ` (${shown} um is ${Number((angstrom * 1e4).toPrecision(6))} Angstrom)` : "";
  throw new RangeError(`wavelength = ${shown} Angstrom is outside 100 … 1e7 Angstrom (1 mm), where zcell takes the wavelength of a flux density per wavelength: it is read in Angstrom${asMicron}`);
}

function readUnit(unit: string): FluxDensityUnit {
  const text = parseUnit(unit).text; // a unit that does not parse says so here, with the nearest spellings
  try {
    return { factorSI: conversionFactor(text, "W/m2/Hz"), perWavelength: false };
  } catch {
    try {
      return { factorSI: conversionFactor(text, "W/m2/m"), perWavelength: true };
    } catch {
      throw new TypeError(
        `"${text}" is not a flux density: use one per frequency (Jy, mJy, erg/s/cm2/Hz) or per wavelength (erg/s/cm2/Angstrom, W/m2/um)`,
      );
    }
  }
}

/**
 * The factor that turns a flux density in `unit` into f_ν in Jy: the unit's own factor for a
 * per-frequency unit; for a per-wavelength unit, f_ν = f_λ λ²/c at the wavelength given.
 *
 * @param unit FITS unit text of a flux density, per frequency ("Jy", "erg/s/cm2/Hz") or per wavelength ("erg/s/cm2/Angstrom", "W/m2/um")
 * @param wavelengthAngstrom the wavelength of a per-wavelength value [Å], 100 … 1e7; NaN (not given)
 *   is allowed for a per-frequency unit, which does not use it
 * @returns value in Jy = value in `unit` × factor
 * @throws TypeError for a unit that is not a flux density, or a per-wavelength unit without a
 *   wavelength; RangeError for a wavelength ≤ 0 or outside 100 … 1e7 Å
 * @example fluxDensityFactorJy("mJy") // 0.001
 * @example fluxDensityFactorJy("erg/s/cm2/Angstrom", 5000) // ≈ 8.3391e11 (f_ν/Jy = 3.33564e4 λ²/Å² f_λ, common practice)
 */
export function fluxDensityFactorJy(unit: string, wavelengthAngstrom = Number.NaN): number {
  let read = known.get(unit);
  if (read === undefined) {
    read = readUnit(unit);
    if (known.size >= 64) known.clear();
    known.set(unit, read);
  }
  if (!read.perWavelength) return read.factorSI / janskySI;
  if (Number.isNaN(wavelengthAngstrom)) {
    throw new TypeError(`wavelength is needed with "${unit.trim()}", a flux density per wavelength (f_λ): give it in Angstrom (the last argument) to turn f_λ into f_ν`);
  }
  requireNonNegative("wavelength", wavelengthAngstrom, "Angstrom", true);
  checkFLambdaWavelength(wavelengthAngstrom);
  const lambdaM = wavelengthAngstrom * angstromM;
  return (read.factorSI * lambdaM * lambdaM) / speedOfLightMPerS / janskySI;
}
