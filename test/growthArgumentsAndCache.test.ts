/**
 * Linear growth: the neutrino convention and start refused by name, the reason given when dark energy
 * is still large where an integration would start, and one table a model (built once, then only read).
 */
import { describe, expect, test, vi } from "vitest";
import { Cosmology } from "../core/distances/Cosmology.js";
import { growthFactor, growthRate, growthStartedAt, type GrowthNeutrinos } from "../core/observables/growth.js";

describe("arguments refused", () => {
  test("an unknown neutrino convention is a TypeError naming the two conventions", () => {
    // the core's messages (core/observables/growth.ts), pinned as the interface
    const m = Cosmology.fromSpec("EDS");
    const bad = "frozen" as GrowthNeutrinos;
    expect(() => growthFactor(m, 1, bad)).toThrow(new TypeError('unknown neutrino convention "frozen": use smooth or clustering'));
    expect(() => growthRate(m, 1, bad)).toThrow(new TypeError('unknown neutrino convention "frozen": use smooth or clustering'));
    expect(() => growthStartedAt(m, 1, bad, 1e-6)).toThrow(new TypeError('unknown neutrino convention "frozen"'));
  });

  test("a start at a = 0, or exactly at the redshift asked for, is refused", () => {
    const m = Cosmology.fromSpec("EDS");
    expect(() => growthStartedAt(m, 1, "smooth", 0)).toThrow(new RangeError("the start a = 0 must lie before z = 1"));
    // a = 1/(1 + z) = 0.5 is z = 1 itself: ln 0.5 and −ln(1 + 1) are the same double
    expect(Math.log(0.5)).toBe(-Math.log1p(1));
    expect(() => growthStartedAt(m, 1, "smooth", 0.5)).toThrow(new RangeError("the start a = 0.5 must lie before z = 1"));
    // just before it is fine: EdS has D ∝ a (Peebles 1980 §11), so D(z = 1) = 0.5 from any start
    expect(Math.abs(growthStartedAt(m, 1, "smooth", 0.49).d - 0.5)).toBeLessThanOrEqual(1e-9);
  });
});

describe("dark energy still large where the integration starts", () => {
  test("a late start names dark energy's share of H² there: Ω_DE(a = 0.5) = 0.7 / (0.3 · 2³ + 0.7) = 22.6% in flat ΛCDM without radiation", () => {
    // closed form: E²(z) = Ω_m (1+z)³ + Ω_Λ for a flat model without radiation (common practice)
    expect(() => growthStartedAt(Cosmology.fromSpec("H0=70; Om=0.3"), 0, "smooth", 0.5)).toThrow(
      new RangeError(
        "linear growth needs matter to dominate H² early on (this model has no radiation), but its dark energy fades into the past too slowly: w0 + wa = -1 (matter: 0), and it is still 22.6% of H² at a = 0.5",
      ),
    );
  });

  test("w0 + wa exactly 0 without radiation grows into the past as fast as matter: refused with that reason", () => {
    // ρ_DE ∝ a^(−3(1+w0+wa)) exp(−3 wa (1 − a)) (Linder 2003 eq. 3): a⁻³ e⁻³ for w0 = −1, wa = 1, a fixed share of
    // E² (≈ 10%) into the past
    expect(() => growthFactor(Cosmology.fromSpec("H0=70; Om=0.3; w0=-1; wa=1"), 1)).toThrow(
      new RangeError("linear growth needs matter to dominate H² early on (this model has no radiation), but its dark energy grows into the past as fast as matter or faster: w0 + wa = 0 (matter: 0)"),
    );
  });
});

describe("one table a model", () => {
  test("after the first value the expansion rate is not evaluated again for the same model and convention (the table is kept)", () => {
    const m = Cosmology.fromSpec("P18-CMB; mnu=0.3");
    const first = growthFactor(m, 0.5, "clustering");
    const e2 = vi.spyOn(m.expansion, "e2");
    expect(growthFactor(m, 0.5, "clustering")).toBe(first);
    growthRate(m, 2, "clustering");
    growthFactor(m, 1000, "clustering");
    expect(e2).not.toHaveBeenCalled();
    e2.mockRestore();
  });

  test("a model without matter builds its table from a = 1e-8: at most 4 evaluations of E² a step, 1024 steps of 0.018 in ln a", () => {
    // without a source D is constant whatever the start; an earlier start (down to 1e-30) would only cost more steps
    const m = Cosmology.fromSpec("H0=70; Om=0; OL=1");
    const e2 = vi.spyOn(m.expansion, "e2");
    expect(growthFactor(m, 3)).toBe(1);
    const steps = Math.ceil(Math.log(1e8) / 0.018); // 1024
    expect(e2.mock.calls.length).toBeGreaterThanOrEqual(steps); // the spy sees the table being built
    expect(e2.mock.calls.length).toBeLessThanOrEqual(4 * (steps + 1));
    e2.mockRestore();
  });
});
