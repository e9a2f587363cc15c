/** Models with closed-form distances and ages (all exact results of the Friedmann equation). */
import { describe, expect, test } from "vitest";
import { Cosmology } from "../core/distances/Cosmology.js";
import { expectRelative } from "./helpers.js";

const base = { w0: -1, wa: 0, Tcmb: 0, Neff: 3.046, mnu: [] as number[] };
const zs = [1e-5, 1e-3, 0.05, 0.3, 1, 2.5, 7, 30, 300, 1e4];
const tol = 1e-12;

describe("Einstein–de Sitter (Om = 1)", () => {
  const m = new Cosmology({ ...base, H0: 70, Om: 1 });
  const dh = m.hubbleDistanceMpc;
  const th = m.hubbleTimeGyr;
  // D_C = 2 D_H (1 − (1+z)^−½), t = (2/3) t_H (1+z)^−3/2 (Hogg 1999 §5 and eq. 30 for Ωm = 1)
  test.each(zs)("z = %d: distances, times and volume", (z) => {
    const dc = 2 * dh * -Math.expm1(-0.5 * Math.log1p(z));
    expectRelative(m.comovingDistanceMpc(z), dc, tol, "D_C");
    expectRelative(m.luminosityDistanceMpc(z), (1 + z) * dc, tol, "D_L");
    expectRelative(m.ageGyr(z), (2 / 3) * th * (1 + z) ** -1.5, tol, "age");
    expectRelative(m.lookbackTimeGyr(z), (2 / 3) * th * -Math.expm1(-1.5 * Math.log1p(z)), tol, "look-back");
    expectRelative(m.comovingVolumeMpc3(z), ((4 * Math.PI) / 3) * dc ** 3, 3 * tol, "volume");
  });
  test("age today is two thirds of the Hubble time (Hogg 1999 §6)", () => {
    expectRelative(m.ageTodayGyr, (2 / 3) * th, tol, "age0");
  });
});

describe("Milne (empty, Om = OL = 0, Ok = 1)", () => {
  const m = new Cosmology({ ...base, H0: 70, Om: 0, OL: 0 });
  const dh = m.hubbleDistanceMpc;
  const th = m.hubbleTimeGyr;
  // a ∝ t: D_C = D_H ln(1+z), D_L = D_H z (1 + z/2), t = t_H/(1+z) (Hogg 1999 eq. 16 with Ωk = 1)
  test.each(zs)("z = %d", (z) => {
    expectRelative(m.comovingDistanceMpc(z), dh * Math.log1p(z), tol, "D_C");
    expectRelative(m.luminosityDistanceMpc(z), dh * z * (1 + z / 2), tol, "D_L");
    expectRelative(m.ageGyr(z), th / (1 + z), tol, "age");
    expectRelative(m.lookbackTimeGyr(z), (th * z) / (1 + z), tol, "look-back");
  });
});

describe("de Sitter (Om = 0, OL = 1)", () => {
  const m = new Cosmology({ ...base, H0: 70, Om: 0, OL: 1 });
  // E = 1: D_C = D_H z, t_L = t_H ln(1+z); no beginning, so the age is infinite (Hogg 1999 §5)
  test.each(zs)("z = %d", (z) => {
    expectRelative(m.comovingDistanceMpc(z), m.hubbleDistanceMpc * z, tol, "D_C");
    expectRelative(m.lookbackTimeGyr(z), m.hubbleTimeGyr * Math.log1p(z), tol, "look-back");
  });
  test("has an infinite age", () => {
    expect(m.ageTodayGyr).toBe(Number.POSITIVE_INFINITY);
    expect(m.ageGyr(1)).toBe(Number.POSITIVE_INFINITY);
  });
});

describe("Mattig relation (Λ = 0, no radiation)", () => {
  // D_L = 2 D_H z (s + Om − 1) / (Om (s + 1)), s = √(1 + Om z) (Mattig 1958; Hogg 1999 eq. 16 ff.,
  // rearranged to avoid cancellation); valid open and closed.
  test.each([
    // Om    geometry
    [0.3, "open"],
    [2, "closed"],
  ])("Om = %d (%s)", (om) => {
    const m = new Cosmology({ ...base, H0: 70, Om: om, OL: 0 });
    for (const z of zs) {
      const s = Math.sqrt(1 + om * z);
      const dl = (2 * m.hubbleDistanceMpc * z * (s + om - 1)) / (om * (s + 1));
      expectRelative(m.luminosityDistanceMpc(z), dl, tol, `z=${z}`);
    }
  });
});

describe("flat ΛCDM age", () => {
  // t(z) = 2 t_H / (3√OL) asinh(√(OL/Om) (1+z)^−3/2) (e.g. Peebles 1993, Principles of Physical Cosmology, eq. 13.20)
  const om = 0.3;
  const m = new Cosmology({ ...base, H0: 70, Om: om });
  const ol = 1 - om;
  test.each([0, ...zs])("z = %d", (z) => {
    const t = ((2 * m.hubbleTimeGyr) / (3 * Math.sqrt(ol))) * Math.asinh(Math.sqrt(ol / om) * (1 + z) ** -1.5);
    expectRelative(m.ageGyr(z), t, tol, "age");
  });
});

describe("flat matter + radiation age", () => {
  // ∫ a da/√(Om a + Or) = 2√(Om a + Or)(Om a − 2 Or)/(3 Om²) + 4 Or^{3/2}/(3 Om²) (elementary integral)
  const or = new Cosmology({ ...base, H0: 70, Om: 0.3, Tcmb: 2.7255 }).Or;
  const m = new Cosmology({ ...base, H0: 70, Om: 1 - or, OL: 0, Tcmb: 2.7255 });
  const om = m.Om;
  test.each([0, ...zs])("z = %d", (z) => {
    const a = 1 / (1 + z);
    const w = om * a + or;
    const t = (m.hubbleTimeGyr * (2 * Math.sqrt(w) * (om * a - 2 * or) + 4 * or ** 1.5)) / (3 * om * om);
    expectRelative(m.ageGyr(z), t, tol, "age");
  });
});
