/**
 * The compiled model near z = 0 and at the edges of its arguments: the look-back time of nearby sources
 * to rounding (Einstein–de Sitter closed form), what a distance costs in evaluations of E² (the table
 * once it covers z, one 15-point panel near z = 0), sky areas and angles outside their ranges, and an
 * angle behind the antipode of a closed model.
 */
import { afterEach, describe, expect, test, vi } from "vitest";
import fc from "fast-check";
import { Cosmology } from "../core/distances/Cosmology.js";
import { relativeError } from "./helpers.js";

const eds = Cosmology.fromSpec("EDS"); // H0 = 70, Ωm = 1

/** Einstein–de Sitter look-back time (2/3) t_H (1 − (1+z)^−3/2) (closed form, Hogg 1999 eq. 30), written without cancellation. */
const edsLookbackGyr = (z: number) => (2 / 3) * eds.hubbleTimeGyr * -Math.expm1(-1.5 * Math.log1p(z));

describe("look-back time and light-travel distance of nearby sources, to rounding", () => {
  test.each([
    // z      | closed form (EdS): (2/3) t_H (1 − (1+z)^−3/2), relative tolerance 1e-14
    [1e-3],
    [0.01],
    [0.03],
    [0.06],
  ])("EdS at z = %d: the closed form to 1e-14", (z) => {
    expect(relativeError(eds.lookbackTimeGyr(z), edsLookbackGyr(z))).toBeLessThan(1e-14);
    expect(relativeError(eds.lightTravelDistanceMpc(z), eds.hubbleDistanceMpc * (edsLookbackGyr(z) / eds.hubbleTimeGyr))).toBeLessThan(1e-14);
  });

  test("for every z below e^(1/16) − 1 (where one quadrature panel is used) the look-back time meets the closed form to 1e-14", () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-6, max: Math.expm1(1 / 16), noNaN: true }), (z) => relativeError(eds.lookbackTimeGyr(z), edsLookbackGyr(z)) < 1e-14),
    );
  });
});

describe("what a distance costs: evaluations of E², counted on a freshly loaded model module", () => {
  afterEach(() => vi.restoreAllMocks());

  /** The model module and its expansion rate loaded inside the test, with E² counted. */
  async function freshCounted(spec: string) {
    vi.resetModules();
    const { Cosmology: FreshCosmology } = await import("../core/distances/Cosmology.js");
    const { ExpansionRate } = await import("../core/model/ExpansionRate.js");
    const model = FreshCosmology.fromSpec(spec);
    return { model, e2: vi.spyOn(ExpansionRate.prototype, "e2") };
  }

  test("inside the table (z = 1 after z = 3 grew it): 0 evaluations for D_C, D_L, the look-back time", async () => {
    const { model, e2 } = await freshCounted("P18-CMB");
    model.comovingDistanceMpc(3);
    model.lookbackTimeGyr(3);
    e2.mockClear();
    model.comovingDistanceMpc(1);
    model.luminosityDistanceMpc(1.5);
    model.lookbackTimeGyr(1);
    expect(e2).toHaveBeenCalledTimes(0);
  });

  test("below u = ln(1+z) = 1/16: one 15-point panel, 15 evaluations for D_C and 15 for the look-back time", async () => {
    const { model, e2 } = await freshCounted("P18-CMB");
    model.comovingDistanceMpc(3);
    e2.mockClear();
    model.comovingDistanceMpc(0.01);
    expect(e2).toHaveBeenCalledTimes(15);
    e2.mockClear();
    model.lookbackTimeGyr(0.01);
    expect(e2).toHaveBeenCalledTimes(15);
  });

  test.each([
    // model                  | why
    ["P18-CMB",                "flat: D_A peaks at z ≈ 1.59"],
    ["H0=70; Om=2; OL=2.5",   "closed: D_L and D_A both read S_k' = cos"],
  ])("%s (%s): redshift from D_L and D_A inside the table, and D_A's maximum, cost 0 evaluations (values and slopes read from the table)", async (spec) => {
    const { model, e2 } = await freshCounted(spec);
    model.comovingDistanceMpc(5);
    // a first inverse computes the curve's nodes from z = 0: those below u = 1/16 integrate directly
    model.redshiftAt("luminosityDistance", model.luminosityDistanceMpc(0.5));
    model.redshiftAt("angularDiameterDistance", model.angularDiameterDistanceMpc(0.2));
    const [dl, da] = [model.luminosityDistanceMpc(1.3), model.angularDiameterDistanceMpc(0.4)];
    e2.mockClear();
    expect(model.redshiftAt("luminosityDistance", dl)).toBeCloseTo(1.3, 12);
    expect(model.redshiftAt("angularDiameterDistance", da)).toBeCloseTo(0.4, 12);
    expect(() => model.redshiftAt("angularDiameterDistance", 1e5)).toThrow(/exceeds its maximum in this model/);
    expect(e2).toHaveBeenCalledTimes(0);
  });
});

describe("arguments outside their ranges: RangeError with the range (the messages zcell shows, pinned as the interface)", () => {
  test.each([
    // area [sr]  | message
    [-1,           "area = -1 sr is outside 0 … 4π sr (the whole sky)"],
    [-1e-300,      "area = -1e-300 sr is outside 0 … 4π sr (the whole sky)"],
    [13,           "area = 13 sr is outside 0 … 4π sr (the whole sky)"],
  ])("a shell over %d sr", (area, message) => {
    expect(() => eds.comovingVolumeShellMpc3(0.5, 1, area)).toThrow(new RangeError(message));
  });

  test("the whole sky up to the rounding allowance 4π (1 + 1e-12) is accepted and gives the whole shell", () => {
    const whole = eds.comovingVolumeMpc3(1) - eds.comovingVolumeMpc3(0.5);
    const edge = 4 * Math.PI * (1 + 1e-12);
    expect(relativeError(eds.comovingVolumeShellMpc3(0.5, 1, edge), whole)).toBeLessThan(1e-11);
    expect(() => eds.comovingVolumeShellMpc3(0.5, 1, edge * (1 + 1e-15))).toThrow(RangeError);
  });

  test.each([
    // angle [rad] | message
    [-0.1,          "angle = -0.1 rad is outside 0 … π rad"],
    [-1e-300,       "angle = -1e-300 rad is outside 0 … π rad"],
    [4,             "angle = 4 rad is outside 0 … π rad"],
  ])("a proper size for an angle of %d rad", (angle, message) => {
    expect(() => eds.properSizeMpc(angle, 1)).toThrow(new RangeError(message));
  });
});

describe("behind the antipode of a closed model D_A < 0: no size subtends an angle there", () => {
  // "H0=70; Om=2; OL=2.5" (Ωk = −3.5): √|Ωk| D_C/D_H passes π near z = 12; D_A(100) < 0
  const closed = Cosmology.fromSpec("H0=70; Om=2; OL=2.5");

  test("D_A at z = 100 is negative (sin of more than π)", () => {
    expect(closed.sqrtAbsOk * (closed.comovingDistanceMpc(100) / closed.hubbleDistanceMpc)).toBeGreaterThan(Math.PI);
    expect(closed.angularDiameterDistanceMpc(100)).toBeLessThan(0);
  });

  test("an angle for 1 Mpc at z = 100 is refused, not given negative", () => {
    expect(() => closed.angleRad(1, 100)).toThrow(/^size = 1 Mpc at z = 100 would subtend more than 180°/);
  });
});
