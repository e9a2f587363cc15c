/**
 * Photometry under a cosmology: bolometric and spectral luminosities and fluxes, K-corrections,
 * absolute and apparent magnitudes, AB magnitudes, rest-frame band luminosities, bolometric
 * magnitudes and surface-brightness dimming.
 * Each function is its JSDoc (read by the metadata plugin into functions.json) plus one line handing
 * the arguments to the shared wrapper; see functions/functions.ts for the conventions of all families.
 */
/* eslint-disable @typescript-eslint/no-explicit-any */
import { definitions as d } from "../definitions.js";
import { callFromSheet } from "../evaluate.js";

/**
 * Bolometric luminosity L = 4π D_L² F, in erg/s (flux in erg/s/cm2) unless units are given.
 * @customfunction LUMINOSITY LUMINOSITY
 * @helpurl https://localhost:3000/help.html#LUMINOSITY
 * @example =ZC.LUMINOSITY(1E-13, 0.5)
 * @param flux Bolometric flux, ≥ 0, in erg/s/cm2 by default (value or range).
 * @param z Redshift, > 0 (value or range).
 * @param [model] Cosmology: preset, spec or key/value block; blank = workbook's active model.
 * @param [flux_unit] Unit of flux, default "erg/s/cm2" (e.g. "W/m2").
 * @param [lum_unit] Output unit, default "erg/s" (e.g. "W", "Lsun").
 * @returns Luminosity (erg/s by default).
 */
export function LUMINOSITY(flux: any[][], z: any[][], model?: any[][], flux_unit?: string, lum_unit?: string): any[][] {
  return callFromSheet(d.LUMINOSITY, [flux, z, model, flux_unit, lum_unit]);
}

/**
 * Bolometric flux F = L / (4π D_L²), in erg/s/cm2 (luminosity in erg/s) unless units are given.
 * @customfunction FLUX FLUX
 * @helpurl https://localhost:3000/help.html#FLUX
 * @example =ZC.FLUX(1E44, 1)
 * @param lum Luminosity, ≥ 0, in erg/s by default (value or range).
 * @param z Redshift, > 0 (value or range).
 * @param [model] Cosmology: preset, spec or key/value block; blank = workbook's active model.
 * @param [lum_unit] Unit of luminosity, default "erg/s" (e.g. "W", "Lsun").
 * @param [flux_unit] Output unit, default "erg/s/cm2" (e.g. "W/m2").
 * @returns Flux (erg/s/cm2 by default).
 */
export function FLUX(lum: any[][], z: any[][], model?: any[][], lum_unit?: string, flux_unit?: string): any[][] {
  return callFromSheet(d.FLUX, [lum, z, model, lum_unit, flux_unit]);
}

/**
 * Rest-frame spectral luminosity for a power law S_ν ∝ ν^alpha: 4π D_L² S_ν (1+z)^−(1+alpha), in W/Hz (flux density in Jy).
 * @customfunction LUMINOSITY_NU LUMINOSITY_NU
 * @helpurl https://localhost:3000/help.html#LUMINOSITY_NU
 * @example =ZC.LUMINOSITY_NU(0.012, 0.8, -0.7)
 * @param flux_density Observed flux density, ≥ 0 (value or range), in Jy unless in_unit says otherwise (catalogues in mJy: give "mJy").
 * @param z Redshift, > 0 (value or range).
 * @param alpha Spectral index: S_ν ∝ ν^alpha; synchrotron ≈ −0.7; other conventions via ZC.SPECTRAL_INDEX (value or range).
 * @param [model] Cosmology: preset, spec or key/value block; blank = workbook's active model.
 * @param [in_unit] Unit of flux density, default "Jy" (e.g. "mJy", "uJy").
 * @param [out_unit] Output unit, default "W/Hz" (e.g. "erg/s/Hz").
 * @returns Spectral luminosity (W/Hz by default).
 */
export function LUMINOSITY_NU(flux_density: any[][], z: any[][], alpha: any[][], model?: any[][], in_unit?: string, out_unit?: string): any[][] {
  return callFromSheet(d.LUMINOSITY_NU, [flux_density, z, alpha, model, in_unit, out_unit]);
}

/**
 * K-correction of a power law S_ν ∝ ν^alpha: K = −2.5 (1+alpha) log10(1+z), for M = m − μ − K (mag).
 * @customfunction KCORRECTION KCORRECTION
 * @helpurl https://localhost:3000/help.html#KCORRECTION
 * @example =ZC.KCORRECTION(1, -0.7)
 * @param z Redshift, ≥ 0 (value or range).
 * @param alpha Spectral index: S_ν ∝ ν^alpha; synchrotron ≈ −0.7; other conventions via ZC.SPECTRAL_INDEX (value or range).
 * @returns K-correction (mag).
 */
export function KCORRECTION(z: any[][], alpha: any[][]): any[][] {
  return callFromSheet(d.KCORRECTION, [z, alpha]);
}

/**
 * Absolute magnitude M = m − μ − K.
 * @customfunction MAG_ABS MAG_ABS
 * @helpurl https://localhost:3000/help.html#MAG_ABS
 * @example =ZC.MAG_ABS(22.5, 1.2)
 * @param m Apparent magnitude (value or range).
 * @param z Redshift, > 0 (value or range).
 * @param [kcorr] K-correction in mag, default 0 (value or range).
 * @param [model] Cosmology: preset, spec or key/value block; blank = workbook's active model.
 * @returns Absolute magnitude (mag).
 */
export function MAG_ABS(m: any[][], z: any[][], kcorr?: any[][], model?: any[][]): any[][] {
  return callFromSheet(d.MAG_ABS, [m, z, kcorr, model]);
}

/**
 * Apparent magnitude m = M + μ + K.
 * @customfunction MAG_APP MAG_APP
 * @helpurl https://localhost:3000/help.html#MAG_APP
 * @example =ZC.MAG_APP(-21, 0.3)
 * @param M Absolute magnitude (value or range).
 * @param z Redshift, > 0 (value or range).
 * @param [kcorr] K-correction in mag, default 0 (value or range).
 * @param [model] Cosmology: preset, spec or key/value block; blank = workbook's active model.
 * @returns Apparent magnitude (mag).
 */
export function MAG_APP(M: any[][], z: any[][], kcorr?: any[][], model?: any[][]): any[][] {
  return callFromSheet(d.MAG_APP, [M, z, kcorr, model]);
}

/**
 * AB magnitude of a flux density: −2.5 log10(f_ν / 3630.78 Jy). A flux density per wavelength (f_λ, e.g. "erg/s/cm2/Angstrom") is first turned into f_ν = f_λ λ²/c at the wavelength given.
 * @customfunction MAG_AB MAG_AB
 * @helpurl https://localhost:3000/help.html#MAG_AB
 * @example =ZC.MAG_AB(0.001)
 * @param flux_density Flux density, > 0 (value or range), in Jy unless unit says otherwise (catalogues in mJy: give "mJy").
 * @param [unit] Unit of flux density, default "Jy" (e.g. "uJy", "erg/s/cm2/Hz"), or per wavelength ("erg/s/cm2/Angstrom", "W/m2/um"), which needs the wavelength.
 * @param [wavelength] Wavelength in Angstrom (not um: 0.5 µm is 5000), 100 … 1e7 (1 mm), of a flux density per wavelength: required with such a unit, not used with a per-frequency one; outside the range #NUM! (value or range).
 * @returns AB magnitude (mag).
 */
export function MAG_AB(flux_density: any[][], unit?: string, wavelength?: any[][]): any[][] {
  return callFromSheet(d.MAG_AB, [flux_density, unit, wavelength]);
}

/**
 * Flux density of an AB magnitude, f_ν = 3630.78 Jy × 10^(−m_AB/2.5), in Jy unless a unit is given; in a unit per wavelength (f_λ, e.g. "erg/s/cm2/Angstrom"), f_λ = f_ν c/λ² at the wavelength given.
 * @customfunction FLUX_AB FLUX_AB
 * @helpurl https://localhost:3000/help.html#FLUX_AB
 * @example =ZC.FLUX_AB(20, "uJy")
 * @param m_ab AB magnitude (value or range).
 * @param [unit] Output unit, default "Jy" (e.g. "uJy", "erg/s/cm2/Hz"), or per wavelength ("erg/s/cm2/Angstrom", "W/m2/um"), which needs the wavelength.
 * @param [wavelength] Wavelength in Angstrom (not um: 0.5 µm is 5000), 100 … 1e7 (1 mm), for a unit per wavelength: required with such a unit, not used with a per-frequency one; outside the range #NUM! (value or range).
 * @returns Flux density (Jy by default).
 */
export function FLUX_AB(m_ab: any[][], unit?: string, wavelength?: any[][]): any[][] {
  return callFromSheet(d.FLUX_AB, [m_ab, unit, wavelength]);
}

/**
 * Rest-frame spectral luminosity at another frequency or wavelength, from a flux density observed at one, for a power law S_ν ∝ ν^α: L_ν(rest) = 4πD_L² S_ν (1+z)^−(1+α) (rest/observed)^α.
 * @customfunction LUMINOSITY_REST LUMINOSITY_REST
 * @helpurl https://localhost:3000/help.html#LUMINOSITY_REST
 * @example =ZC.LUMINOSITY_REST(2.5, 1.1, -0.7, 3, 1.4, , , "mJy")
 * @param flux_density Flux density at the observed band (the argument observed), ≥ 0 (value or range), in Jy unless in_unit says otherwise (catalogues in mJy: give "mJy").
 * @param z Redshift, > 0 (value or range).
 * @param alpha Spectral index: S_ν ∝ ν^alpha; synchrotron ≈ −0.7; other conventions via ZC.SPECTRAL_INDEX (value or range).
 * @param observed Observed frequency, wavelength or energy, > 0, in band_unit (value or range).
 * @param rest Rest-frame frequency, wavelength or energy wanted, > 0, in band_unit (value or range).
 * @param [model] Cosmology: preset, spec or key/value block; blank = workbook's active model.
 * @param [band_unit] Unit of observed and rest, default "GHz" (e.g. "MHz", "Angstrom", "nm", "um", "eV").
 * @param [in_unit] Unit of flux_density, default "Jy".
 * @param [out_unit] Default "W/Hz" (L_ν); a power unit ("W", "erg/s", "Lsun") gives ν L_ν = λ L_λ.
 * @returns L_ν at the rest frequency (W/Hz), or ν L_ν in a power unit.
 */
export function LUMINOSITY_REST(flux_density: any[][], z: any[][], alpha: any[][], observed: any[][], rest: any[][], model?: any[][], band_unit?: string, in_unit?: string, out_unit?: string): any[][] {
  return callFromSheet(d.LUMINOSITY_REST, [flux_density, z, alpha, observed, rest, model, band_unit, in_unit, out_unit]);
}

/**
 * Absolute bolometric magnitude of a luminosity, −2.5 log10(L / 3.0128e28 W) (IAU 2015 Resolution B2).
 * @customfunction MAG_BOL MAG_BOL
 * @helpurl https://localhost:3000/help.html#MAG_BOL
 * @example =ZC.MAG_BOL(1, "Lsun")
 * @param lum Bolometric luminosity, > 0, in erg/s by default (value or range).
 * @param [unit] Unit of lum, default "erg/s" (e.g. "W", "Lsun").
 * @returns M_bol (mag).
 */
export function MAG_BOL(lum: any[][], unit?: string): any[][] {
  return callFromSheet(d.MAG_BOL, [lum, unit]);
}

/**
 * Bolometric luminosity of an absolute bolometric magnitude, 3.0128e28 W × 10^(−0.4 M_bol) (IAU 2015 Resolution B2).
 * @customfunction LUM_BOL LUM_BOL
 * @helpurl https://localhost:3000/help.html#LUM_BOL
 * @example =ZC.LUM_BOL(-21.3, "Lsun")
 * @param mag_bol Absolute bolometric magnitude (value or range).
 * @param [unit] Output unit, default "erg/s" (e.g. "W", "Lsun").
 * @returns Luminosity (erg/s by default).
 */
export function LUM_BOL(mag_bol: any[][], unit?: string): any[][] {
  return callFromSheet(d.LUM_BOL, [mag_bol, unit]);
}

/**
 * Surface-brightness dimming in magnitudes: 10 log10(1+z) bolometric (Tolman), or 2.5 (3 − α) log10(1+z) per unit frequency at a fixed observed frequency for S_ν ∝ ν^α.
 * @customfunction DIMMING DIMMING
 * @helpurl https://localhost:3000/help.html#DIMMING
 * @example =ZC.DIMMING(1)
 * @param z Redshift, ≥ 0 (value or range).
 * @param [alpha] Spectral index: S_ν ∝ ν^alpha; synchrotron ≈ −0.7; other conventions via ZC.SPECTRAL_INDEX; blank = bolometric (value or range).
 * @returns Dimming (mag).
 */
export function DIMMING(z: any[][], alpha?: any[][]): any[][] {
  return callFromSheet(d.DIMMING, [z, alpha]);
}

/**
 * A spectral index in another field's convention as zcell's alpha (S_ν ∝ ν^alpha): "photon" (X-ray photon index Γ of N(E) ∝ E^−Γ: alpha = 1 − Γ), "lambda" (f_λ ∝ λ^β: alpha = −2 − β) or "radio" (S_ν ∝ ν^−value: alpha = −value, whatever its sign: a negative radio index, a rising spectrum, gives a positive alpha; an index already written as S_ν ∝ ν^alpha, −0.7 for synchrotron, needs no conversion and would come back as +0.7).
 * @customfunction SPECTRAL_INDEX SPECTRAL_INDEX
 * @helpurl https://localhost:3000/help.html#SPECTRAL_INDEX
 * @example =ZC.SPECTRAL_INDEX(1.9, "photon")
 * @param value The index as its convention writes it, e.g. Γ = 1.9 (value or range).
 * @param convention "photon", "lambda" or "radio" (value or range).
 * @returns alpha of S_ν ∝ ν^alpha, for every alpha argument of ZC, as in ZC.KCORRECTION(z, ZC.SPECTRAL_INDEX(1.9, "photon")).
 */
export function SPECTRAL_INDEX(value: any[][], convention: any[][]): any[][] {
  return callFromSheet(d.SPECTRAL_INDEX, [value, convention]);
}

/**
 * Intrinsic surface luminosity density from an observed surface brightness, removing the (1+z)⁴ dimming (10 log10(1+z) mag) and K: Σ = 10^(−0.4 (μ − 10 log10(1+z) − K − M☉ − 21.572)) Lsun/pc2, in solar luminosities of the band. M☉ must be the Sun's absolute magnitude in the same band and the same system (AB or Vega) as μ: a mismatch shifts Σ by the zero-point difference. No cosmology enters.
 * @customfunction SURFACE_LUM SURFACE_LUM
 * @helpurl https://localhost:3000/help.html#SURFACE_LUM
 * @example =ZC.SURFACE_LUM(24.1, 0.6, 4.81, 0.4)
 * @param mu Observed surface brightness, mag/arcsec2 (value or range).
 * @param z Redshift, ≥ 0 (value or range).
 * @param sun_abs_mag The Sun's absolute magnitude in the band of μ, in the same system (AB or Vega) (value or range).
 * @param [kcorr] K-correction of the band (mag); blank = 0 (value or range).
 * @returns Σ (Lsun/pc2).
 */
export function SURFACE_LUM(mu: any[][], z: any[][], sun_abs_mag: any[][], kcorr?: any[][]): any[][] {
  return callFromSheet(d.SURFACE_LUM, [mu, z, sun_abs_mag, kcorr]);
}

/**
 * Observed surface brightness of an intrinsic surface luminosity density (the inverse of ZC.SURFACE_LUM): μ = M☉ + 21.572 − 2.5 log10(Σ) + 10 log10(1+z) + K. μ comes out in the band and system (AB or Vega) of M☉, the Sun's absolute magnitude given.
 * @customfunction SURFACE_MAG SURFACE_MAG
 * @helpurl https://localhost:3000/help.html#SURFACE_MAG
 * @example =ZC.SURFACE_MAG(100, 0.6, 4.81)
 * @param sigma Surface luminosity density, > 0, Lsun/pc2 (value or range).
 * @param z Redshift, ≥ 0 (value or range).
 * @param sun_abs_mag The Sun's absolute magnitude in the band of μ, in the same system (AB or Vega) (value or range).
 * @param [kcorr] K-correction of the band (mag); blank = 0 (value or range).
 * @returns μ (mag/arcsec2).
 */
export function SURFACE_MAG(sigma: any[][], z: any[][], sun_abs_mag: any[][], kcorr?: any[][]): any[][] {
  return callFromSheet(d.SURFACE_MAG, [sigma, z, sun_abs_mag, kcorr]);
}
