/**
 * RESCALE of values quoted in h-scaled units (h⁻¹ Mpc, h³ Mpc⁻³, h⁻² L☉): each model's own h restates
 * the value in physical units and back. Expected values from the reference library (Debian
 * python3-astropy): its distances and volume element under each model, and h = H0/100.
 */
import { describe, expect, test } from "vitest";
import { Cosmology } from "../core/distances/Cosmology.js";
import { relativeError } from "./helpers.js";
import { referenceAvailable, runPythonReference } from "./reference/python.js";
import { onFirstUse } from "./requirements.js";
import { sheetCalls } from "./sheetCalls.js";

const { num, failure } = sheetCalls("P18-CMB");
const [from, to, z] = ["CONCORDANCE", "P18-CMB", 0.5];

type Reply = { results: Record<string, { transverseComovingDistanceMpc: number[]; luminosityDistanceMpc: number[]; comovingVolumeElementMpc3Sr: number[] }> };

describe.runIf(referenceAvailable("astropy", "python3-astropy"))("h-scaled units against the reference library (python3-astropy)", () => {
  const reply = onFirstUse(() =>
    runPythonReference<Reply>("astropy_reference.py", {
      cases: [from, to].map((spec) => {
        const m = Cosmology.fromSpec(spec);
        const p = m.parameters;
        // astropy's Om0 leaves out massive neutrinos; ours holds them
        return { id: spec, H0: p.H0, Om0: p.Om - m.OnuMassive, Ode0: null, w0: p.w0, wa: p.wa, Tcmb0: p.Tcmb, Neff: p.Neff, m_nu: [0, 1, 2].map((i) => p.mnu[i] ?? 0), z: [z] };
      }),
    }),
  );
  const hFrom = 0.7; // CONCORDANCE: H0 = 70
  const hTo = 0.6736; // P18-CMB: H0 = 67.36 (Planck 2018 VI Table 2)

  test("1000 h⁻¹ Mpc at z = 0.5 from CONCORDANCE is 994.71 h⁻¹ Mpc under P18-CMB (issue 28), as astropy's D_M h ratio says (rel ≤ 2e-5: astropy fits the neutrino density)", () => {
    const r = reply().results;
    const expected = (1000 * (r[to].transverseComovingDistanceMpc[0] * hTo)) / (r[from].transverseComovingDistanceMpc[0] * hFrom);
    const got = num("RESCALE", 1000, z, "distance", from, to, "Mpc/h");
    expect(relativeError(got, expected)).toBeLessThan(2e-5);
    expect(got).toBeCloseTo(994.71, 2);
    // the same in the other spellings of h⁻¹ Mpc
    expect(num("RESCALE", 1000, z, "distance", from, to, "h-1 Mpc")).toBe(got);
    expect(num("RESCALE", 1000, z, "distance", from, to, "Mpc h-1")).toBe(got);
  });

  test("a number density in h³ Mpc⁻³: × (h_from/h_to)³ (dV/dz)_from/(dV/dz)_to, from astropy's volume elements (rel ≤ 5e-5)", () => {
    const r = reply().results;
    const expected = 3e-3 * (hFrom / hTo) ** 3 * (r[from].comovingVolumeElementMpc3Sr[0] / r[to].comovingVolumeElementMpc3Sr[0]);
    expect(relativeError(num("RESCALE", 3e-3, z, "density", from, to, "h3 Mpc-3"), expected)).toBeLessThan(5e-5);
  });

  test("a luminosity in h⁻² L☉: × (h_to/h_from)² (D_L,to/D_L,from)², from astropy's luminosity distances (rel ≤ 4e-5)", () => {
    const r = reply().results;
    const expected = 1e10 * (hTo / hFrom) ** 2 * (r[to].luminosityDistanceMpc[0] / r[from].luminosityDistanceMpc[0]) ** 2;
    expect(relativeError(num("RESCALE", 1e10, z, "luminosity", from, to, "h-2 Lsun"), expected)).toBeLessThan(4e-5);
  });
});

describe("RESCALE's unit argument", () => {
  test("h-scaled values are unchanged when only H0 changes: D_M h, n/h³ and L h² do not depend on H0 (no radiation: common practice)", () => {
    expect(relativeError(num("RESCALE", 1000, 1.3, "distance", "H0=70; Om=0.3", "H0=50; Om=0.3", "Mpc/h"), 1000)).toBeLessThan(1e-13);
    expect(relativeError(num("RESCALE", 2e-4, 1.3, "density", "H0=70; Om=0.3", "H0=50; Om=0.3", "h3 Mpc-3"), 2e-4)).toBeLessThan(1e-13);
    expect(relativeError(num("RESCALE", 5e9, 1.3, "luminosity", "H0=70; Om=0.3", "H0=50; Om=0.3", "h-2 Lsun"), 5e9)).toBeLessThan(1e-13);
  });

  test("a unit without h, or blank, rescales as before; so does a magnitude with blank or mag", () => {
    for (const [quantity, value, unit] of [["distance", 1000, "Mpc"], ["luminosity", 1e44, "erg/s"], ["size", 12, "kpc"], ["density", 1e-3, "Mpc-3"], ["magnitude", -21, "mag"]] as const) {
      expect(num("RESCALE", value, z, quantity, from, to, unit), `${quantity} in ${unit}`).toBe(num("RESCALE", value, z, quantity, from, to));
      expect(num("RESCALE", value, z, quantity, from, to, "")).toBe(num("RESCALE", value, z, quantity, from, to));
    }
  });

  test.each([
    ["density", "h-3 Mpc3", 'ZC.RESCALE: unit "h-3 Mpc3" does not measure a number per volume, as a density needs (e.g. "h3 Mpc-3")'],
    ["luminosity", "h-2 erg/s", 'ZC.RESCALE: unit "h-2 erg/s" does not measure a luminosity (power, or power per Hz), as a luminosity needs; h next to units without pc or a solar unit is the hour: write e.g. "h-2 Lsun"'],
    ["distance", "Msun", 'ZC.RESCALE: unit "Msun" does not measure a length, as a distance needs (e.g. "Mpc/h")'],
    ["magnitude", "h-2 Lsun", 'ZC.RESCALE: a magnitude takes no unit (got "h-2 Lsun"); for M − 5 log10 h add 5 log10 h of from_model first'],
  ])("%s in %s is #VALUE! with the reason", (quantity, unit, message) => {
    const cell = failure("RESCALE", 1, z, quantity, from, to, unit);
    expect(cell.kind).toBe("value");
    expect(cell.message).toBe(message);
  });
});
