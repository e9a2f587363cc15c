/** The critical surface density refuses coordinates it does not know, naming the two it does. */
import { expect, test } from "vitest";
import { Cosmology } from "../core/distances/Cosmology.js";
import { criticalSurfaceDensityMsunPc2, type LensingCoordinates } from "../core/index.js";

test("coordinates other than physical or comoving are a TypeError naming both", () => {
  // the core's message (core/observables/lensing.ts), pinned as the interface
  const eds = Cosmology.fromSpec("EDS");
  expect(() => criticalSurfaceDensityMsunPc2(eds, 0.5, 2, "proper" as LensingCoordinates)).toThrow(new TypeError('unknown coordinates "proper": use physical or comoving'));
});

test("without coordinates Σ_cr is per physical area: the documented EdS example, 2804.7 M☉/pc² for z_l = 0.5, z_s = 2", () => {
  // the doc example of criticalSurfaceDensityMsunPc2 (core/observables/lensing.ts), to its 5 figures
  const eds = Cosmology.fromSpec("EDS");
  const omitted = criticalSurfaceDensityMsunPc2(eds, 0.5, 2);
  expect(omitted).toBe(criticalSurfaceDensityMsunPc2(eds, 0.5, 2, "physical"));
  expect(Math.abs(omitted - 2804.7)).toBeLessThanOrEqual(0.05);
});
