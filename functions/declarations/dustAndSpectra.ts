/**
 * Dust, two-band spectral indices and radio brightness temperatures: extinction by a published law,
 * the index between two bands and its error, T_b of a resolved source. No cosmology enters.
 * Each function is its JSDoc (read by the metadata plugin into functions.json) plus one line handing
 * the arguments to the shared wrapper; see functions/functions.ts for the conventions of all families.
 */
/* eslint-disable @typescript-eslint/no-explicit-any */
import { definitions as d } from "../definitions.js";
import { callFromSheet } from "../evaluate.js";

/**
 * Extinction A_λ in magnitudes for a colour excess E(B−V), by a published law at one wavelength: E(B−V) × A_λ/E(B−V). A broad band's A is approximated by the law's value at the band's effective wavelength. Laws: "Fitzpatrick 1999" (the default; Milky Way, R_V = 3.1, 1150 Å to 3.5 µm), "Cardelli 1989" and "ODonnell 1994" (Milky Way, R_V = 3.1, 1000 Å to 3.33 µm), "Calzetti 2000" (a starburst galaxy's own attenuation, R′_V = 4.05, 1200 Å to 2.2 µm). Outside a law's range: #N/A naming the range.
 * @customfunction EXTINCTION EXTINCTION
 * @helpurl https://localhost:3000/help.html#EXTINCTION
 * @example =ZC.EXTINCTION(5500, 0.1)
 * @param wavelength Wavelength, > 0, in Angstrom by default; a frequency or photon energy with its unit (value or range).
 * @param ebv Colour excess E(B−V) in mag, ≥ 0, e.g. from a dust map (for Calzetti 2000, E_s(B−V) of the stellar continuum) (value or range).
 * @param [law] "Fitzpatrick 1999" (blank), "Cardelli 1989", "ODonnell 1994" or "Calzetti 2000"; case, spaces, "_", "-" and an apostrophe (O'Donnell) are ignored (value or range).
 * @param [r_v] R_V = A_V/E(B−V), > 0; blank = 3.1, or 4.05 for Calzetti 2000, where it is R′_V, the constant added to k′(λ) (value or range).
 * @param [wavelength_unit] Unit of wavelength, default "Angstrom" (e.g. "nm", "um"; or a frequency "GHz", "THz"; or an energy "eV").
 * @returns A_λ (mag): subtract it from an observed magnitude to correct it.
 */
export function EXTINCTION(wavelength: any[][], ebv: any[][], law?: any[][], r_v?: any[][], wavelength_unit?: string): any[][] {
  return callFromSheet(d.EXTINCTION, [wavelength, ebv, law, r_v, wavelength_unit]);
}

/**
 * Spectral index between two bands, α = ln(S1/S2)/ln(ν1/ν2), in zcell's sign S_ν ∝ ν^α (synchrotron ≈ −0.7). Both flux densities in one unit (any); bands in GHz unless a unit is given, a wavelength band turned into ν = c/λ. Upper limits are not handled.
 * @customfunction INDEX_BETWEEN INDEX_BETWEEN
 * @helpurl https://localhost:3000/help.html#INDEX_BETWEEN
 * @example =ZC.INDEX_BETWEEN(12.4, 1.4, 3.1, 5)
 * @param flux_density1 Flux density in band1, > 0, in any unit, the same for both (only their ratio counts) (value or range).
 * @param band1 First band, > 0, in band_unit (value or range).
 * @param flux_density2 Flux density in band2, > 0, in the unit of flux_density1 (value or range).
 * @param band2 Second band, > 0, not band1, in band_unit (value or range).
 * @param [band_unit] Unit of band1 and band2, default "GHz" (e.g. "MHz"; or a wavelength "um", "Angstrom"; or an energy "keV").
 * @returns α of S_ν ∝ ν^α, for every alpha argument of ZC.
 */
export function INDEX_BETWEEN(flux_density1: any[][], band1: any[][], flux_density2: any[][], band2: any[][], band_unit?: string): any[][] {
  return callFromSheet(d.INDEX_BETWEEN, [flux_density1, band1, flux_density2, band2, band_unit]);
}

/**
 * 1σ error of ZC.INDEX_BETWEEN to first order, from independent errors of the two flux densities (bands exact): σ_α = √((err1/S1)² + (err2/S2)²)/|ln(ν1/ν2)|.
 * @customfunction INDEX_BETWEEN_ERR INDEX_BETWEEN_ERR
 * @helpurl https://localhost:3000/help.html#INDEX_BETWEEN_ERR
 * @example =ZC.INDEX_BETWEEN_ERR(12.4, 1.4, 3.1, 5, 0.4, 0.2)
 * @param flux_density1 Flux density in band1, > 0, in any unit, the same for both (only their ratio counts) (value or range).
 * @param band1 First band, > 0, in band_unit (value or range).
 * @param flux_density2 Flux density in band2, > 0, in the unit of flux_density1 (value or range).
 * @param band2 Second band, > 0, not band1, in band_unit (value or range).
 * @param err1 1σ error of flux_density1, ≥ 0, in its unit (value or range).
 * @param err2 1σ error of flux_density2, ≥ 0, in its unit (value or range).
 * @param [band_unit] Unit of band1 and band2, default "GHz" (e.g. "MHz"; or a wavelength "um", "Angstrom"; or an energy "keV").
 * @returns σ_α (dimensionless).
 */
export function INDEX_BETWEEN_ERR(flux_density1: any[][], band1: any[][], flux_density2: any[][], band2: any[][], err1: any[][], err2: any[][], band_unit?: string): any[][] {
  return callFromSheet(d.INDEX_BETWEEN_ERR, [flux_density1, band1, flux_density2, band2, err1, err2, band_unit]);
}

/**
 * Brightness temperature of a source fitted as an elliptical Gaussian, in the Rayleigh–Jeans limit (hν ≪ kT): T_b = S c²/(2 k ν² Ω), Ω = π θ_maj θ_min/(4 ln 2) for axes given as FWHM. With z, the rest frame's T_b = (1+z) × the observed one (frequency stays the observed one). This Rayleigh–Jeans T_b is always below the Planck brightness temperature T = (hν/k)/ln(1 + hν/(k T_b)) (the blackbody of the same intensity), by about hν/(2k) = 0.024 K per GHz while T_b ≫ hν/k = 0.048 K per GHz, by more when not: 1 Jy at 300 GHz in a 1″ Gaussian gives 13.58 K here, 19.9 K by Planck's law.
 * @customfunction BRIGHTNESS_TEMP BRIGHTNESS_TEMP
 * @helpurl https://localhost:3000/help.html#BRIGHTNESS_TEMP
 * @example =ZC.BRIGHTNESS_TEMP(50, 8.4, 2, 1, , "mJy", , "mas")
 * @param flux_density Flux density, ≥ 0 (value or range), in Jy unless flux_unit says otherwise (catalogues in mJy: give "mJy").
 * @param frequency Observed frequency, > 0, in GHz by default (value or range).
 * @param major FWHM of the major axis, > 0, in arcsec by default (value or range).
 * @param minor FWHM of the minor axis, > 0, in arcsec by default (value or range).
 * @param [z] Redshift, ≥ 0; blank = 0, the observed frame (value or range).
 * @param [flux_unit] Unit of flux_density, default "Jy" (e.g. "mJy", "uJy").
 * @param [band_unit] Unit of frequency, default "GHz" (e.g. "MHz"; or a wavelength "mm", "cm").
 * @param [angle_unit] Unit of major and minor, default "arcsec" (e.g. "mas", "arcmin").
 * @returns T_b (K).
 */
export function BRIGHTNESS_TEMP(flux_density: any[][], frequency: any[][], major: any[][], minor: any[][], z?: any[][], flux_unit?: string, band_unit?: string, angle_unit?: string): any[][] {
  return callFromSheet(d.BRIGHTNESS_TEMP, [flux_density, frequency, major, minor, z, flux_unit, band_unit, angle_unit]);
}
