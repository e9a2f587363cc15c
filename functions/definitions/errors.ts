/**
 * Uncertainties: first-order propagation of independent 1σ errors.
 * Each entry: the arguments in the order of the ZC.* signature (built from argumentKinds.ts) and what one
 * cell computes in reference units; the declaration with its JSDoc is in ../declarations/errors.ts.
 */
import {
  absoluteMagnitudeErrorMag,
  frequencyHz,
  janskySI,
  luminosityDistanceErrorMpc,
  luminosityErrorW,
  properSizeErrorMpc,
  restFrameSpectralLuminosityErrorWHz,
  spectralLuminosityErrorWHz,
} from "../../core/index.js";
import type { FunctionDef } from "../FunctionDef.js";
import { num, amount, model, unit, z, err, magErr, angle, m, n, inSpectralOrPowerUnit, bandUnit, spectralOutUnit, textOr } from "./argumentKinds.js";

/** Uncertainties functions, in the order of their declarations. */
export const errors: FunctionDef[] = [
  {
    name: "DIST_LUM_ERR",
    args: [z, err("z_err"), model, unit("unit", "Mpc")],
    compute: (a) => luminosityDistanceErrorMpc(m(a), n(a, "z"), n(a, "z_err")),
  },
  {
    name: "LUMINOSITY_ERR",
    args: [amount("flux"), err("flux_err"), z, err("z_err"), model, unit("flux_unit", "W/m2", "erg/s/cm2", ["flux", "flux_err"]), unit("lum_unit", "W", "erg/s")],
    compute: (a) => luminosityErrorW(m(a), n(a, "flux"), n(a, "flux_err"), n(a, "z"), n(a, "z_err")),
  },
  {
    name: "LUMINOSITY_NU_ERR",
    args: [
      amount("flux_density"), err("flux_density_err"), z, err("z_err"), num("alpha"), err("alpha_err", { default: 0, blankMeansDefault: true }),
      model, unit("in_unit", "Jy", "Jy", ["flux_density", "flux_density_err"]), unit("out_unit", "W/Hz"),
    ],
    compute: (a) =>
      spectralLuminosityErrorWHz(
        m(a), n(a, "flux_density") * janskySI, n(a, "flux_density_err") * janskySI, n(a, "z"), n(a, "z_err"), n(a, "alpha"), n(a, "alpha_err"),
      ),
  },
  {
    name: "MAG_ABS_ERR",
    args: [magErr("m_err"), z, err("z_err"), magErr("kcorr_err", { default: 0, blankMeansDefault: true }), model, num("alpha", { default: Number.NaN, blankMeansDefault: true, blank: { words: "K taken as fixed in z" } })],
    compute: (a) => absoluteMagnitudeErrorMag(m(a), n(a, "m_err"), n(a, "z"), n(a, "z_err"), n(a, "kcorr_err"), n(a, "alpha")),
  },
  {
    name: "SIZE_ERR",
    args: [angle, err("angle_err"), z, err("z_err"), model, unit("angle_unit", "rad", "arcsec", ["angle", "angle_err"]), unit("size_unit", "Mpc", "kpc")],
    compute: (a) => properSizeErrorMpc(m(a), n(a, "angle"), n(a, "angle_err"), n(a, "z"), n(a, "z_err")),
  },
  {
    name: "LUMINOSITY_REST_ERR",
    args: [
      amount("flux_density"), err("flux_density_err"), z, err("z_err"), num("alpha"), err("alpha_err"), num("observed"), num("rest"), model,
      bandUnit, unit("in_unit", "Jy", "Jy", ["flux_density", "flux_density_err"]), spectralOutUnit,
    ],
    compute: (a) => {
      const band = textOr(a, bandUnit);
      const restHz = frequencyHz(n(a, "rest"), band, "rest");
      const sigma = restFrameSpectralLuminosityErrorWHz(
        m(a), n(a, "flux_density") * janskySI, n(a, "flux_density_err") * janskySI, n(a, "z"), n(a, "z_err"), n(a, "alpha"), n(a, "alpha_err"),
        frequencyHz(n(a, "observed"), band, "observed"), restHz,
      );
      return inSpectralOrPowerUnit(a, sigma, restHz);
    },
  },
];
