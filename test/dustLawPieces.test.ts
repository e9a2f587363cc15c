/**
 * The four extinction laws piece by piece, called in the core: A_λ/E(B−V) at a point inside each of
 * their pieces and R_V-dependence away from 3.1, the edges of each range, the rule that picks a law
 * from the name a sheet gives and the core's own messages. Expected values were computed once and are
 * written here with the library and the call that gave them (outside references; the same libraries
 * are compared live in extinction.test.ts where Python is present).
 */
import { describe, expect, test } from "vitest";
import { defaultRv, extinctionLawNamed, extinctionMag, extinctionRangeAngstrom, inRange, type ExtinctionLaw } from "../core/index.js";
import { NoSolutionError } from "../core/checks/NoSolutionError.js";

const relative = 1e-9;
const expectClose = (got: number, want: number, tolerance: number, what: string) =>
  expect(Math.abs(got - want), `${what}: ${got} vs ${want}`).toBeLessThanOrEqual(tolerance * Math.max(1, Math.abs(want)));

/** Inverse wavelengths [µm⁻¹] with one point or more in every CCM piece: IR (< 1.1), optical (1.1–3.3), UV without (3.3–5.9) and with F (5.9–8), far UV (8–10). */
const xs = [0.5, 1.0, 1.5, 2.5, 3.0, 4.0, 5.0, 6.5, 7.5, 8.5, 9.5];

describe("Cardelli 1989 and O'Donnell 1994 in every piece, at R_V = 3.1 and 5", () => {
  // A_λ/E(B−V), from python3-extinction 0.4.6 (Debian): extinction.ccm89(1e4/x, a_v=R_V, r_v=R_V) and
  // extinction.odonnell94(1e4/x, a_v=R_V, r_v=R_V), printed to 12 significant digits
  const table: [ExtinctionLaw, number, number[]][] = [
    ["Cardelli 1989", 3.1, [0.410284174748, 1.2524, 2.48545242895, 4.54012267912, 5.0919027268, 7.17748302847, 8.81183195094, 8.11279657658, 9.34453950525, 11.5196, 14.34945]],
    ["Cardelli 1989", 5.0, [0.76756293631, 2.343, 4.1936420168, 6.40590980151, 6.74034397562, 7.85452478059, 8.69942323789, 7.45083636822, 7.85300374158, 8.93275, 10.65775]],
    ["ODonnell 1994", 3.1, [0.410284174748, 1.2524, 2.47529961187, 4.42115187632, 5.2314544833, 7.17748302847, 8.81183195094, 8.11279657658, 9.34453950525, 11.5196, 14.34945]],
    ["ODonnell 1994", 5.0, [0.76756293631, 2.343, 4.18067420973, 6.33774488839, 6.78234212072, 7.85452478059, 8.69942323789, 7.45083636822, 7.85300374158, 8.93275, 10.65775]],
  ];
  test.each(table)("%s, R_V = %d", (law, rv, values) => {
    xs.forEach((x, i) => expectClose(extinctionMag(1e4 / x, 1, law, rv), values[i], relative, `x = ${x}`));
    // E(B−V) scales A_λ
    expectClose(extinctionMag(1e4 / 2.5, 0.25, law, rv), 0.25 * values[3], relative, "E(B−V) = 0.25");
  });
});

test.each([
  // λ [Å]              Cardelli 1989         O'Donnell 1994        (python3-extinction 0.4.6, ccm89/odonnell94(λ, 3.1, 3.1): a point on a boundary takes the piece above)
  [1e4 / 1.1,           1.461051175592572,    1.4608806309320068],
  [1e4 / 3.3,           5.587033553522268,    5.587033553522268],
  [1e4 / 8,             10.3437,              10.3437],
  [1e4 / 5.9,           7.789425823092936,    7.789425823092936],
])("on a boundary between CCM's pieces, %d Å", (w, ccm, odonnell) => {
  expectClose(extinctionMag(w, 1, "Cardelli 1989"), ccm, 1e-12, "Cardelli 1989");
  expectClose(extinctionMag(w, 1, "ODonnell 1994"), odonnell, 1e-12, "ODonnell 1994");
});

describe("Calzetti 2000 on both sides of 0.63 µm", () => {
  // k′(λ) = A_λ/E_s(B−V), from python3-extinction 0.4.6: extinction.calzetti00(λ, a_v=R′_V, r_v=R′_V)
  const waves = [1250, 3000, 5000, 6000, 7000, 15000, 22000];
  test.each([
    [4.05, [11.697284, 6.9254622963, 4.470122, 3.67754303704, 3.06275128571, 0.955810333333, 0.369218818182]],
    [3.0, [10.647284, 5.8754622963, 3.420122, 2.62754303704, 2.01275128571, -0.0941896666667, -0.680781181818]],
  ])("R′_V = %d", (rv, values) => {
    waves.forEach((w, i) => expectClose(extinctionMag(w, 1, "Calzetti 2000", rv), values[i], relative, `${w} Å`));
  });

  test("without R′_V it is 4.05 (Calzetti et al. 2000 eq. 5); the Milky Way laws take 3.1", () => {
    expectClose(extinctionMag(5000, 1, "Calzetti 2000"), 4.470122, relative, "Calzetti 2000 default");
    // 6300 Å, the join, takes the long-wavelength piece: python3-extinction 0.4.6, calzetti00([6300.], 4.05, 4.05)
    expectClose(extinctionMag(6300, 1, "Calzetti 2000"), 3.501697317460317, 1e-12, "Calzetti 2000 at 0.63 µm");
    expect(defaultRv("Calzetti 2000")).toBe(4.05);
    for (const law of ["Fitzpatrick 1999", "Cardelli 1989", "ODonnell 1994"] as const) expect(defaultRv(law)).toBe(3.1);
    expectClose(extinctionMag(1e4 / 2.5, 1, "Cardelli 1989"), 4.54012267912, relative, "Cardelli 1989 default R_V");
  });
});

describe("Fitzpatrick 1999 away from R_V = 3.1", () => {
  test.each([
    // R_V   A_λ/E(B−V) at 1200, 1500, 1700, 2175, 2500 Å: python3-extinction 0.4.6,
    //       extinction.fitzpatrick99(λ, a_v=R_V, r_v=R_V) (its ultraviolet part is the FM90 function with F99's constants, as ours)
    [3.1,    [10.5814623037, 8.06777461257, 7.65428892139, 9.5352368223, 7.055291116]],
    [2.5,    [11.9265705101, 8.80423765773, 8.10433071418, 9.5161403569, 6.8179219031]],
    [5.0,    [9.40170764344, 7.8517081244, 7.89172274948, 10.5154728925, 8.3811257031]],
  ])("ultraviolet at R_V = %d", (rv, values) => {
    [1200, 1500, 1700, 2175, 2500].forEach((w, i) => expectClose(extinctionMag(w, 1, "Fitzpatrick 1999", rv), values[i], relative, `${w} Å`));
  });

  test.each([
    // R_V   A_λ/E(B−V) at 20000, 9000, 5000, 4400, 3000 Å: a natural cubic spline in x through F99's anchors
    //       (Table 3 infrared values × R/3.1, Table 4 optical ones with +1.208 at 4110 Å, FM90 at 2700 and 2600 Å),
    //       computed once with scipy 1.10.1 (Debian): scipy.interpolate.CubicSpline(x_anchors, values, bc_type="natural")
    [2.5,    [0.316540416538, 1.07102572, 2.87852160805, 3.45639510876, 5.10830388666]],
    [5.0,    [0.607410199273, 2.45256829955, 5.37339897819, 5.96504199431, 7.24940963984]],
  ])("optical and infrared at R_V = %d", (rv, values) => {
    [20000, 9000, 5000, 4400, 3000].forEach((w, i) => expectClose(extinctionMag(w, 1, "Fitzpatrick 1999", rv), values[i], 1e-9, `${w} Å`));
  });

  test("more R_V values than a sheet usually holds still each get their own curve", () => {
    // 20 values of R_V in turn, then the first again: each must be its own (the A_V anchor 5470 Å: −0.05 + 1.0016 R_V, F99 Table 4)
    const rvs = Array.from({ length: 20 }, (_, i) => 2.2 + 0.2 * i);
    for (const rv of [...rvs, ...rvs]) expectClose(extinctionMag(5470, 1, "Fitzpatrick 1999", rv), -0.05 + 1.0016 * rv, 1e-12, `R_V = ${rv}`);
  });
});

describe("a law's range holds its ends and refuses what lies beyond", () => {
  test.each([
    ["Fitzpatrick 1999", 1150, 35000],
    ["Cardelli 1989", 1000, 1e4 / 0.3],
    ["ODonnell 1994", 1000, 1e4 / 0.3],
    ["Calzetti 2000", 1200, 22000],
  ] as const)("%s: %d … %d Angstrom (extinction.ts, each law's paper)", (law, min, max) => {
    expect(extinctionRangeAngstrom(law)).toEqual({ min, max });
    // the ends, and a value 1 ulp beyond each (a unit conversion may land there), are inside
    for (const w of [min, max, min * (1 - 1e-15), max * (1 + 1e-15)]) {
      expect(inRange(w, law), `${w}`).toBe(true);
      expect(Number.isFinite(extinctionMag(w, 0.1, law))).toBe(true);
    }
    // 1e-10 relative beyond each end is outside
    for (const w of [min * (1 - 1e-10), max * (1 + 1e-10)]) expect(inRange(w, law), `${w}`).toBe(false);
  });

  test.each([
    [900, "Cardelli 1989", "wavelength = 900 Angstrom is outside the range of Cardelli 1989, 1000 to 33333.3 Angstrom"],
    [40000, "Fitzpatrick 1999", "wavelength = 40000 Angstrom is outside the range of Fitzpatrick 1999, 1150 to 35000 Angstrom"],
    [1100, "Calzetti 2000", "wavelength = 1100 Angstrom is outside the range of Calzetti 2000, 1200 to 22000 Angstrom"],
  ] as const)("%d Å with %s: NoSolutionError naming the range (the core's message, pinned as the interface)", (w, law, message) => {
    expect(() => extinctionMag(w, 0.1, law)).toThrow(NoSolutionError);
    expect(() => extinctionMag(w, 0.1, law)).toThrow(message);
  });

  test.each([
    [[0, 0.1], RangeError, "wavelength = 0 Angstrom must be > 0 and finite"],
    [[5000, -0.1], RangeError, "ebv = -0.1 must be ≥ 0 and finite"],
    [[5000, Number.NaN], TypeError, "ebv must be a number"],
    [[5000, 0.1, "Cardelli 1989", 0], RangeError, "r_v = 0 must be > 0"],
    [[5000, 0.1, "Cardelli 1989", -3.1], RangeError, "r_v = -3.1 must be > 0"],
    [[5000, 0.1, "Cardelli 1989", Number.POSITIVE_INFINITY], RangeError, "r_v must be finite"],
  ] as const)("extinctionMag(%j) is refused: %s", (args, kind, message) => {
    expect(() => (extinctionMag as (...a: unknown[]) => number)(...args)).toThrow(kind);
    expect(() => (extinctionMag as (...a: unknown[]) => number)(...args)).toThrow(message);
  });

  test("E(B−V) = 0 is allowed and gives no extinction", () => {
    expect(extinctionMag(5000, 0, "Cardelli 1989")).toBe(0);
  });
});

describe("a law is found by the name a sheet gives", () => {
  const list = 'law: "X" is not one of Fitzpatrick 1999, Cardelli 1989, ODonnell 1994, Calzetti 2000 (case, spaces, "_", "-" and an apostrophe are ignored)';
  test.each([
    ["Fitzpatrick 1999", "Fitzpatrick 1999"],
    ["o’donnell-1994", "ODonnell 1994"],
    ["CARDELLI_1989", "Cardelli 1989"],
    [" calzetti\t2000 ", "Calzetti 2000"],
    ["O`Donnell 1994", "ODonnell 1994"],
    ["O‘Donnell 1994", "ODonnell 1994"],
    ["Oʼdonnell 1994", "ODonnell 1994"],
    ["Fitzpatrick\n1999", "Fitzpatrick 1999"],
  ] as const)("%j is %s", (text, law) => {
    expect(extinctionLawNamed(text)).toBe(law);
  });

  test.each([
    // text           the whole message (extinction.ts, pinned as the interface)
    ["Fitz",         `${list.replace('"X"', '"Fitz"')}: did you mean Fitzpatrick 1999?`],
    ["card",         `${list.replace('"X"', '"card"')}: did you mean Cardelli 1989?`],
    ["Cal",          list.replace('"X"', '"Cal"')],
    ["c",            list.replace('"X"', '"c"')],
    ["",             list.replace('"X"', '""')],
    ["Cardelli 1990", list.replace('"X"', '"Cardelli 1990"')],
    ["1999",         list.replace('"X"', '"1999"')],
  ])("%j is refused: %s", (text, message) => {
    expect(() => extinctionLawNamed(text)).toThrow(new TypeError(message));
  });
});
