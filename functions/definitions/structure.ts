/**
 * Structure: the distances of BAO measurements (D_H, D_V), gravitational lensing (Σ_cr), halos
 * (overdensities, radius and mass), and the linear growth of structure.
 * Each entry: the arguments in the order of the ZC.* signature (built from argumentKinds.ts) and what one
 * cell computes in reference units; the declaration with its JSDoc is in ../declarations/structure.ts.
 */
import {
  criticalSurfaceDensityMsunPc2,
  growthFactor,
  growthNeutrinoConventions,
  growthRate,
  type GrowthNeutrinos,
  haloMassMsun,
  haloOverdensity,
  haloRadiusMpc,
  hubbleDistanceAtMpc,
  lensingCoordinates,
  type LensingCoordinates,
  NoSolutionError,
  soundHorizonDragMpc,
  volumeAveragedDistanceMpc,
} from "../../core/index.js";
import type { Args, ArgSpec, FunctionDef } from "../FunctionDef.js";
import { messages } from "../messages.js";
import { amount, m, model, n, num, textOr, textWithDefault, unit, z } from "./argumentKinds.js";

const definition: ArgSpec = { kind: "text", name: "definition" };
const def = (a: Args) => a.definition as string;
/** How massive neutrinos enter the growth: "smooth" (blank) or "clustering". */
const neutrinos = textWithDefault("neutrinos", "smooth", { choices: growthNeutrinoConventions, scalar: true });
const nu = (a: Args) => textOr(a, neutrinos) as GrowthNeutrinos;
/** Σ_cr per physical (blank) or comoving area. */
const coordinates = textWithDefault("coordinates", "physical", { choices: lensingCoordinates, scalar: true });

/** Structure functions, in the order of their declarations. */
export const structure: FunctionDef[] = [
  {
    name: "DIST_HUBBLE",
    args: [z, model, unit("unit", "Mpc")],
    compute: (a) => hubbleDistanceAtMpc(m(a), n(a, "z")),
    kernel: { arg: "z", of: (a, zz) => hubbleDistanceAtMpc(m(a), zz) },
  },
  {
    name: "DIST_VOLUME",
    args: [z, model, unit("unit", "Mpc")],
    compute: (a) => volumeAveragedDistanceMpc(m(a), n(a, "z")),
    kernel: { arg: "z", of: (a, zz) => volumeAveragedDistanceMpc(m(a), zz) },
  },
  {
    name: "SOUND_HORIZON",
    args: [model, unit("unit", "Mpc")],
    compute: (a) => {
      // the core refuses a model without Ob too; here the message can show the model the cell names
      if (!Number.isFinite(m(a).Ob)) throw new NoSolutionError(messages.soundHorizonNeedsOb(m(a).spec));
      return soundHorizonDragMpc(m(a));
    },
  },
  {
    name: "SIGMA_CRIT",
    args: [num("z_lens"), num("z_source"), model, unit("unit", "Msun/pc2"), coordinates],
    compute: (a) => criticalSurfaceDensityMsunPc2(m(a), n(a, "z_lens"), n(a, "z_source"), textOr(a, coordinates) as LensingCoordinates),
  },
  {
    name: "OVERDENSITY",
    args: [z, definition, model],
    compute: (a) => haloOverdensity(m(a), n(a, "z"), def(a)),
  },
  {
    name: "HALO_RADIUS",
    args: [amount("mass"), z, definition, model, unit("mass_unit", "Msun", "Msun", "mass"), unit("radius_unit", "Mpc", "kpc")],
    compute: (a) => haloRadiusMpc(m(a), n(a, "mass"), n(a, "z"), def(a)),
  },
  {
    name: "HALO_MASS",
    args: [amount("radius"), z, definition, model, unit("radius_unit", "Mpc", "kpc", "radius"), unit("mass_unit", "Msun")],
    compute: (a) => haloMassMsun(m(a), n(a, "radius"), n(a, "z"), def(a)),
  },
  {
    name: "GROWTH",
    args: [z, model, neutrinos],
    compute: (a) => growthFactor(m(a), n(a, "z"), nu(a)),
    kernel: { arg: "z", of: (a, zz) => growthFactor(m(a), zz, nu(a)) },
  },
  {
    name: "GROWTH_RATE",
    args: [z, model, neutrinos],
    compute: (a) => growthRate(m(a), n(a, "z"), nu(a)),
    kernel: { arg: "z", of: (a, zz) => growthRate(m(a), zz, nu(a)) },
  },
];
