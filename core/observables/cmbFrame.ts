/**
 * Redshifts in the frame of the cosmic microwave background (the dipole's apex turned from galactic
 * into ICRS coordinates by `core/positions/skyFrames.ts`). The Sun moves at v = cmbDipoleSpeedKmPerS
 * towards the dipole apex; a source at angle θ from the apex has
 * 1 + z_cmb = (1 + z_helio) / (γ (1 − β cos θ)), β = v/c, γ = 1/√(1 − β²) (the relativistic
 * Doppler shift of an observer moving at β, Rybicki & Lightman 1979 eq. 4.12, from memory; sign: light from the
 * apex is blueshifted by our motion, so its CMB-frame redshift is higher).
 */
import { cmbDipoleGalacticDeg, cmbDipoleSpeedKmPerS, speedOfLightKmPerS } from "../units/constants.js";
import { requireFiniteNumber, requireLatitudeRad } from "../checks/numberChecks.js";
import { convertSkyFrameDeg } from "../positions/skyFrames.js";

const degree = Math.PI / 180;

function requireDirection(raRad: number, decRad: number): void {
  requireFiniteNumber("ra", raRad);
  requireLatitudeRad("dec", decRad);
}

/** ICRS unit vector of the dipole apex, turned from galactic coordinates by the frame code of ZC.COORD_CONVERT. */
function apexVector(): [number, number, number] {
  const { lon, lat } = convertSkyFrameDeg(cmbDipoleGalacticDeg.l, cmbDipoleGalacticDeg.b, "galactic", "equatorial");
  const c = Math.cos(lat * degree);
  return [c * Math.cos(lon * degree), c * Math.sin(lon * degree), Math.sin(lat * degree)];
}

const apex = apexVector();
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
