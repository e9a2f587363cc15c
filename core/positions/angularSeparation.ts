/**
 * The angle between two directions on the sky (the great-circle distance), in the form Vincenty gave
 * for the sphere (Vincenty 1975, Survey Review 23, 88, his inverse formula with the flattening set to
 * 0; from memory): θ = atan2(√((cos φ2 sin Δλ)² + (cos φ1 sin φ2 − sin φ1 cos φ2 cos Δλ)²),
 * sin φ1 sin φ2 + cos φ1 cos φ2 cos Δλ). Unlike the cosine law (which loses every digit below about
 * 1″) or the haversine (which loses them near 180°), atan2 of the two parts keeps full relative
 * precision at every separation. The middle term is written as sin(φ2 − φ1) + 2 sin φ1 cos φ2 sin²(Δλ/2)
 * (the same quantity) so that two nearby declinations do not cancel, and the cosine of a latitude near a
 * pole is taken as the sine of its distance from the pole (exact in degrees), so that it keeps its digits.
 */
import { requireFiniteNumber, requireLatitudeDeg } from "../checks/numberChecks.js";

const degree = Math.PI / 180;

/** cos of a latitude in degrees, as sin(90° − |lat|) near the poles, where 90° − |lat| is exact and keeps cos its digits. */
function cosLatitude(lat: number): number {
  const a = Math.abs(lat);
  return a > 45 ? Math.sin((90 - a) * degree) : Math.cos(lat * degree);
}

/**
 * Great-circle distance between two directions given by longitude and latitude in one frame (right
 * ascension and declination, or any other). In degrees, so that the differences of nearby
 * coordinates are taken exactly before they are turned into radians (a 1e-8° offset keeps its digits).
 *
 * @param lon1 longitude of the first direction [deg], any finite value
 * @param lat1 latitude of the first direction [deg], −90 … 90
 * @param lon2 longitude of the second direction [deg]
 * @param lat2 latitude of the second direction [deg], −90 … 90
 * @returns the separation [deg], 0 … 180
 * @throws TypeError naming an argument that is not a number; RangeError for a latitude beyond ±90°
 * @example angularSeparationDeg(0, 0, 90, 0) // 90
 * @example angularSeparationDeg(187.7, 12.4, 187.7, 12.4 + 1e-8) * 3.6e6 // ≈ 0.0360000030 (mas: 1e-8° is 36 µas, and 12.4 + 1e-8 in binary is 8e-17° more)
 */
export function angularSeparationDeg(lon1: number, lat1: number, lon2: number, lat2: number): number {
  requireFiniteNumber("ra1", lon1);
  requireFiniteNumber("ra2", lon2);
  requireLatitudeDeg("dec1", lat1);
  requireLatitudeDeg("dec2", lat2);
  const dLon = (lon2 - lon1) * degree;
  const sin1 = Math.sin(lat1 * degree);
  const cos1 = cosLatitude(lat1);
  const sin2 = Math.sin(lat2 * degree);
  const cos2 = cosLatitude(lat2);
  const sinHalf = Math.sin(dLon / 2);
  const a = cos2 * Math.sin(dLon);
  const b = Math.sin((lat2 - lat1) * degree) + 2 * sin1 * cos2 * sinHalf * sinHalf;
  const c = sin1 * sin2 + cos1 * cos2 * Math.cos(dLon);
  return Math.atan2(Math.sqrt(a * a + b * b), c) / degree;
}
