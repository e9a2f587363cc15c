/**
 * Sky frames and the rotations between them. Each frame is a fixed rotation of the equatorial frame
 * (ICRS, J2000), made from its north pole and origin as published:
 *
 * - "galactic": the IAU 1958 galactic frame as the Hipparcos Catalogue realises it in the ICRS, north
 *   galactic pole at α = 192.85948°, δ = 27.12825° and the north celestial pole at l = 122.93192°
 *   (ESA 1997, The Hipparcos and Tycho Catalogues, SP-1200, Vol. 1, §1.5.3; these values are exact by
 *   its definition, and its matrix A_G, eq. 1.5.11, follows from them). Gaia's archive uses the same.
 * - "supergalactic": de Vaucouleurs' supergalactic plane as usually adopted, pole at galactic
 *   l = 47.37°, b = +6.32°, zero of longitude at l = 137.37°, b = 0° (RC3, de Vaucouleurs et al. 1991;
 *   Lahav et al. 2000, MNRAS 312, 166).
 * - "ecliptic": the mean ecliptic and equinox of J2000, a rotation of the ICRS about its x axis by the
 *   obliquity ε0 = 84381.406″ (IAU 2006). The ICRS origin of right ascension lies 14.6 mas from the
 *   dynamical equinox of J2000 and its pole 17 mas from the J2000 mean pole (the frame bias, IERS
 *   Conventions 2010 §5.5.1, from memory): this frame neglects that bias, so it differs from an
 *   ecliptic tied to the dynamical equinox by up to about 25 mas.
 *
 * A frame's rotation from its parent, for a pole at (λ_p, β_p) in the parent and the parent's pole at
 * longitude θ in the frame, is R_z(180° − θ) R_y(90° − β_p) R_z(λ_p) with rotations of the axes
 * (passive; common practice); vectors carry the directions, and latitudes come from atan2, accurate
 * at the poles.
 */
import { eclipticObliquityJ2000Arcsec, galacticFrameDeg, supergalacticFrameDeg } from "../units/constants.js";
import { requireFiniteNumber, requireLatitudeDeg, requireLatitudeRad } from "../checks/numberChecks.js";

/** The frames `convertSkyFrameDeg` knows. */
export const skyFrames = ["equatorial", "galactic", "supergalactic", "ecliptic"] as const;
export type SkyFrame = (typeof skyFrames)[number];

/** A 3×3 rotation, row by row. */
type Matrix = readonly [number, number, number, number, number, number, number, number, number];

const degree = Math.PI / 180;

function product(a: Matrix, b: Matrix): Matrix {
  const out = new Array<number>(9);
  for (let r = 0; r < 3; r++) {
    for (let c = 0; c < 3; c++) out[3 * r + c] = a[3 * r] * b[c] + a[3 * r + 1] * b[3 + c] + a[3 * r + 2] * b[6 + c];
  }
  return out as unknown as Matrix;
}

function transpose(a: Matrix): Matrix {
  return [a[0], a[3], a[6], a[1], a[4], a[7], a[2], a[5], a[8]];
}

/** Rotation of the axes by `deg` about z. */
function aboutZ(deg: number): Matrix {
  const c = Math.cos(deg * degree);
  const s = Math.sin(deg * degree);
  return [c, s, 0, -s, c, 0, 0, 0, 1];
}

/** Rotation of the axes by `deg` about y. */
function aboutY(deg: number): Matrix {
  const c = Math.cos(deg * degree);
  const s = Math.sin(deg * degree);
  return [c, 0, -s, 0, 1, 0, s, 0, c];
}

/** The rotation into a frame whose pole is at (lonPole, latPole) of its parent, with the parent's pole at longitude `parentPoleLon` in it [deg]. */
function fromPole(lonPole: number, latPole: number, parentPoleLon: number): Matrix {
  return product(product(aboutZ(180 - parentPoleLon), aboutY(90 - latPole)), aboutZ(lonPole));
}

const galactic = fromPole(galacticFrameDeg.poleRa, galacticFrameDeg.poleDec, galacticFrameDeg.celestialPoleL);
// the origin lies on the galactic plane 90° from the pole's longitude, so the galactic pole is at SGL = 90°
const supergalactic = product(fromPole(supergalacticFrameDeg.poleL, supergalacticFrameDeg.poleB, supergalacticFrameDeg.originL - supergalacticFrameDeg.poleL), galactic);
// the ecliptic pole is at α = 270°, δ = 90° − ε0, and the celestial pole at ecliptic longitude 90°: a rotation about x by ε0
const obliquityDeg = eclipticObliquityJ2000Arcsec / 3600;
const ecliptic = fromPole(270, 90 - obliquityDeg, 90);

/** Rotations from the equatorial frame into each frame. */
const intoFrame: Record<SkyFrame, Matrix> = { equatorial: [1, 0, 0, 0, 1, 0, 0, 0, 1], galactic, supergalactic, ecliptic };

/** Every rotation from one frame into another, worked out once. */
const between = Object.fromEntries(
  skyFrames.map((from) => [from, Object.fromEntries(skyFrames.map((to) => [to, product(intoFrame[to], transpose(intoFrame[from]))]))]),
) as Record<SkyFrame, Record<SkyFrame, Matrix>>;

/**
 * The rotation matrix that takes unit vectors of the equatorial frame (ICRS) into a frame, row by row.
 * @param frame the target frame
 * @returns nine numbers, row by row (the galactic one is the transpose of the Hipparcos A_G)
 * @example skyFrameMatrix("galactic")[0] // ≈ -0.0548755604 (A_G, ESA 1997 Vol. 1 eq. 1.5.11)
 */
export function skyFrameMatrix(frame: SkyFrame): readonly number[] {
  const m = intoFrame[frame];
  if (!m) throw new TypeError(`unknown frame "${String(frame)}": use ${skyFrames.join(", ")}`);
  return m;
}

/**
 * A direction's longitude and latitude in another frame.
 *
 * @param lonDeg longitude in the frame `from` [deg] (right ascension for "equatorial"), any finite value
 * @param latDeg latitude in `from` [deg], −90 … 90
 * @param from the frame of the given direction: "equatorial", "galactic", "supergalactic" or "ecliptic"
 * @param to the frame wanted
 * @returns { lon, lat } [deg], lon in [0, 360), lat in [−90, 90]
 * @throws TypeError for a frame not known, or a coordinate that is not a number; RangeError for |lat| > 90°
 * @example convertSkyFrameDeg(0, 90, "equatorial", "galactic").lon // ≈ 122.93192 (the celestial pole's galactic longitude)
 */
export function convertSkyFrameDeg(lonDeg: number, latDeg: number, from: SkyFrame, to: SkyFrame): { lon: number; lat: number } {
  const m = between[from]?.[to];
  if (!m) throw new TypeError(`unknown frame "${String(between[from] ? to : from)}": use ${skyFrames.join(", ")}`);
  requireFiniteNumber("lon", lonDeg);
  requireLatitudeDeg("lat", latDeg);
  const lon = lonDeg * degree;
  const lat = latDeg * degree;
  const c = Math.cos(lat);
  const x = c * Math.cos(lon);
  const y = c * Math.sin(lon);
  const z = Math.sin(lat);
  const u = m[0] * x + m[1] * y + m[2] * z;
  const v = m[3] * x + m[4] * y + m[5] * z;
  const w = m[6] * x + m[7] * y + m[8] * z;
  let outLon = Math.atan2(v, u) / degree;
  if (outLon < 0) outLon += 360;
  if (outLon >= 360) outLon -= 360; // −tiny + 360 rounds to 360
  return { lon: outLon, lat: Math.atan2(w, Math.sqrt(u * u + v * v)) / degree };
}

/**
 * Galactic coordinates of an ICRS direction (the Hipparcos realisation of the galactic frame, as
 * `convertSkyFrameDeg`), in radians.
 *
 * @param raRad right ascension α [rad]
 * @param decRad declination δ [rad], −π/2 … π/2
 * @returns { l, b } [rad], l in [0, 2π), b in [−π/2, π/2]
 * @throws TypeError naming ra or dec when it is not a number; RangeError for |δ| > π/2
 * @example galacticCoordinatesRad(3.3660329, 0.4734773).b // ≈ 1.570796 (π/2: the north galactic pole, 192.85948°, 27.12825°)
 */
export function galacticCoordinatesRad(raRad: number, decRad: number): { l: number; b: number } {
  requireFiniteNumber("ra", raRad);
  requireLatitudeRad("dec", decRad);
  const g = convertSkyFrameDeg(raRad / degree, Math.max(-90, Math.min(90, decRad / degree)), "equatorial", "galactic");
  const l = g.lon * degree;
  return { l: l < 2 * Math.PI ? l : 0, b: g.lat * degree };
}
