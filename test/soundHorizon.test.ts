/**
 * SOUND_HORIZON beyond the standard radiation content, and the range where it is given: another Neff
 * or Tcmb moves r_d as the direct integral of the sound speed says (an independent integration,
 * test/reference/sound_horizon_reference.py, Debian python3-mpmath); parameters outside the range are
 * #N/A with the reason; r_d follows ω_b = Ω_b h² and ω_cb, not the fractions.
 */
import { describe, expect, test } from "vitest";
import { Cosmology } from "../core/distances/Cosmology.js";
import { relativeError } from "./helpers.js";
import { referenceAvailable, runPythonReference } from "./reference/python.js";
import { onFirstUse } from "./requirements.js";
import { sheetCalls } from "./sheetCalls.js";

const { num, failure } = sheetCalls("P18-CMB");

/** The drag redshift of Eisenstein & Hu 1998 (ApJ 496, 605) eq. 4, written out (coefficients from memory). */
function dragRedshift(omegaM: number, omegaB: number): number {
  const b1 = 0.313 * omegaM ** -0.419 * (1 + 0.607 * omegaM ** 0.674);
  const b2 = 0.238 * omegaM ** 0.223;
  return ((1291 * omegaM ** 0.251) / (1 + 0.659 * omegaM ** 0.828)) * (1 + b1 * omegaB ** b2);
}

// Planck 2018 VI (A&A 641, A6) Table 2, TT,TE,EE+lowE+lensing: z_drag = 1059.94 (from memory), r_drag = 147.09 ± 0.26 Mpc
const planckDragRedshift = 1059.94;

const cases: [id: string, spec: string][] = [
  ["standard", "P18-CMB"],
  ["Neff=4", "P18-CMB; Neff=4"],
  ["Neff=2.5", "P18-CMB; Neff=2.5"],
  ["Tcmb=2.725", "P18-CMB; Tcmb=2.725"],
  ["Tcmb=2.72", "P18-CMB; Tcmb=2.72"],
  ["Tcmb=2.728", "P18-CMB; Tcmb=2.728"],
  ["Tcmb=2.73", "P18-CMB; Tcmb=2.73"],
];

/**
 * The drag redshift of a model with another CMB temperature: recombination and drag happen at a fixed
 * photon temperature T0 (1 + z_d), so 1 + z_d scales as 1/Tcmb from its value at 2.7255 K (common practice).
 */
const movedWithTcmb = (zd: number, m: Cosmology) => ((1 + zd) * 2.7255) / m.Tcmb - 1;

describe.runIf(referenceAvailable("mpmath", "python3-mpmath"))("against the direct integral of the sound speed (test/reference/sound_horizon_reference.py)", () => {
  const request = (zdOf: (m: Cosmology) => number) =>
    cases.map(([id, spec]) => {
      const m = Cosmology.fromSpec(spec);
      const p = m.parameters;
      return { id, H0: p.H0, Om: p.Om, Ob: p.Ob, Tcmb: p.Tcmb, Neff: p.Neff, mnu: p.mnu, zd: movedWithTcmb(zdOf(m), m) };
    });
  const p18 = Cosmology.fromSpec("P18-CMB");
  const omegaM = p18.Om * p18.h ** 2;
  const omegaB = p18.Ob * p18.h ** 2;
  const atEH98 = onFirstUse(() => runPythonReference<Record<string, number>>("sound_horizon_reference.py", { cases: request(() => dragRedshift(omegaM, omegaB)) }));
  const atPlanck = onFirstUse(() => runPythonReference<Record<string, number>>("sound_horizon_reference.py", { cases: request(() => planckDragRedshift) }));

  test("the fit for P18-CMB is within 0.03% of the direct integral to Planck 2018's z_drag, which is within 0.01% of Planck's r_drag", () => {
    const direct = atPlanck().standard;
    expect(relativeError(num("SOUND_HORIZON", "P18-CMB"), direct)).toBeLessThan(3e-4); // measured 2.1e-4
    expect(relativeError(direct, 147.09)).toBeLessThan(1e-4); // 147.080 against 147.09 ± 0.26
  });

  test.each([
    // case        | change the direct integral gives (issue 28: Neff = 4 about −3.0%; Tcmb: the review's
    //             | estimate with Planck's z_drag moved as 1/Tcmb: −0.009%, +0.004%, +0.007%)
    ["Neff=4",      -0.030],
    ["Neff=2.5",    +0.018],
    ["Tcmb=2.725",  -0.00001],
    ["Tcmb=2.72",   -0.00009],
    ["Tcmb=2.728",  +0.00004],
    ["Tcmb=2.73",   +0.00007],
  ])("%s changes r_d by the ratio of the direct integrals, each to its drag redshift (moved as 1/Tcmb), to 1e-7; about %d", (id, about) => {
    const spec = cases.find(([name]) => name === id)![1];
    const ratio = num("SOUND_HORIZON", spec) / num("SOUND_HORIZON", "P18-CMB");
    const expected = atEH98()[id] / atEH98().standard;
    expect(Math.abs(ratio - expected)).toBeLessThan(1e-7);
    expect(Math.abs(ratio - 1 - about)).toBeLessThan(Math.max(0.1 * Math.abs(about), 5e-5));
    // the drag redshift chosen matters little for the ratio: Planck's own gives the same to 5e-4 (measured 3.9e-4 for Neff = 4)
    expect(Math.abs(atPlanck()[id] / atPlanck().standard - expected)).toBeLessThan(5e-4);
  });
});

describe("SOUND_HORIZON follows ω_b = Ω_b h² and ω_cb", () => {
  test('"P18-CMB; H0=73" keeps the fractions Ωb, Ωm and has r_d 5.97% smaller: the fit of Aubourg et al. 2015 eq. 16 written out', () => {
    const fit = (h: number) => {
      const m = Cosmology.fromSpec("P18-CMB");
      const omegaNu = 0.06 / 93.14; // Σm_ν / 93.14 eV (common practice)
      return (55.154 * Math.exp(-72.3 * (omegaNu + 0.0006) ** 2)) / ((m.Om * h * h - omegaNu) ** 0.25351 * (m.Ob * h * h) ** 0.12807);
    };
    const ratio = num("SOUND_HORIZON", "P18-CMB; H0=73") / num("SOUND_HORIZON", "P18-CMB");
    expect(relativeError(ratio, fit(0.73) / fit(0.6736))).toBeLessThan(1e-13);
    expect(ratio - 1).toBeCloseTo(-0.0597, 4);
  });
});

describe("outside the range where r_d is given: #N/A with the reason", () => {
  test.each([
    ["P18-CMB; Ob=0.3", "ω_b = Ob h² = 0.136 is outside 0.015 … 0.03, where r_d is given (Ob is a fraction of the critical density: 0.049 in P18-CMB)"],
    ["P18-CMB; Tcmb=2.6", "Tcmb = 2.6 K is outside 2.72 … 2.73 K, where r_d is given: the measured CMB temperature (the drag epoch moves with it)"],
    ["P18-CMB; Neff=6", "Neff = 6 is outside 2 … 5, where r_d is given"],
    ["P18-CMB; mnu=0.6,0.6,0.6", "Σm_ν = 1.8 eV is outside 0 … 1 eV, where r_d is given"],
    ["P18-CMB; Om=0.6", "ω_cb = (Om − Ω_ν) h² = 0.272 is outside 0.08 … 0.22, where r_d is given"],
    ["H0=70; Om=0.3; Ob=0.045", "the sound horizon needs the CMB photons: give Tcmb=2.7255 in the model (a spec without a preset has no radiation)"],
  ])("%s", (spec, reason) => {
    const cell = failure("SOUND_HORIZON", spec);
    expect(cell.kind).toBe("na");
    expect(cell.message).toBe(`ZC.SOUND_HORIZON: ${reason}`);
  });

  test("P18-CMB at fixed fractions is inside the range for H0 from 55.16 to 78.00: ω_b = Ob h² reaches 0.015 and 0.03 there", () => {
    // h = √(ω_b / Ob) with Ob = 0.02237 / 0.6736² (Planck 2018 VI Table 2, the preset's ω_b and h)
    const ob = 0.02237 / 0.6736 ** 2;
    const [low, high] = [100 * Math.sqrt(0.015 / ob), 100 * Math.sqrt(0.03 / ob)];
    expect(low).toBeCloseTo(55.159, 3);
    expect(high).toBeCloseTo(78.006, 3);
    for (const h0 of [55.16, 67.36, 78]) expect(num("SOUND_HORIZON", `P18-CMB; H0=${h0}`), `H0 = ${h0}`).toBeGreaterThan(100);
    for (const h0 of [55, 55.15, 78.01]) expect(failure("SOUND_HORIZON", `P18-CMB; H0=${h0}`).kind, `H0 = ${h0}`).toBe("na");
  });

  test("every preset with Ob is inside the range", () => {
    for (const preset of ["P18-CMB", "P18-BAO", "P15-EXT", "W9-ALL", "W7-BAO", "DR2-CMB", "DR2-CMB-PP", "DR2-CMB-U3", "DR2-CMB-DY5"]) {
      expect(num("SOUND_HORIZON", preset), preset).toBeGreaterThan(140);
    }
  });
});
