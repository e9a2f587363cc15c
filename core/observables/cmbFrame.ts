/**
 * Redshifts in the frame of the cosmic microwave background, and the ICRS → galactic rotation they
 * need. The Sun moves at v = cmbDipoleSpeedKmPerS towards the dipole apex; a source at angle θ from the
 * apex has 1 + z_cmb = (1 + z_helio) / (γ (1 − β cos θ)), β = v/c, γ = 1/√(1 − β²) (the relativistic
 * Doppler shift of an observer moving at β, Rybicki & Lightman 1979 eq. 4.12, from memory; sign: light from the
 * apex is blueshifted by our motion, so its CMB-frame redshift is higher).
 */
import { cmbDipoleGalacticDeg, cmbDipoleSpeedKmPerS, galacticFrameDeg, speedOfLightKmPerS } from "../units/constants.js";
import { requireFiniteNumber } from "../checks/numberChecks.js";

const degree = Math.PI / 180;
const poleRa = galacticFrameDeg.poleRa * degree;
const poleDec = galacticFrameDeg.poleDec * degree;
const celestialPoleL = galacticFrameDeg.celestialPoleL * degree;
const sinPoleDec = Math.sin(poleDec);
const cosPoleDec = Math.cos(poleDec);

function requireDirection(raRad: number, decRad: number): void {
  requireFiniteNumber("ra", raRad);
  requireFiniteNumber("dec", decRad);
  if (Math.abs(decRad) > Math.PI / 2 * (1 + 1e-15)) throw new RangeError(`dec = ${decRad / degree}° is outside −90° … 90°`);
}

/**
 * Galactic coordinates of an ICRS direction (Hipparcos definition of the galactic frame, ESA SP-1200
 * Vol. 1 §1.5.3: sin b = sin δ sin δ_G + cos δ cos δ_G cos(α − α_G), and l from l_NCP − l).
 *
 * @param raRad right ascension α [rad]
 * @param decRad declination δ [rad], −π/2 … π/2
 * @returns { l, b } [rad], l in [0, 2π), b in [−π/2, π/2]
 * @example galacticCoordinatesRad(3.3660329, 0.4734773).b // ≈ 1.570796 (π/2: the north galactic pole, 192.85948°, 27.12825°)
 */
export function galacticCoordinatesRad(raRad: number, decRad: number): { l: number; b: number } {
  requireDirection(raRad, decRad);
  const dRa = raRad - poleRa;
  const sinDec = Math.sin(decRad);
  const cosDec = Math.cos(decRad);
  const sinB = sinDec * sinPoleDec + cosDec * cosPoleDec * Math.cos(dRa);
  const y = cosDec * Math.sin(dRa);
  const x = sinDec * cosPoleDec - cosDec * sinPoleDec * Math.cos(dRa);
  let l = celestialPoleL - Math.atan2(y, x);
  l -= 2 * Math.PI * Math.floor(l / (2 * Math.PI));
  return { l, b: Math.asin(Math.max(-1, Math.min(1, sinB))) };
}

/** ICRS unit vector of a galactic direction (the inverse rotation). */
function icrsVectorOfGalactic(lRad: number, bRad: number): [number, number, number] {
  const dL = celestialPoleL - lRad;
  const sinDec = Math.sin(bRad) * sinPoleDec + Math.cos(bRad) * cosPoleDec * Math.cos(dL);
  const y = Math.cos(bRad) * Math.sin(dL);
  const x = Math.sin(bRad) * cosPoleDec - Math.cos(bRad) * sinPoleDec * Math.cos(dL);
  const ra = poleRa + Math.atan2(y, x);
  const cosDec = Math.sqrt(Math.max(0, 1 - sinDec * sinDec));
  return [cosDec * Math.cos(ra), cosDec * Math.sin(ra), sinDec];
}

const apex = icrsVectorOfGalactic(cmbDipoleGalacticDeg.l * degree, cmbDipoleGalacticDeg.b * degree);
const beta = cmbDipoleSpeedKmPerS / speedOfLightKmPerS;
const gamma = 1 / Math.sqrt(1 - beta * beta);

/**
 * Cosine of the angle between an ICRS direction and the CMB dipole apex.
 * @param raRad right ascension [rad]
 * @param decRad declination [rad]
 * @returns cos θ, −1 … 1; 1 at the apex
 */
export function cosAngleToCmbApex(raRad: number, decRad: number): number {
  requireDirection(raRad, decRad);
  const c = Math.cos(decRad);
  return c * Math.cos(raRad) * apex[0] + c * Math.sin(raRad) * apex[1] + Math.sin(decRad) * apex[2];
}

/**
 * The redshift a source would have in the CMB frame: 1 + z_cmb = (1 + z_helio) / (γ (1 − β cos θ)).
 *
 * @param zHelio heliocentric redshift, > −1 (nearby sources may be blueshifted)
 * @param raRad right ascension (ICRS) [rad]
 * @param decRad declination (ICRS) [rad], −π/2 … π/2
 * @returns z_cmb; at the apex a source with z_helio = 0 has β + β²/2 + O(β³)
 */
export function cmbFrameRedshift(zHelio: number, raRad: number, decRad: number): number {
  requireFiniteNumber("z_helio", zHelio);
  if (!(zHelio > -1)) throw new RangeError(`z_helio = ${zHelio} must be > −1`);
  return (1 + zHelio) / (gamma * (1 - beta * cosAngleToCmbApex(raRad, decRad))) - 1;
}
