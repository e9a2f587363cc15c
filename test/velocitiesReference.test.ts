/**
 * Velocities and the rest frame against outside references, which start Python (left out of the
 * mutation runs, as test/astropy.test.ts is): the three Doppler conventions against a 40-digit
 * evaluation of their definitions (python3-mpmath), and against the reference library's Doppler
 * equivalencies and SpectralCoord (python3-astropy), to 1e-12.
 */
import { describe, expect, test } from "vitest";
import { dopplerConventions, observedFrameValue, redshiftOfVelocity, restFrameValue, speedOfLightKmPerS, velocityKmPerS } from "../core/index.js";
import { logRedshifts, relativeError } from "./helpers.js";
import { referenceAvailable, runPythonReference } from "./reference/python.js";
import { onFirstUse } from "./requirements.js";

const c = speedOfLightKmPerS; // 299792.458 km/s, exact (SI 2019)

describe.runIf(referenceAvailable("mpmath", "python3-mpmath"))("against the definitions at 40 digits (python3-mpmath)", () => {
  const zs = [...logRedshifts(-9, 4, 4), -1e-9, -1e-4, -0.3, -0.9, -0.999];
  const vs = [1e-6, 0.03, 30, 3000, 1e5, 2.9e5, 299792.4, -1e-6, -3000, -2.9e5];
  const reply = onFirstUse(() =>
    runPythonReference<{ velocity: Record<string, number[]>; redshift: Record<string, number[]> }>("mpmath_doppler.py", { z: zs, v: vs }),
  );

  test("VELOCITY and Z_FROM_VELOCITY keep full precision from z = 1e-9 to 1e4 (relative ≤ 2e-15)", () => {
    let worst = 0;
    for (const k of dopplerConventions) {
      zs.forEach((z, i) => {
        const e = relativeError(velocityKmPerS(z, k), reply().velocity[k][i]);
        worst = Math.max(worst, e);
        expect(e, `v(${z}, ${k})`).toBeLessThanOrEqual(2e-15);
      });
      vs.forEach((v, i) => {
        if (k === "optical" && v <= -c) return;
        const e = relativeError(redshiftOfVelocity(v, k), reply().redshift[k][i]);
        worst = Math.max(worst, e);
        expect(e, `z(${v}, ${k})`).toBeLessThanOrEqual(2e-15);
      });
    }
    console.log(`Doppler conventions vs mpmath (40 digits): worst relative error ${worst.toExponential(1)}`);
  });
});

describe.runIf(referenceAvailable("astropy", "python3-astropy"))("against the reference library (python3-astropy: doppler_optical, doppler_radio, doppler_relativistic, doppler_redshift, SpectralCoord)", () => {
  // |z| ≥ 1e-3: astropy works from the wavelength 1 + z, whose last bit is 1e-16/z of z
  const snap = (z: number) => 1 + z - 1; // 1 + z exact in binary, so both sides see the same z
  const zs = [...logRedshifts(-3, 3, 8), -1e-3, -0.01, -0.1, -0.5, -0.9].map(snap);
  const vs = [300, 3000, 3e4, 1e5, 2e5, 2.9e5, -300, -3e4, -2e5];
  // SpectralCoord goes from z to a velocity and back, which keeps 1e-12 only to z ≈ 10 (1 − β = 2/(1 + (1+z)²))
  const values: [number, number, "wavelength" | "frequency"][] = zs
    .filter((z) => z > -0.95 && z <= 10)
    .flatMap((z, i) => [[1000 + 937 * i, z, "wavelength"], [0.15 + 1.7 * i, z, "frequency"]] as [number, number, "wavelength" | "frequency"][]);
  const reply = onFirstUse(() =>
    runPythonReference<{ to_velocity: number[]; to_redshift: number[]; redshift_equivalency: number[]; rest: number[]; observed: number[] }>("astropy_doppler.py", {
      to_velocity: dopplerConventions.flatMap((k) => zs.map((z) => [z, k])),
      to_redshift: dopplerConventions.flatMap((k) => vs.map((v) => [v, k])),
      redshift_equivalency: zs,
      rest: values,
      observed: values,
    }),
  );
  const worst: Record<string, number> = {};
  const check = (label: string, ours: number, theirs: number, tolerance: number) => {
    const e = relativeError(ours, theirs);
    worst[label] = Math.max(worst[label] ?? 0, e);
    expect(e, `${label}: ${ours} vs ${theirs}`).toBeLessThanOrEqual(tolerance);
  };

  test("VELOCITY matches the three equivalencies and doppler_redshift within 1e-12 (z from −0.9 to 1000)", () => {
    dopplerConventions.forEach((k, j) => zs.forEach((z, i) => check(`VELOCITY ${k}`, velocityKmPerS(z, k), reply().to_velocity[j * zs.length + i], 1e-12)));
    zs.forEach((z, i) => check("VELOCITY relativistic vs doppler_redshift", velocityKmPerS(z, "relativistic"), reply().redshift_equivalency[i], 1e-12));
    console.log(`astropy Doppler, velocities: ${JSON.stringify(worst)}`);
  });

  test("Z_FROM_VELOCITY matches the equivalencies within 1e-12 (|v| from 300 km/s to 0.97 c)", () => {
    dopplerConventions.forEach((k, j) =>
      vs.forEach((v, i) => {
        if (k === "radio" && v <= -2e5) return; // the radio convention's z = v/(c − v) is fine there, but astropy's wavelength 1 + z loses it: not a test of ours
        check(`Z_FROM_VELOCITY ${k}`, redshiftOfVelocity(v, k), reply().to_redshift[j * vs.length + i], 1e-12);
      }),
    );
    console.log(`astropy Doppler, redshifts: ${JSON.stringify(worst)}`);
  });

  test("REST_FRAME and OBSERVED_FRAME match SpectralCoord.to_rest and with_radial_velocity_shift within 1e-12", () => {
    values.forEach(([x, z, kind], i) => {
      check(`REST_FRAME ${kind}`, restFrameValue(x, z, kind), reply().rest[i], 1e-12);
      check(`OBSERVED_FRAME ${kind}`, observedFrameValue(x, z, kind), reply().observed[i], 1e-12);
    });
    console.log(`astropy SpectralCoord: ${JSON.stringify(worst)}`);
  });
});
