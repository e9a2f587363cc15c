/**
 * Redshifts that compose: light shifted by z1 and then by z2 arrives shifted by
 * 1 + z = (1 + z1)(1 + z2), since each factor is a ratio of wavelengths (common practice). A source's
 * observed redshift is so its cosmological redshift composed with the redshift of its peculiar
 * motion, 1 + z_obs = (1 + z_cosmo)(1 + z_pec), and the peculiar velocity is
 * v_pec = c z_pec = c (z_obs − z_cosmo)/(1 + z_cosmo) (Davis & Scrimgeour 2014, MNRAS 442, 1117, §2,
 * from memory: not c z_obs − c z_cosmo, which overstates v_pec by the factor 1 + z_cosmo). c z_pec is
 * the low-velocity form, exact to order (v/c)², as peculiar velocities of galaxies are.
 */
import { requireFiniteNumber } from "../checks/numberChecks.js";
import { speedOfLightKmPerS } from "../units/constants.js";

function requireRedshift(name: string, z: number): void {
  requireFiniteNumber(name, z);
  if (!(z > -1)) throw new RangeError(`${name} = ${z} must be > −1`);
}

/**
 * The redshift of two shifts in turn: (1 + z1)(1 + z2) − 1, computed as z1 + z2 + z1 z2.
 *
 * @param z1 first redshift, > −1
 * @param z2 second redshift, > −1
 * @returns the combined redshift, > −1
 * @example combinedRedshift(0.1, 0.001) // 0.1011
 */
export function combinedRedshift(z1: number, z2: number): number {
  requireRedshift("z1", z1);
  requireRedshift("z2", z2);
  return z1 + z2 + z1 * z2;
}

/**
 * Peculiar velocity of a source from its observed and cosmological redshifts (Davis & Scrimgeour 2014).
 *
 * @param zObs observed redshift (in the CMB frame for a peculiar velocity relative to the Hubble flow), > −1
 * @param zCosmo cosmological redshift (from a distance and a model), > −1
 * @returns v_pec = c (z_obs − z_cosmo)/(1 + z_cosmo) [km/s]
 * @example peculiarVelocityKmPerS(0.101, 0.1) // ≈ 272.5386 (not 299.79 = c Δz)
 */
export function peculiarVelocityKmPerS(zObs: number, zCosmo: number): number {
  requireRedshift("z_obs", zObs);
  requireRedshift("z_cosmo", zCosmo);
  return (speedOfLightKmPerS * (zObs - zCosmo)) / (1 + zCosmo);
}
