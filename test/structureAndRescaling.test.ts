/**
 * From columns to populations and today's cosmology: restating published values under another model,
 * BAO distances, lensing, halos and surface brightness. Expected values come from the definitions
 * written out with the existing functions (DIST_*, HUBBLE, CRIT_DENSITY, OMEGA), closed forms, and the
 * published formulas named beside each.
 */
import { readFileSync } from "node:fs";
import { describe, expect, test } from "vitest";
import { Cosmology, growthFactor, growthRate } from "../core/index.js";
import { sheetCalls } from "./sheetCalls.js";
import { expectRelative } from "./helpers.js";

const { num, failure } = sheetCalls("P18-CMB");

const GMsun = 1.3271244e20; // m³ s⁻², IAU 2015 Resolution B3 nominal solar mass parameter
const c = 299_792_458; // m/s, exact (SI)
const mpcM = 3.0856775814913673e22; // m, IAU 2015 Resolution B2 parsec × 1e6
const pcM = mpcM / 1e6;

describe("RESCALE: a published value restated under another cosmology", () => {
  const [from, to, z] = ["W9-ALL", "P18-CMB", 0.8];
  test.each([
    // quantity     | published | expected, from the existing functions under each model
    ["distance",    1000,       () => 1000 * num("DIST_TRANS", z, to) / num("DIST_TRANS", z, from)],
    ["luminosity",  1e44,       () => 1e44 * (num("DIST_LUM", z, to) / num("DIST_LUM", z, from)) ** 2],
    ["size",        12.5,       () => 12.5 * num("DIST_ANG", z, to) / num("DIST_ANG", z, from)],
    ["magnitude",   -21.3,      () => -21.3 + 5 * Math.log10(num("DIST_LUM", z, from) / num("DIST_LUM", z, to))],
    ["density",     3e-4,       () => 3e-4 * num("VOLUME_ELEMENT", z, from) / num("VOLUME_ELEMENT", z, to)],
  ])("%s: the ratio of the distance functions (rel ≤ 1e-12)", (quantity, value, expected) => {
    expectRelative(num("RESCALE", value, z, quantity, from, to), expected(), 1e-12, quantity as string);
    // to_model blank: the workbook's model (P18-CMB here)
    expect(num("RESCALE", value, z, quantity, from)).toBe(num("RESCALE", value, z, quantity, from, to));
    // the same model both ways changes nothing
    expect(num("RESCALE", value, z, quantity, to, to)).toBe(value);
  });

  test("a luminosity rescaled by H0 alone scales as H0⁻² (D_L ∝ 1/H0 with Ωm fixed and no radiation: common practice)", () => {
    expectRelative(num("RESCALE", 1e44, 2, "luminosity", "EDS", "EDS; H0=35"), 4e44, 1e-12, "(70/35)²");
  });

  test("from_model is required; a redshift of 0 is refused", () => {
    expect(failure("RESCALE", 1, 1, "distance", null).message).toBe("ZC.RESCALE: from_model is required");
    expect(failure("RESCALE", 1, 0, "distance", "W9-ALL").kind).toBe("num");
    expect(failure("RESCALE", 1, 1, "volume", "W9-ALL").message).toBe('ZC.RESCALE: quantity: "volume" is not one of distance, luminosity, size, magnitude, density');
  });
});

describe("BAO distances", () => {
  test.each([0.1, 0.51, 1.32, 2.33])("at z = %d: D_H = c/H(z) and D_V = [z D_M² D_H]^(1/3) (Eisenstein et al. 2005 eq. 2) from DIST_TRANS and HUBBLE", (z) => {
    const dh = c / 1000 / num("HUBBLE", z);
    expectRelative(num("DIST_HUBBLE", z), dh, 1e-14, "D_H");
    expectRelative(num("DIST_VOLUME", z), Math.cbrt(z * num("DIST_TRANS", z) ** 2 * dh), 1e-13, "D_V");
  });

  test("Einstein–de Sitter: D_H(z) = (c/H0) (1+z)^−3/2 (closed form)", () => {
    expectRelative(num("DIST_HUBBLE", 3, "EDS"), 299792.458 / 70 / 8, 1e-14, "D_H(3)");
  });
});

describe("SIGMA_CRIT: the critical surface density of a thin lens", () => {
  test.each([
    // lens | source | model
    [0.3,    1,       "P18-CMB"],
    [0.5,    2,       "EDS"],
    [0.2,    3.5,     "H0=70; Om=0.3; OL=0.8"],   // closed: D_ls from the sin form
    [0.4,    1.5,     "H0=70; Om=0.3; OL=0.5"],   // open
  ])("z_l = %d, z_s = %d in %s: c² D_s / (4π G D_l D_ls) from DIST_ANG and DIST_BETWEEN, IAU GM☉ (rel ≤ 1e-6)", (zl, zs, model) => {
    const dl = num("DIST_ANG", zl, model) * mpcM;
    const ds = num("DIST_ANG", zs, model) * mpcM;
    const dls = num("DIST_BETWEEN", zl, zs, model) * mpcM;
    const expected = ((c * c * ds) / (4 * Math.PI * GMsun * dl * dls)) * pcM * pcM; // M☉ per pc²
    expectRelative(num("SIGMA_CRIT", zl, zs, model), expected, 1e-6, "Σ_cr");
  });

  test.each([
    // lens | source | model (flat: D_M between the planes is D_M,s − D_M,l, Hogg 1999 eq. 16)
    [0.3,    1,       "P18-CMB"],
    [0.5,    2,       "EDS"],
    [1.2,    3,       "DR2-CMB-DY5"],
  ])("comoving Σ_cr at z_l = %d, z_s = %d in %s: c² D_M,s / (4πG D_M,l (D_M,s − D_M,l) (1+z_l)) from DIST_TRANS (rel ≤ 1e-6), the physical one / (1+z_l)²", (zl, zs, model) => {
    const dl = num("DIST_TRANS", zl, model) * mpcM;
    const ds = num("DIST_TRANS", zs, model) * mpcM;
    const expected = ((c * c * ds) / (4 * Math.PI * GMsun * dl * (ds - dl) * (1 + zl))) * pcM * pcM; // M☉ per comoving pc²
    expectRelative(num("SIGMA_CRIT", zl, zs, model, "", "comoving"), expected, 1e-6, "comoving Σ_cr");
    expectRelative(num("SIGMA_CRIT", zl, zs, model, "", "comoving"), num("SIGMA_CRIT", zl, zs, model) / (1 + zl) ** 2, 1e-14, "(1+z_l)²");
    expect(num("SIGMA_CRIT", zl, zs, model, "", "physical")).toBe(num("SIGMA_CRIT", zl, zs, model));
    expect(num("SIGMA_CRIT", zl, zs, model, "h Msun/pc2", "comoving")).toBeCloseTo(num("SIGMA_CRIT", zl, zs, model, "", "comoving") / (num("HUBBLE", 0, model) / 100), 6);
  });

  test("coordinates other than physical or comoving are #VALUE! naming both", () => {
    const cell = failure("SIGMA_CRIT", 0.3, 1, "", "", "proper");
    expect(cell.kind).toBe("value");
    expect(cell.message).toBe('ZC.SIGMA_CRIT: coordinates: "proper" is not one of physical, comoving');
  });

  test("a source in front of the lens is #NUM! with the reason", () => {
    const cell = failure("SIGMA_CRIT", 1, 0.5);
    expect(cell.kind).toBe("num");
    expect(cell.message).toBe("ZC.SIGMA_CRIT: z_source = 0.5 must be above z_lens = 1: the source lies behind the lens");
  });
});

describe("halos", () => {
  test("Δ_vir at z = 0 in a flat Ωm = 0.3 model without radiation is 18π² − 82·0.7 − 39·0.49 = 101.14 (Bryan & Norman 1998 eq. 6)", () => {
    expectRelative(num("OVERDENSITY", 0, "vir", "H0=70; Om=0.3"), 18 * Math.PI ** 2 - 82 * 0.7 - 39 * 0.49, 1e-14, "Δ_vir");
    expectRelative(num("OVERDENSITY", 0, "vir", "EDS"), 18 * Math.PI ** 2, 1e-14, "18π² in Einstein–de Sitter");
    // an open model without dark energy: the Λ = 0 form, 18π² + 60x − 32x² (same equation)
    expectRelative(num("OVERDENSITY", 0, "vir", "H0=70; Om=0.3; OL=0"), 18 * Math.PI ** 2 - 60 * 0.7 - 32 * 0.49, 1e-14, "Λ = 0 form");
    const x = num("OMEGA", "matter", 1, "H0=70; Om=0.3") - 1;
    expectRelative(num("OVERDENSITY", 1, "vir", "H0=70; Om=0.3"), 18 * Math.PI ** 2 + 82 * x - 39 * x * x, 1e-14, "Δ_vir(z = 1)");
  });

  test("fixed definitions: Nc is N, Nm is N Ωm(z) (from OMEGA); other models for vir are #N/A with the reason", () => {
    expect(num("OVERDENSITY", 0.5, "200c")).toBe(200);
    expect(num("OVERDENSITY", 0.5, "500C")).toBe(500);
    expectRelative(num("OVERDENSITY", 0.5, "200m"), 200 * num("OMEGA", "matter", 0.5), 1e-15, "200 Ωm(z)");
    expectRelative(num("OVERDENSITY", 2, "2500c"), 2500, 0, "any N");
    const curved = failure("OVERDENSITY", 0, "vir", "H0=70; Om=0.3; OL=0.8");
    expect(curved.kind).toBe("na");
    expect(curved.message).toMatch(/^ZC\.OVERDENSITY: the virial overdensity of Bryan & Norman 1998 covers flat models/);
    expect(failure("OVERDENSITY", 0, "200x").message).toBe('ZC.OVERDENSITY: unknown halo definition "200x": use vir, 200c, 500c, 200m or any <N>c, <N>m');
  });

  test.each([
    // mass [Msun] | z   | definition
    [1e14,          0,    "200c"],
    [3e12,          0.7,  "500c"],
    [1e15,          0.3,  "vir"],
    [5e11,          1.5,  "200m"],
  ])("R(%d Msun, z = %d, %s) = (3M / (4π Δ ρ_crit(z)))^(1/3) from CRIT_DENSITY and OVERDENSITY; HALO_MASS inverts it", (mass, z, def) => {
    const rho = num("CRIT_DENSITY", z); // kg/m3
    const msunKg = GMsun / 6.6743e-11; // IAU 2015 B3 GM☉ / CODATA 2018 G
    const rM = Math.cbrt((3 * mass * msunKg) / (4 * Math.PI * num("OVERDENSITY", z, def) * rho));
    expectRelative(num("HALO_RADIUS", mass, z, def), rM / (pcM * 1e3), 1e-12, "R in kpc");
    expectRelative(num("HALO_MASS", num("HALO_RADIUS", mass, z, def), z, def), mass, 1e-12, "round trip");
    expectRelative(num("HALO_RADIUS", mass, z, def, "", "Msun", "Mpc") * 1000, num("HALO_RADIUS", mass, z, def), 1e-14, "Mpc = 1000 kpc");
  });
});

describe("surface brightness", () => {
  test("1 Lsun/pc2 is μ = M☉ + 21.572 mag/arcsec² at z = 0: 5 log10(206264.806 / 10) (derived)", () => {
    const offset = 5 * Math.log10(206264.806 / 10);
    expectRelative(num("SURFACE_LUM", 4.83 + offset, 0, 4.83), 1, 1e-8, "1 Lsun/pc2");
    expectRelative(num("SURFACE_MAG", 1, 0, 4.83), 4.83 + 21.572, 1e-5, "21.572 to the digits quoted");
  });

  test.each([0.1, 1, 3])("round trip and the (1+z)⁴ dimming at z = %d", (z) => {
    const mu = 23.7;
    expectRelative(num("SURFACE_MAG", num("SURFACE_LUM", mu, z, 5.11, 0.3), z, 5.11, 0.3), mu, 1e-14, "round trip");
    // dimming: the same galaxy at z is 10 log10(1+z) mag fainter per arcsec² (Tolman 1930) plus K
    expectRelative(num("SURFACE_LUM", mu + 10 * Math.log10(1 + z) + 0.3, z, 5.11, 0.3), num("SURFACE_LUM", mu, 0, 5.11), 1e-12, "(1+z)⁴ and K removed");
  });
});

describe("what the help says (the recorded metadata, equal to the build's: test/hostSimulation.test.ts)", () => {
  const metadata = JSON.parse(readFileSync(new URL("./fixtures/functions.metadata.json", import.meta.url), "utf8")) as {
    functions: { id: string; description: string; parameters: { name: string; description: string }[] }[];
  };
  const help = (id: string) => metadata.functions.find((f) => f.id === id)!;
  const param = (id: string, name: string) => help(id).parameters.find((p) => p.name === name)!.description;

  test("SURFACE_LUM and SURFACE_MAG: M☉ in the band and the system (AB or Vega) of μ", () => {
    for (const id of ["SURFACE_LUM", "SURFACE_MAG"]) {
      expect(param(id, "sun_abs_mag")).toBe("The Sun's absolute magnitude in the band of μ, in the same system (AB or Vega) (value or range).");
    }
    expect(help("SURFACE_LUM").description).toContain("M☉ must be the Sun's absolute magnitude in the same band and the same system (AB or Vega) as μ");
  });

  test("SPECTRAL_INDEX: radio negates the value whatever its sign, and says so", () => {
    expect(help("SPECTRAL_INDEX").description).toContain("alpha = −value, whatever its sign: a negative radio index, a rising spectrum, gives a positive alpha");
  });

  test("BRIGHTNESS_TEMP says where Rayleigh–Jeans falls short, with the numbers test/spectralIndexAndBrightness.test.ts checks; REST_FRAME takes photon energies; MAG_AB and FLUX_AB read the wavelength in Angstrom", () => {
    expect(help("BRIGHTNESS_TEMP").description).toContain("always below the Planck brightness temperature T = (hν/k)/ln(1 + hν/(k T_b))");
    expect(help("BRIGHTNESS_TEMP").description).toContain("1 Jy at 300 GHz in a 1″ Gaussian gives 13.58 K here, 19.9 K by Planck's law");
    expect(help("REST_FRAME").description).toContain('"frequency" ν(1+z) (also a photon energy E = hν in keV or eV, and an equivalent width in energy)');
    for (const id of ["MAG_AB", "FLUX_AB"]) expect(param(id, "wavelength")).toContain("Wavelength in Angstrom (not um: 0.5 µm is 5000), 100 … 1e7 (1 mm)");
  });

  test("SIGMA_CRIT says physical, and the comoving one is smaller by (1+z_l)²; GROWTH names both neutrino limits, its limits early on and where dark energy stops it; SOUND_HORIZON its dependence on ω_b and ω_cb", () => {
    expect(help("SIGMA_CRIT").description).toContain("mass per physical area at the lens (the default), or per comoving area, smaller by (1+z_l)²");
    expect(help("GROWTH").description).toContain('"smooth" (blank) keeps them out of the source');
    // before the drag epoch baryons are held by the photons; the equation counts them in the source
    expect(help("GROWTH").description).toContain("above z ≈ 1000, before the drag epoch, when they are held by the photons and do not cluster, the value is the formal solution of this equation");
    expect(help("GROWTH_RATE").description).toContain("above z ≈ 1000 the formal solution with baryons in the source");
    expect(help("GROWTH").description).toContain("w0 + wa above about 0.22 with radiation (P18-CMB's densities), above about −0.07 without (Tcmb = 0)");
    expect(help("SOUND_HORIZON").description).toContain('r_d follows ω_b and ω_cb, not the fractions: "P18-CMB; H0=73" (same Ωb, Ωm) has r_d 6% smaller');
    expect(param("RESCALE", "unit")).toContain("needed when it holds h = H0/100");
  });
});

describe("linear growth", () => {
  test.each([0, 0.5, 2, 10, 1000])("Einstein–de Sitter at z = %d: D = 1/(1+z) and f = 1 (D ∝ a, Peebles 1980 §11)", (z) => {
    // Runge–Kutta steps of 0.018 in ln a from a = 1e-8
    expectRelative(num("GROWTH", z, "EDS"), 1 / (1 + z), 1e-7, "D");
    expectRelative(num("GROWTH_RATE", z, "EDS"), 1, 1e-7, "f");
  });

  test.each([0.3, 1, 3, 10, 50])("flat ΛCDM without radiation at z = %d: the Heath (1977) integral D ∝ H ∫₀^a da′/(a′H)³ (rel ≤ 1e-7)", (z) => {
    // Ωm = 0.3, ΩΛ = 0.7, E(a) = √(0.3 a⁻³ + 0.7); the integral by composite Simpson on a fine grid in a (Abramowitz & Stegun 25.4.6)
    const E = (a: number) => Math.sqrt(0.3 / a ** 3 + 0.7);
    const heath = (a: number) => {
      const n = 20_000;
      const h = a / n;
      let sum = 0;
      for (let i = 0; i <= n; i++) {
        const x = i * h;
        const f = x === 0 ? 0 : 1 / (x * E(x)) ** 3; // → x^1.5/0.3^1.5, 0 at a = 0
        sum += (i === 0 || i === n ? 1 : i % 2 === 1 ? 4 : 2) * f;
      }
      return E(a) * (sum * h) / 3;
    };
    expectRelative(num("GROWTH", z, "H0=70; Om=0.3"), heath(1 / (1 + z)) / heath(1), 1e-7, "D(z)/D(0)");
  });

  test.each([
    // model                          | z
    ["P18-CMB",                         0.5],
    ["DESI2-CMB-DY5",                   1.2],   // w0–wa
    ["H0=70; Om=0.3; OL=0.5",           0.8],   // open
    ["H0=70; Om=0.35; OL=0.8",          2],     // closed
  ])("%s at z = %d: f = −(1+z) dlnD/dz from a finite difference of GROWTH (rel ≤ 1e-6)", (model, z) => {
    const h = 1e-3;
    const dlnD = (Math.log(num("GROWTH", z + h, model)) - Math.log(num("GROWTH", z - h, model))) / (2 * h);
    expectRelative(num("GROWTH_RATE", z, model), -(1 + z) * dlnD, 1e-6, "f");
  });

  test("matter and radiation alone: the Mészáros growing mode D ∝ a + (2/3) a_eq, f = a / (a + (2/3) a_eq) (rel ≤ 2e-7, 1e-8)", () => {
    // Mészáros 1974 (A&A 37, 225): sub-horizon growth with radiation that does not cluster, δ ∝ 1 + 3y/2 with
    // y = a/a_eq, exact for E² = Ωm a⁻³ + Ωr a⁻⁴. The model is flat with Ωm = 1 − Ωr (massless neutrinos).
    const probe = Cosmology.fromSpec("H0=70; Om=0.5; OL=0; Tcmb=2.7255; Neff=3.046");
    const m = Cosmology.fromSpec(`H0=70; Om=${1 - probe.Or}; OL=0; Tcmb=2.7255; Neff=3.046`);
    expect(Math.abs(m.Ok)).toBeLessThan(1e-15);
    const aEq = probe.Or / (1 - probe.Or); // a_eq = Ωr/Ωm
    expect(growthFactor(m, 0)).toBe(1); // D(z)/D(0) by definition
    for (const z of [0.5, 10, 1000, 3000, 3e4, 99_999]) {
      const a = 1 / (1 + z);
      expectRelative(growthFactor(m, z), (a + (2 / 3) * aEq) / (1 + (2 / 3) * aEq), 2e-7, `D at z = ${z}`);
      expectRelative(growthRate(m, z), a / (a + (2 / 3) * aEq), 1e-8, `f at z = ${z}`);
    }
  });

  test("f today in flat ΛCDM is close to Ωm^0.55 (Linder 2005, PRD 72, 043529, a fit: to about 1%)", () => {
    expectRelative(num("GROWTH_RATE", 0, "H0=70; Om=0.3"), 0.3 ** 0.55, 1e-2, "γ = 0.55");
  });

  test("beyond z = 99999 the growth is not given: #NUM! with the reason", () => {
    expect(failure("GROWTH", 2e5).message).toBe("ZC.GROWTH: z = 200000: linear growth is given up to z = 99999");
  });
});

describe("the sound horizon", () => {
  test.each([
    // preset   | r_drag [Mpc] and 1σ, Planck 2018 VI (A&A 641, A6) Table 2
    ["P18-CMB",  147.09, 0.26],
    ["P18-BAO",  147.21, 0.23],
  ])("%s: r_d within the 1σ of Planck 2018's r_drag (%d ± %d Mpc)", (model, rDrag, sigma) => {
    expect(Math.abs(num("SOUND_HORIZON", model) - rDrag)).toBeLessThan(sigma);
  });

  test("the fit's formula written out (Aubourg et al. 2015 eq. 16) for a model of its own", () => {
    // h = 0.7, Ωm = 0.3 with one 0.06 eV ν (ω_ν = 0.06/93.14, common practice), Ωb = 0.045
    const [h, omegaNu] = [0.7, 0.06 / 93.14];
    const expected = (55.154 * Math.exp(-72.3 * (omegaNu + 0.0006) ** 2)) / ((0.3 * h * h - omegaNu) ** 0.25351 * (0.045 * h * h) ** 0.12807);
    expectRelative(num("SOUND_HORIZON", "H0=70; Om=0.3; Ob=0.045; Tcmb=2.7255; mnu=0.06"), expected, 1e-14, "r_d");
    expectRelative(num("SOUND_HORIZON", "H0=70; Om=0.3; Ob=0.045; Tcmb=2.7255; mnu=0.06", "Mpc/h"), expected * h, 1e-14, "in Mpc/h");
  });

  test("a model without Ob is #N/A saying so, with that model and Ob as the way out", () => {
    const cell = failure("SOUND_HORIZON", "H0=70; Om=0.3");
    expect(cell.kind).toBe("na");
    expect(cell.message).toBe('ZC.SOUND_HORIZON: the sound horizon needs the baryon density: add Ob to the model, e.g. "H0=70; Om=0.3; Ob=0.049"');
  });
});
