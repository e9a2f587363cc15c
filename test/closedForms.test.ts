/** Models with closed-form distances and ages (all exact results of the Friedmann equation). */
import { describe, expect, test } from "vitest";
import { Cosmology } from "../core/distances/Cosmology.js";
import { comovingDistanceSlopeMpc, luminosityDistanceSlopeMpc } from "../core/distances/distanceSlopes.js";
import { expectRelative, freshModel } from "./helpers.js";
import { tanhSinh } from "./reference/slowCosmology.js";

const base = { w0: -1, wa: 0, Tcmb: 0, Neff: 3.046, mnu: [] as number[] };
// below the tables' direct integrals (1e-5), inside them, and beyond their end at z = 1e8
const zs = [1e-5, 1e-3, 0.05, 0.3, 1, 2.5, 7, 30, 300, 1e4, 1e7, 1e9, 1e12];
const tol = 1e-12;

describe("Einstein–de Sitter (Om = 1)", () => {
  const m = freshModel(() => new Cosmology({ ...base, H0: 70, Om: 1 }));
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
    expectRelative(m.comovingVolumeShellMpc3(0, z), ((4 * Math.PI) / 3) * dc ** 3, 3 * tol, "shell from 0, whole sky by default");
    // dD_C/dz = D_H / E = D_H (1+z)^−3/2; dD_L/dz = D_H (2 − (1+z)^−½) (the derivatives of the above)
    expectRelative(comovingDistanceSlopeMpc(m, z), dh * (1 + z) ** -1.5, tol, "dD_C/dz");
    expectRelative(luminosityDistanceSlopeMpc(m, z), dh * (2 - (1 + z) ** -0.5), tol, "dD_L/dz");
  });
  test("age today is two thirds of the Hubble time (Hogg 1999 §6)", () => {
    expectRelative(m.ageTodayGyr, (2 / 3) * th, tol, "age0");
  });
});

describe("Milne (empty, Om = OL = 0, Ok = 1)", () => {
  const m = freshModel(() => new Cosmology({ ...base, H0: 70, Om: 0, OL: 0 }));
  const dh = m.hubbleDistanceMpc;
  const th = m.hubbleTimeGyr;
  // a ∝ t: D_C = D_H ln(1+z), D_L = D_H z (1 + z/2), t = t_H/(1+z) (Hogg 1999 eq. 16 with Ωk = 1)
  test.each(zs)("z = %d", (z) => {
    expectRelative(m.comovingDistanceMpc(z), dh * Math.log1p(z), tol, "D_C");
    expectRelative(m.luminosityDistanceMpc(z), dh * z * (1 + z / 2), tol, "D_L");
    expectRelative(m.ageGyr(z), th / (1 + z), tol, "age");
    expectRelative(m.lookbackTimeGyr(z), (th * z) / (1 + z), tol, "look-back");
    expectRelative(comovingDistanceSlopeMpc(m, z), dh / (1 + z), tol, "dD_C/dz = D_H/(1+z)");
    // V = 4π D_H³ ∫₀^χ sinh² x dx = π D_H³ (sinh 2χ − 2χ), χ = ln(1+z) (Hogg 1999 eq. 29 with Ωk = 1);
    // sinh y − y summed as its Taylor series Σ y^(2k+1)/(2k+1)! below y = 1, where the difference cancels
    const y = 2 * Math.log1p(z);
    let sinhMinusY = Math.sinh(y) - y;
    if (y < 1) {
      sinhMinusY = 0;
      for (let k = 1, term = y; k < 20; k++) sinhMinusY += (term *= (y * y) / ((2 * k) * (2 * k + 1)));
    }
    expectRelative(m.comovingVolumeMpc3(z), Math.PI * dh ** 3 * sinhMinusY, 3 * tol, "volume");
  });
});

describe("a dark-energy equation of state without dark energy (OL = 0) changes nothing", () => {
  // Milne again, with w0 = 100: (1+z)^{3(1+w0)} overflows, but OL = 0 multiplies nothing (Hogg 1999 eq. 16, Ωk = 1)
  const m = freshModel(() => new Cosmology({ ...base, H0: 70, Om: 0, OL: 0, w0: 100 }));
  test.each(zs)("z = %d", (z) => {
    expectRelative(m.comovingDistanceMpc(z), m.hubbleDistanceMpc * Math.log1p(z), tol, "D_C");
    expectRelative(m.ageGyr(z), m.hubbleTimeGyr / (1 + z), tol, "age");
  });
  test("without radiation there is no matter–radiation equality (z_eq = ∞), also without matter", () => {
    expect(m.equalityRedshift).toBe(Number.POSITIVE_INFINITY);
    expect(new Cosmology({ ...base, H0: 70, Om: 1 }).equalityRedshift).toBe(Number.POSITIVE_INFINITY);
  });
});

describe("de Sitter (Om = 0, OL = 1)", () => {
  const m = freshModel(() => new Cosmology({ ...base, H0: 70, Om: 0, OL: 1 }));
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
  const m = freshModel(() => new Cosmology({ ...base, H0: 70, Om: om }));
  const ol = 1 - om;
  test.each([0, ...zs])("z = %d", (z) => {
    const t = ((2 * m.hubbleTimeGyr) / (3 * Math.sqrt(ol))) * Math.asinh(Math.sqrt(ol / om) * (1 + z) ** -1.5);
    expectRelative(m.ageGyr(z), t, tol, "age");
  });
});

describe("flat matter + radiation age", () => {
  // ∫ a da/√(Om a + Or) = 2√(Om a + Or)(Om a − 2 Or)/(3 Om²) + 4 Or^{3/2}/(3 Om²) (elementary integral);
  // with s = √(Om a + Or), r = √Or the numerator is 2(s − r)²(s + 2r) and s − r = Om a/(s + r), so
  // t = t_H · 2a²(s + 2r) / (3(s + r)²): the same value without the cancellation at high z
  const or = new Cosmology({ ...base, H0: 70, Om: 0.3, Tcmb: 2.7255 }).Or;
  const m = freshModel(() => new Cosmology({ ...base, H0: 70, Om: 1 - or, OL: 0, Tcmb: 2.7255 }));
  const om = m.Om;
  test.each([0, ...zs])("z = %d", (z) => {
    const a = 1 / (1 + z);
    const [s, r] = [Math.sqrt(om * a + or), Math.sqrt(or)];
    const t = (m.hubbleTimeGyr * 2 * a * a * (s + 2 * r)) / (3 * (s + r) ** 2);
    expectRelative(m.ageGyr(z), t, tol, "age");
  });
});

describe("dark energy alone with a constant w (Om = 0, OL = 1)", () => {
  // E = (1+z)^p with p = 3(1+w)/2 (the Friedmann equation with ρ ∝ a^{−3(1+w)}), so
  // D_C = D_H ((1+z)^{1−p} − 1)/(1 − p), t_L = t_H (1 − (1+z)^{−p})/p, t = t_H (1+z)^{−p}/p (elementary integrals)
  test.each([
    // w       p = 3(1+w)/2
    [-0.5,     0.75],
    [-0.8,     0.3],
    [0,        1.5],
  ])("w = %d", (w, p) => {
    const m = new Cosmology({ ...base, H0: 70, Om: 0, OL: 1, w0: w });
    const [dh, th] = [m.hubbleDistanceMpc, m.hubbleTimeGyr];
    for (const z of zs) {
      const u = Math.log1p(z);
      expectRelative(m.expansionRate(z), Math.exp(p * u), tol, `E(${z})`);
      expectRelative(m.comovingDistanceMpc(z), (dh * Math.expm1((1 - p) * u)) / (1 - p), tol, `D_C(${z})`);
      expectRelative(m.lookbackTimeGyr(z), (th * -Math.expm1(-p * u)) / p, tol, `t_L(${z})`);
      expectRelative(m.ageGyr(z), (th * Math.exp(-p * u)) / p, tol, `age(${z})`);
    }
    expectRelative(m.ageTodayGyr, th / p, tol, "age today");
  });
});

describe("dark energy alone with w0–wa (CPL: w = w0 + wa (1 − a))", () => {
  // ρ_DE/ρ_DE,0 = a^{−3(1+w0+wa)} exp(−3 wa (1 − a)) (Chevallier & Polarski 2001; Linder 2003 eq. 3),
  // so E(z) is closed; D_C = D_H ∫ dz/E is checked against the independent tanh-sinh quadrature of
  // that E (test/reference/slowCosmology.ts), not against the engine's own tables.
  const [w0, wa] = [-0.9, 0.4];
  const m = freshModel(() => new Cosmology({ ...base, H0: 70, Om: 0, OL: 1, w0, wa }));
  const e = (z: number) => Math.sqrt((1 + z) ** (3 * (1 + w0 + wa)) * Math.exp((-3 * wa * z) / (1 + z)));
  test.each(zs.filter((z) => z <= 300))("z = %d", (z) => {
    expectRelative(m.expansionRate(z), e(z), tol, "E");
    expectRelative(m.comovingDistanceMpc(z), m.hubbleDistanceMpc * tanhSinh((x) => 1 / e(x), 0, z, 1e-14), 1e-11, "D_C");
    expectRelative(m.lookbackTimeGyr(z), m.hubbleTimeGyr * tanhSinh((x) => 1 / ((1 + x) * e(x)), 0, z, 1e-14), 1e-11, "t_L");
  });
});
