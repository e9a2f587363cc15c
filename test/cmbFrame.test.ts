/**
 * CMB-frame redshifts: first order ±β at the dipole apex and antapex, second order only at 90°, and
 * the ICRS → galactic rotation at fixed positions and against the reference library.
 */
import { describe, expect, test } from "vitest";
import { cmbDipoleGalacticDeg, cmbDipoleSpeedKmPerS, cmbFrameRedshift, galacticCoordinatesRad, speedOfLightKmPerS } from "../core/index.js";
import { definitions } from "../functions/definitions.js";
import { evaluate, type Cell } from "../functions/evaluate.js";
import { expectRelative } from "./helpers.js";
import { referenceAvailable, runPythonReference } from "./reference/python.js";
import { onFirstUse } from "./requirements.js";

const degree = Math.PI / 180;
const beta = cmbDipoleSpeedKmPerS / speedOfLightKmPerS;
const active = { spec: "P18-BAO", stored: false };
const one = (name: string, ...args: unknown[]): Cell => evaluate(definitions[name], args, active)[0][0];

describe("galactic coordinates (Hipparcos definition, ESA SP-1200 Vol. 1 §1.5.3)", () => {
  test.each([
    // ra [deg]    dec [deg]   l [deg]      b [deg]     source
    [192.85948,   27.12825,   NaN,         90,         "the north galactic pole by definition (l undefined)"],
    [12.85948,    -27.12825,  NaN,         -90,        "the south galactic pole: the antipode of the north pole"],
    [0,           90,         122.93192,   27.12825,   "the north celestial pole: l_NCP and b = δ_NGP by definition"],
  ] as const)("(%d°, %d°) is at l = %d°, b = %d°", (ra, dec, l, b, _source) => {
    const g = galacticCoordinatesRad(ra * degree, dec * degree);
    expect(Math.abs(g.b / degree - b)).toBeLessThanOrEqual(1e-9);
    if (!Number.isNaN(l)) expect(Math.abs(g.l / degree - l)).toBeLessThanOrEqual(1e-9);
  });

  test("the galactic centre (266.40499°, −28.93617°, from memory) is at l, b ≈ 0 within 1e-4°", () => {
    const g = galacticCoordinatesRad(266.40499 * degree, -28.93617 * degree);
    const l = g.l / degree > 180 ? g.l / degree - 360 : g.l / degree;
    expect(Math.abs(l)).toBeLessThanOrEqual(1e-4);
    expect(Math.abs(g.b / degree)).toBeLessThanOrEqual(1e-4);
  });
});

describe.runIf(referenceAvailable("astropy", "python3-astropy"))("against the reference library (python3-astropy)", () => {
  // astropy's galactic frame is tied to FK5 J2000, the Hipparcos one to ICRS: they differ by the
  // FK5–ICRS frame bias, ≤ 25 mas (IERS Conventions 2010 §5.5.1, from memory), so agree within 3e-5°
  const positions = [[10.68, 41.27], [83.82, -5.39], [201.37, -43.02], [0, 0], [300, 60], [150, -80]];
  const apex = [cmbDipoleGalacticDeg.l, cmbDipoleGalacticDeg.b];
  const antapex = [apex[0] - 180, -apex[1]];
  const perpendicular = [apex[0], apex[1] - 90];
  const reply = onFirstUse(() =>
    runPythonReference<{ galactic: number[][]; icrs: number[][] }>("astropy_galactic.py", {
      to_galactic: positions,
      to_icrs: [apex, antapex, perpendicular],
    }),
  );

  test("ICRS → galactic agrees within 3e-5° at six positions", () => {
    positions.forEach(([ra, dec], i) => {
      const g = galacticCoordinatesRad(ra * degree, dec * degree);
      const [l, b] = reply().galactic[i];
      const dl = (((g.l / degree - l + 540) % 360) - 180) * Math.cos(b * degree);
      expect(Math.abs(dl), `l at ${ra}, ${dec}`).toBeLessThanOrEqual(3e-5);
      expect(Math.abs(g.b / degree - b), `b at ${ra}, ${dec}`).toBeLessThanOrEqual(3e-5);
    });
  });

  test("at the apex a source gains β in z, at the antapex it loses β (first order), at 90° only β²/2", () => {
    const [atApex, atAntapex, atRightAngle] = reply().icrs.map(([ra, dec]) => cmbFrameRedshift(0, ra * degree, dec * degree));
    // exact: θ = 0 gives √((1+β)/(1−β)) − 1 = β + β²/2 + …, θ = π the inverse, θ = π/2 gives 1/γ − 1 ≈ −β²/2
    // (relativistic Doppler formula, Rybicki & Lightman 1979 eq. 4.12, from memory)
    expectRelative(atApex, Math.sqrt((1 + beta) / (1 - beta)) - 1, 1e-7, "apex");
    expectRelative(atAntapex, Math.sqrt((1 - beta) / (1 + beta)) - 1, 1e-7, "antapex");
    expect(Math.abs(atApex - beta)).toBeLessThanOrEqual(beta * beta);
    expect(Math.abs(atAntapex + beta)).toBeLessThanOrEqual(beta * beta);
    expect(Math.abs(atRightAngle)).toBeLessThanOrEqual(beta * beta); // no first-order change
    expectRelative(atRightAngle, Math.sqrt(1 - beta * beta) - 1, 1e-3, "90°: −β²/2");
  });

  test("the sheet: degrees by default, a heliocentric z multiplies through as (1+z)", () => {
    const [ra, dec] = reply().icrs[0];
    const zHelio = 0.05;
    const expected = (1 + zHelio) * Math.sqrt((1 + beta) / (1 - beta)) - 1;
    expectRelative(one("REDSHIFT_CMB", zHelio, ra, dec) as number, expected, 1e-7, "apex, deg");
    expectRelative(one("REDSHIFT_CMB", zHelio, ra * degree, dec * degree, "rad") as number, expected, 1e-7, "apex, rad");
  });
});

test("β = v/c of the dipole speed is 0.0012336 (369.82 km/s, Planck 2018 I, from memory)", () => {
  expect(Math.abs(beta - 0.0012336)).toBeLessThanOrEqual(5e-8);
});

test("a declination beyond ±90° is #NUM! quoted in degrees", () => {
  const cell = one("REDSHIFT_CMB", 0.01, 10, 95) as { message: string };
  expect(cell.message).toBe("ZC.REDSHIFT_CMB: dec = 95° is beyond ±90°: a declination is −90° … +90°");
});
