/**
 * The sound horizon r_d of a model whose radiation is not the fit's (Neff ≠ 3.046 or Tcmb ≠ 2.7255 K):
 * the fit of Aubourg et al. 2015 times the ratio of two direct integrals of the sound speed, each to its
 * own drag redshift. The ratios below were computed once with test/reference/sound_horizon_reference.py
 * (Debian python3-mpmath 1.2.1, mpmath.quad, sharing no code with zcell) and pasted here, so these checks
 * run without Python (the reference test in soundHorizon.test.ts recomputes them when Python is there).
 * Also: the edges of the range where r_d is given, the message for a model without Ob, and how many
 * expansion-rate evaluations a value costs (the standard radiation needs no integral; a model's r_d is
 * computed once).
 */
import { afterEach, describe, expect, test, vi } from "vitest";
import { Cosmology } from "../core/distances/Cosmology.js";
import { soundHorizonDragMpc } from "../core/distances/baoScales.js";
import { ExpansionRate } from "../core/model/ExpansionRate.js";
import { NoSolutionError } from "../core/checks/NoSolutionError.js";

/** Aubourg et al. 2015 (PRD 92, 123516) eq. 16, written out (coefficients from memory); ω_ν = Σm_ν / 93.14 eV (common practice). */
function aubourgFitMpc(m: Cosmology): number {
  const h2 = m.h * m.h;
  const omegaNu = m.mnuTotalEv / 93.14;
  return (55.154 * Math.exp(-72.3 * (omegaNu + 0.0006) ** 2)) / ((m.Om * h2 - omegaNu) ** 0.25351 * (m.Ob * h2) ** 0.12807);
}

/**
 * r_s(model, z_d moved as 1/Tcmb) / r_s(same model with Neff = 3.046, Tcmb = 2.7255 K, z_d), z_d of
 * Eisenstein & Hu 1998 eq. 4 for ω_m, ω_b of the model: mpmath 1.2.1,
 * `sound_horizon_reference.py` on {H0, Om, Ob, Tcmb, Neff, mnu, zd} of each model and of its standard twin.
 */
const directIntegralRatios: [spec: string, ratio: number][] = [
  // spec                          | ratio (mpmath 1.2.1, sound_horizon_reference.py)
  ["P18-CMB; Neff=4",                0.970271421711],
  ["P18-CMB; Neff=2.5",              1.018553053098],
  ["P18-CMB; Tcmb=2.72",             0.999872516728],
  ["P18-CMB; Tcmb=2.73",             1.000100056682],
  ["P18-CMB; Neff=4; Tcmb=2.72",     0.970207889476],
  ["W9-ALL; Neff=3.5",               0.985115746606], // W9-ALL has Tcmb = 2.725 K: both corrections at once
];
const ratioTolerance = 1e-9; // measured agreement ≤ 2.2e-11

describe("another radiation content moves r_d by the ratio of the direct sound-horizon integrals", () => {
  test.each(directIntegralRatios)("%s: r_d / fit = %d to 1e-9", (spec, ratio) => {
    const m = Cosmology.fromSpec(spec);
    expect(Math.abs(soundHorizonDragMpc(m) / aubourgFitMpc(m) - ratio)).toBeLessThan(ratioTolerance);
  });

  test("the standard radiation content (Neff = 3.046, Tcmb = 2.7255 K) gives the fit itself", () => {
    const m = Cosmology.fromSpec("P18-CMB");
    expect(soundHorizonDragMpc(m)).toBe(aubourgFitMpc(m));
  });

  test("Tcmb = 2.73 K, the upper end of the range, is inside it (the ends belong to the range)", () => {
    const m = Cosmology.fromSpec("P18-CMB; Tcmb=2.73");
    expect(soundHorizonDragMpc(m)).toBeGreaterThan(140);
    expect(soundHorizonDragMpc(Cosmology.fromSpec("P18-CMB; Tcmb=2.72"))).toBeGreaterThan(140);
  });
});

describe("a model without the baryon density", () => {
  test("is refused with the reason and an example of how to give Ob (the message zcell shows, pinned as the interface)", () => {
    const m = Cosmology.fromSpec("H0=70; Om=0.3; OL=0.7; Tcmb=2.7255");
    expect(() => soundHorizonDragMpc(m)).toThrow(NoSolutionError);
    expect(() => soundHorizonDragMpc(m)).toThrow(
      new NoSolutionError("the sound horizon needs the baryon density: give Ob in the model (e.g. P18-CMB; Ob=0.049)"),
    );
  });
});

describe("what r_d costs (evaluations of the expansion rate E², counted)", () => {
  afterEach(() => vi.restoreAllMocks());

  test("the standard radiation content needs no integral: 0 evaluations", () => {
    const m = Cosmology.fromSpec("P18-CMB; H0=70");
    const e2 = vi.spyOn(ExpansionRate.prototype, "e2");
    soundHorizonDragMpc(m);
    expect(e2).toHaveBeenCalledTimes(0);
  });

  test("another radiation content integrates once per model: a second value of the same model costs 0 evaluations", () => {
    const m = Cosmology.fromSpec("P18-CMB; Neff=3.7");
    const e2 = vi.spyOn(ExpansionRate.prototype, "e2");
    const first = soundHorizonDragMpc(m);
    expect(e2.mock.calls.length).toBeGreaterThan(100); // two adaptive integrals
    e2.mockClear();
    expect(soundHorizonDragMpc(m)).toBe(first);
    expect(e2).toHaveBeenCalledTimes(0);
  });
});
