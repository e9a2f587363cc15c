/**
 * Defaults are an interface saved workbooks depend on: every function's default units and optional
 * values, and the default model, are pinned here. A change must come through an issue and be
 * recorded in CHANGELOG.md; then update this table on purpose. (The values are zcell's own choices,
 * listed in README "Default units"; 0.2.0 set them, CHANGELOG.md says why.)
 */
import { describe, expect, test } from "vitest";
import { defaultModelSpec, readActiveModel } from "../functions/activeModel.js";
import { definitions } from "../functions/definitions.js";
import { evaluate } from "../functions/evaluate.js";
import type { FunctionDef } from "../functions/FunctionDef.js";

/** What the declarations say each argument means when left out (units, optional numbers, optional texts). */
function declaredDefaults(d: FunctionDef): string {
  const parts: string[] = [];
  for (const a of d.args) {
    if (a.kind === "unit") parts.push(`${a.name}=${a.default}`);
    else if (a.kind === "number" && a.default !== undefined) {
      parts.push(`${a.name}=${Number.isNaN(a.default) ? "not given" : a.default === 4 * Math.PI ? "whole sky" : a.default}`);
    } else if (a.kind === "text" && a.optional) parts.push(`${a.name}=${a.blank && "typed" in a.blank ? a.blank.typed : "blank"}`);
    else if (a.kind === "model" && a.name !== "model" && !a.required) parts.push(`${a.name}=the workbook's model`);
  }
  return parts.join("; ");
}

const pinned: [string, string][] = [
  // function              | defaults when left out (0.2.0)
    ["DIST_LUM"            , "unit=Mpc"],
    ["DIST_ANG"            , "unit=Mpc"],
    ["DIST_LOS"            , "unit=Mpc"],
    ["DIST_TRANS"          , "unit=Mpc"],
    ["DIST_BETWEEN"        , "unit=Mpc"],
    ["DIST_LIGHT"          , "unit=Mpc"],
    ["MODULUS"             , ""],
    ["LOOKBACK"            , "unit=Gyr"],
    ["AGE"                 , "z=0; unit=Gyr"],
    ["HUBBLE"              , "z=0; unit=km/s/Mpc"],
    ["OMEGA"               , "z=0"],
    ["CMB_TEMP"            , "z=0"],
    ["CRIT_DENSITY"        , "z=0; unit=kg/m3"],
    ["PROPER_SCALE"        , "unit=kpc/arcsec"],
    ["SIZE"                , "angle_unit=arcsec; size_unit=kpc"],
    ["ANGLE"               , "size_unit=kpc; angle_unit=arcsec"],
    ["VOLUME"              , "unit=Mpc3"],
    ["VOLUME_SHELL"        , "area=whole sky; unit=Mpc3; area_unit=deg2"],
    ["VOLUME_ELEMENT"      , "unit=Mpc3/sr"],
    ["REDSHIFT"            , "unit=blank"],
    ["REDSHIFT_CMB"        , "angle_unit=deg"],
    ["LUMINOSITY"          , "flux_unit=erg/s/cm2; lum_unit=erg/s"],
    ["FLUX"                , "lum_unit=erg/s; flux_unit=erg/s/cm2"],
    ["LUMINOSITY_NU"       , "in_unit=Jy; out_unit=W/Hz"],
    ["KCORRECTION"         , ""],
    ["MAG_ABS"             , "kcorr=0"],
    ["MAG_APP"             , "kcorr=0"],
    ["MAG_AB"              , "unit=Jy; wavelength=not given"],
    ["FLUX_AB"             , "unit=Jy; wavelength=not given"],
    ["LUMINOSITY_REST"     , "band_unit=GHz; in_unit=Jy; out_unit=W/Hz"],
    ["MAG_BOL"             , "unit=erg/s"],
    ["LUM_BOL"             , "unit=erg/s"],
    ["DIMMING"             , "alpha=not given"],
    ["SPECTRAL_INDEX"      , ""],
    ["DIST_LUM_ERR"        , "unit=Mpc"],
    ["LUMINOSITY_ERR"      , "flux_unit=erg/s/cm2; lum_unit=erg/s"],
    ["LUMINOSITY_NU_ERR"   , "alpha_err=0; in_unit=Jy; out_unit=W/Hz"],
    ["MAG_ABS_ERR"         , "kcorr_err=0; alpha=not given"],
    ["SIZE_ERR"            , "angle_unit=arcsec; size_unit=kpc"],
    ["LUMINOSITY_REST_ERR" , "band_unit=GHz; in_unit=Jy; out_unit=W/Hz"],
    ["REDSHIFT_LIMIT"      , "lum_unit=erg/s; flux_unit=erg/s/cm2"],
    ["REDSHIFT_LIMIT_NU"   , "lum_unit=W/Hz; flux_unit=Jy"],
    ["REDSHIFT_LIMIT_MAG"  , "alpha=-1"],
    ["VOLUME_MAX"          , "z_min=0; unit=Mpc3; area_unit=deg2"],
    ["CONVERT"             , ""],
    ["MODEL"               , "key1=blank; key2=blank; key3=blank; key4=blank; key5=blank; key6=blank"],
    ["PARAM"               , ""],
    ["PRESETS"             , ""],
    ["DESCRIBE"            , ""],
    ["VERSION"             , ""],
  // new in 0.2.0 as well: structure, rescaling and surface brightness (CHANGELOG.md)
    ["SURFACE_LUM"         , "kcorr=0"],
    ["SURFACE_MAG"         , "kcorr=0"],
    ["DIST_HUBBLE"         , "unit=Mpc"],
    ["DIST_VOLUME"         , "unit=Mpc"],
    ["SIGMA_CRIT"          , "unit=Msun/pc2; coordinates=physical"],   // coordinates: 0.3.0, blank = physical
    ["OVERDENSITY"         , ""],
    ["HALO_RADIUS"         , "mass_unit=Msun; radius_unit=kpc"],
    ["HALO_MASS"           , "radius_unit=kpc; mass_unit=Msun"],
    ["RESCALE"             , "to_model=the workbook's model; unit=blank"],   // unit: 0.3.0, blank = a unit without h
    ["GROWTH"              , "neutrinos=smooth"],   // neutrinos: 0.3.0, blank = smooth
    ["SOUND_HORIZON"       , "unit=Mpc"],
    ["LUMINOSITY_FUNCTION" , ""],
    ["CHI2_MODULUS"        , "offset=not given"],
    ["GROWTH_RATE"         , "neutrinos=smooth"],   // neutrinos: 0.3.0, blank = smooth
  // new in 0.3.0: dust, two-band indices, brightness temperature (CHANGELOG.md); MAG_AB and FLUX_AB
  // above took a last argument, wavelength, and read their unit as text (blank is still Jy)
    ["EXTINCTION"          , "law=Fitzpatrick 1999; r_v=not given; wavelength_unit=Angstrom"],
    ["INDEX_BETWEEN"       , "band_unit=GHz"],
    ["INDEX_BETWEEN_ERR"   , "band_unit=GHz"],
    ["BRIGHTNESS_TEMP"     , "z=0; flux_unit=Jy; band_unit=GHz; angle_unit=arcsec"],
  // new in 0.3.0: positions, velocities and the rest frame (CHANGELOG.md)
    ["COORD_DEG"           , ""],
    ["COORD_TEXT"          , "decimals=not given"],
    ["SEPARATION"          , "unit=arcsec"],
    ["COORD_CONVERT"       , ""],
    ["VELOCITY"            , "convention=optical; unit=km/s"],
    ["Z_FROM_VELOCITY"     , "convention=optical; unit=km/s"],
    ["Z_COMBINE"           , ""],
    ["VELOCITY_PECULIAR"   , "unit=km/s"],
    ["REST_FRAME"          , "unit=blank"],
    ["OBSERVED_FRAME"      , "unit=blank"],
];

/** Calls with a text argument left blank, and the same with that argument written out as its default. */
const blankAgainstWritten: [string, unknown[], unknown[]][] = [
    // function, arguments with the text unit left blank | the same with the unit written out (its default)
  ["LUMINOSITY_REST", [0.01, 1, -0.7, 3, 1.4, "EDS", "", "", ""], [0.01, 1, -0.7, 3, 1.4, "EDS", "GHz", "", "W/Hz"]],
  ["LUMINOSITY_REST_ERR", [0.01, 0.001, 1, 0.01, -0.7, 0.1, 3, 1.4, "EDS", "", "", ""], [0.01, 0.001, 1, 0.01, -0.7, 0.1, 3, 1.4, "EDS", "GHz", "", "W/Hz"]],
  ["REDSHIFT", [1e5, "VOLUME", "EDS", ""], [1e5, "VOLUME", "EDS", "Mpc3"]],
  ["REDSHIFT", [3000, "DIST_LUM", "EDS", ""], [3000, "DIST_LUM", "EDS", "Mpc"]],
  ["REDSHIFT", [5, "LOOKBACK", "EDS", ""], [5, "LOOKBACK", "EDS", "Gyr"]],
  ["MAG_AB", [12, ""], [12, "Jy"]],
  ["FLUX_AB", [21, ""], [21, "Jy"]],
  ["EXTINCTION", [5000, 0.1, "", "", ""], [5000, 0.1, "Fitzpatrick 1999", 3.1, "Angstrom"]],
  ["EXTINCTION", [5000, 0.1, "Calzetti 2000", "", ""], [5000, 0.1, "Calzetti 2000", 4.05, "Angstrom"]],
  ["INDEX_BETWEEN", [2, 1.4, 1, 5, ""], [2, 1.4, 1, 5, "GHz"]],
  ["INDEX_BETWEEN_ERR", [2, 1.4, 1, 5, 0.1, 0.1, ""], [2, 1.4, 1, 5, 0.1, 0.1, "GHz"]],
  ["BRIGHTNESS_TEMP", [1, 1.4, 2, 1, "", "", "", ""], [1, 1.4, 2, 1, 0, "Jy", "GHz", "arcsec"]],
  ["VELOCITY", [0.7, "", ""], [0.7, "optical", "km/s"]],
  ["Z_FROM_VELOCITY", [3e4, "", ""], [3e4, "optical", "km/s"]],
  ["SEPARATION", [10, 20, 11, 21, ""], [10, 20, 11, 21, "arcsec"]],
  ["VELOCITY_PECULIAR", [0.101, 0.1, ""], [0.101, 0.1, "km/s"]],
  ["SIGMA_CRIT", [0.35, 1.2, "EDS", "", ""], [0.35, 1.2, "EDS", "", "physical"]],
  ["GROWTH", [1, "P18-CMB", ""], [1, "P18-CMB", "smooth"]],
  ["GROWTH_RATE", [1, "P18-CMB", ""], [1, "P18-CMB", "smooth"]],
];

describe("defaults that saved workbooks depend on", () => {
  test("the default model of a workbook that never chose one is P18-CMB", () => {
    expect(defaultModelSpec).toBe("P18-CMB");
    expect(readActiveModel()).toMatchObject({ spec: "P18-CMB", stored: false });
  });

  test("every function is pinned, and no pinned function is gone", () => {
    expect(Object.keys(definitions).sort()).toEqual(pinned.map(([name]) => name).sort());
  });

  test.each(pinned)("%s: %s", (name, defaults) => {
    expect(declaredDefaults(definitions[name])).toBe(defaults);
  });

  test.each(blankAgainstWritten)("%s: a blank text unit (or convention) means its default", (name, blank, written) => {
    const active = { spec: defaultModelSpec, stored: false };
    const a = evaluate(definitions[name], blank, active)[0][0];
    expect(typeof a).toBe("number");
    expect(a).toBe(evaluate(definitions[name], written, active)[0][0]);
  });

  test("the default the help and the pane show for a text argument is the value a blank stands for: a row above writes it out, for every one", () => {
    const checked = new Set<string>();
    for (const [name, blank, written] of blankAgainstWritten) {
      definitions[name].args.forEach((spec, i) => {
        if (spec.kind !== "text" || !spec.blank || !("typed" in spec.blank) || blank[i] !== "") return;
        expect(written[i], `${name} ${spec.name}`).toBe(spec.blank.typed);
        checked.add(`${name} ${spec.name}`);
      });
    }
    const shown = Object.values(definitions).flatMap((d) => d.args.filter((a) => a.kind === "text" && a.blank && "typed" in a.blank).map((a) => `${d.name} ${a.name}`));
    expect(shown.filter((x) => !checked.has(x))).toEqual([]);
    expect(shown.length).toBeGreaterThan(15);
  });

  test("COORD_TEXT: blank decimals are 2 for a right ascension (0.01 s) and 1 for a declination (0.1″)", () => {
    const active = { spec: defaultModelSpec, stored: false };
    expect(evaluate(definitions.COORD_TEXT, [187.70583333333333, "ra", ""], active)[0][0]).toBe("12:30:49.40");
    expect(evaluate(definitions.COORD_TEXT, [12.391111111111111, "dec", null], active)[0][0]).toBe("+12:23:28.0");
  });
});
