import { describe, expect, test } from "vitest";
import { fermiDiracDensityFactor, fermiDiracDensityFactorLogSlope } from "../core/model/fermiDirac.js";
import { integrate, kronrod15 } from "../core/numerics/quadrature.js";
import { QuinticTable } from "../core/numerics/QuinticTable.js";
import { solveBracketed } from "../core/numerics/solveBracketed.js";
import { expectRelative } from "./helpers.js";
import { slowFermiDirac, tanhSinh } from "./reference/slowCosmology.js";

describe("Gauss–Kronrod quadrature", () => {
  // Exactness degrees: K15 integrates polynomials of degree ≤ 22 exactly, G7 degree ≤ 13
  // (Piessens et al. 1983, QUADPACK §2.2.1); ∫₀¹ xⁿ dx = 1/(n+1).
  test.each([0, 1, 5, 13, 22])("integrates x^%i exactly on [0, 1]", (n) => {
    expectRelative(kronrod15((x) => x ** n, 0, 1).value, 1 / (n + 1), 1e-14, `x^${n}`);
  });

  test("the G7 half alone is exact to degree 13, so the error estimate vanishes there", () => {
    expect(kronrod15((x) => x ** 13, 0, 1).error).toBeLessThan(1e-15);
    expect(kronrod15((x) => x ** 20, 0, 1).error).toBeGreaterThan(1e-8);
  });

  //   integrand              a   b         exact                        source
  const cases: [string, (x: number) => number, number, number, number, string][] = [
    ["exp(x)",               (x) => Math.exp(x), 0, 3,   Math.expm1(3),         "calculus"],
    ["1/(1+x²)",             (x) => 1 / (1 + x * x), 0, 50, Math.atan(50),       "calculus"],
    ["√x (endpoint branch)", (x) => Math.sqrt(x), 0, 1,  2 / 3,                 "calculus"],
  ];
  test.each(cases)("adaptive integral of %s", (_name, f, a, b, exact) => {
    expectRelative(integrate(f, a, b, 1e-14), exact, 1e-13, _name);
  });
});

describe("quintic Hermite table", () => {
  test("reproduces sin to its h⁶/46080 error bound and matches derivatives", () => {
    const h = 0.05;
    const n = 40;
    const xs = Array.from({ length: n + 1 }, (_, i) => i * h);
    const table = QuinticTable.fromNodes(0, h, xs.map(Math.sin), xs.map(Math.cos), xs.map((x) => -Math.sin(x)));
    let worst = 0;
    let worstSlope = 0;
    for (let x = 0; x <= n * h; x += 0.0013) {
      worst = Math.max(worst, Math.abs(table.value(x) - Math.sin(x)));
      worstSlope = Math.max(worstSlope, Math.abs(table.derivative(x) - Math.cos(x)));
    }
    // Hermite remainder bound h⁶ max|f⁽⁶⁾| / 46080 with |sin⁽⁶⁾| ≤ 1 (standard interpolation theory)
    expect(worst).toBeLessThanOrEqual((h ** 6 / 46080) * 1.01);
    expect(worst).toBeGreaterThan(0);
    expect(worstSlope).toBeLessThan(1e-9);
    expect(table.node(n)).toBe(Math.sin(n * h));
  });

  test("a growing table sets its panels in order as look-ups reach them, and equals the complete table", () => {
    const h = 0.05;
    const n = 40;
    const xs = Array.from({ length: n + 1 }, (_, i) => i * h);
    const [f, df, d2f] = [xs.map(Math.sin), xs.map(Math.cos), xs.map((x) => -Math.sin(x))];
    const complete = QuinticTable.fromNodes(0, h, f, df, d2f);
    const asked: number[] = [];
    let set = 0;
    const growing = new QuinticTable(0, h, n, (panel) => {
      asked.push(panel);
      const to = Math.min(n, Math.max(set + 8, panel + 1)); // 8 panels at a time, as far as asked
      growing.setPanels(set, to, f, df, d2f);
      set = to;
    });
    expect(growing.value(0.13)).toBe(complete.value(0.13)); // panel 2: the first 8 panels
    expect(growing.derivative(0.3)).toBe(complete.derivative(0.3)); // panel 6: already set, no call
    expect(asked).toEqual([2]);
    expect(growing.value(1.01)).toBe(complete.value(1.01)); // panel 20: set up to panel 21
    expect(growing.node(n)).toBe(Math.sin(n * h)); // the last node sets every panel
    expect(asked).toEqual([2, 20, n - 1]);
    for (let x = 0; x <= n * h; x += 0.0371) expect(growing.value(x)).toBe(complete.value(x));
    expect(() => growing.setPanels(3, 5, f, df, d2f)).toThrow(new RangeError("panels 3 … 5 out of order")); // set once, in order
    const empty = new QuinticTable(0, h, n);
    expect(() => empty.setPanels(0, 0, f, df, d2f)).toThrow(new RangeError("panels 0 … 0 out of order")); // at least one panel
    expect(() => empty.setPanels(0, n + 1, f, df, d2f)).toThrow(new RangeError(`panels 0 … ${n + 1} out of order`)); // not past the grid
    expect(() => empty.value(0.5)).toThrow(new RangeError("table panel not set")); // no panel and no way to grow
  });
});

describe("Fermi–Dirac density factor F(y)", () => {
  test("is 1 for massless neutrinos (F(0) = 1 by definition)", () => {
    expect(fermiDiracDensityFactor(0)).toBe(1);
    expect(fermiDiracDensityFactorLogSlope(0)).toBe(0);
  });

  test("matches independent tanh-sinh quadrature to 1e-11 from y = 1e-6 to 1e5", () => {
    let worst = 0;
    for (let s = Math.log(1e-6); s <= Math.log(1e5); s += 0.173) {
      const y = Math.exp(s);
      const err = Math.abs(fermiDiracDensityFactor(y) / slowFermiDirac(y) - 1);
      worst = Math.max(worst, err);
    }
    expect(worst).toBeLessThan(1e-11);
  });

  test("is continuous across the table edges y = e⁻¹⁰ and e⁷ (series ↔ table)", () => {
    for (const s of [-10, 7]) {
      const y = Math.exp(s);
      const below = fermiDiracDensityFactor(y * (1 - 1e-12));
      const above = fermiDiracDensityFactor(y * (1 + 1e-12));
      // across Δln y = 2e-12, F itself changes by (dF/dln y) × 2e-12
      const expected = below + 2e-12 * fermiDiracDensityFactorLogSlope(y);
      expectRelative(above, expected, 2e-13, `edge e^${s}`);
    }
  });

  test("its log-slope equals the numerical derivative of the quadrature result", () => {
    for (const y of [0.01, 0.5, 2, 30, 358, 5000]) {
      const d = 1e-4;
      const numeric = (slowFermiDirac(y * Math.exp(d)) - slowFermiDirac(y * Math.exp(-d))) / (2 * d);
      // central difference: truncation d²/6 ≈ 2e-9, rounding 1e-16 F/d ≈ 1e-12 F relative to a slope that is 1.4e-5 F at y = 0.01
      expectRelative(fermiDiracDensityFactorLogSlope(y), numeric, 1e-6, `y=${y}`);
    }
  });

  // Limits of the integral: small y, F = 1 + 5y²/(7π²) (Taylor expansion, ∫x/(eˣ+1) = π²/12);
  // large y, F → 180ζ(3)y/(7π⁴) (∫x²/(eˣ+1) = 3ζ(3)/2; Gradshteyn & Ryzhik 3.411.3).
  test.each([
    // y      expected                                     tol    source
    [1e-4,    1 + (5 / (7 * Math.PI ** 2)) * 1e-8,         1e-15, "Taylor series, common practice"],
    [1e8,     (180 * 1.2020569031595942 * 1e8) / (7 * Math.PI ** 4), 2e-12, "non-relativistic limit, ζ(3) from memory"],
  ])("limit at y = %d", (y, expected, tol) => {
    expectRelative(fermiDiracDensityFactor(y), expected, tol, `y=${y}`);
  });

  test("tanh-sinh reference itself integrates a known integral (∫₀¹ ln x = −1)", () => {
    expectRelative(tanhSinh(Math.log, 0, 1), -1, 1e-14, "ln");
  });
});

/** Wraps f so that its calls are counted in `calls.n`. */
function counted(f: (x: number) => number): { f: (x: number) => number; calls: { n: number } } {
  const calls = { n: 0 };
  return {
    f: (x) => {
      calls.n++;
      return f(x);
    },
    calls,
  };
}

describe("adaptive quadrature: when it stops", () => {
  test("an empty interval is 0 without evaluating the integrand (which may be infinite there)", () => {
    const { f, calls } = counted((x) => 1 / x);
    expect(integrate(f, 0, 0)).toBe(0);
    expect(calls.n).toBe(0);
  });

  test("an integrand the first 8 panels integrate exactly stops there: 8 × 15 evaluations", () => {
    // K15 and G7 are both exact for degree ≤ 13 (Piessens et al. 1983 §2.2.1), so the error estimate is 0
    for (const g of [() => 0, (x: number) => x * x]) {
      const { f, calls } = counted(g);
      integrate(f, 0, 1);
      expect(calls.n).toBe(8 * 15);
    }
  });

  test("an integrand it cannot converge on stops after 2000 bisections, with the sum of its panels", () => {
    // a deterministic noise in [0, 1) (the fractional part of a scaled sine, common practice for a
    // hash): no panel's estimate ever settles; its mean over [0, 1] is about 1/2
    const { f, calls } = counted((x) => {
      const s = Math.sin(x * 12_989.8) * 43_758.5453;
      return s - Math.floor(s);
    });
    const value = integrate(f, 0, 1);
    expect(calls.n).toBe(15 * (8 + 2 * 2000));
    expect(Math.abs(value - 0.5)).toBeLessThan(0.01);
  });

  test("a jump asked to 0 error: refinement ends once no panel's nodes straddle it", () => {
    // ∫₀¹ [x ≥ 1/3] dx = 2/3 (common practice); with both tolerances 0 only the panel across the jump is
    // halved, until it is so narrow that its nodes all fall on one side and its error estimate is 0:
    // about 51 halvings (measured), far fewer than the 2000 allowed
    const { f, calls } = counted((x) => (x < 1 / 3 ? 0 : 1));
    expectRelative(integrate(f, 0, 1, 0, 0), 2 / 3, 1e-15, "∫ of a step");
    expect(calls.n).toBeLessThanOrEqual(15 * (8 + 2 * 60));
  });
});

describe("safeguarded Newton solver", () => {
  test.each([
    // name          | g                 | dg/dx                          | target | most evaluations (measured 5–11) | bracket | root (closed form)
    ["x²",             (x: number) => x * x, (x: number) => 2 * x,            2,       8,                 [0, 2],      Math.SQRT2],
    ["eˣ",             Math.exp,            Math.exp,                         10,      8,                 [0, 5],      Math.LN10],
    ["tanh x",         Math.tanh,           (x: number) => 1 - Math.tanh(x) ** 2, 0.5, 8,                 [-20, 20],   Math.atanh(0.5)],
    ["x³",             (x: number) => x ** 3, (x: number) => 3 * x * x,      1e-3,    12,                [0, 1],      0.1],
    ["atan x",         Math.atan,           (x: number) => 1 / (1 + x * x),   1.2,     14,                [-10, 100],  Math.tan(1.2)],   // Newton leaves the bracket: bisection takes over
  ] as const)("%s: the root to 2 ulps from the bracket's midpoint, in few evaluations", (_name, g, dg, target, most, [lo, hi], root) => {
    const { f, calls } = counted(g);
    const x = solveBracketed(f, dg, target, lo, hi);
    expect(Math.abs(x - root)).toBeLessThanOrEqual(2 * Number.EPSILON * root);
    expect(calls.n).toBeLessThanOrEqual(most);
    // bisection alone would need about 50 halvings of the bracket to reach 2 ulps
  });

  test("only interior points are evaluated, so g may be infinite at the ends", () => {
    // logit(x) = ln(x/(1−x)) is −∞ at 0 and +∞ at 1; logit(0.8) = ln 4
    const { f, calls } = counted((x) => {
      expect(x > 0 && x < 1).toBe(true);
      return Math.log(x / (1 - x));
    });
    const x = solveBracketed(f, (u) => 1 / (u * (1 - u)), Math.log(4), 0, 1);
    expect(Math.abs(x - 0.8)).toBeLessThanOrEqual(2 * Number.EPSILON);
    expect(calls.n).toBeLessThanOrEqual(10);
  });

  test("a start given near one end still converges inside the bracket", () => {
    const x = solveBracketed((u) => u * u, (u) => 2 * u, 2, 0, 2, 1e-9);
    expect(Math.abs(x - Math.SQRT2)).toBeLessThanOrEqual(2 * Number.EPSILON * Math.SQRT2);
  });
});
