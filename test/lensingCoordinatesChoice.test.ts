/** The critical surface density refuses coordinates it does not know, naming the two it does. */
import { expect, test } from "vitest";
import { Cosmology } from "../core/distances/Cosmology.js";
import { criticalSurfaceDensityMsunPc2, type LensingCoordinates } from "../core/index.js";

test("coordinates other than physical or comoving are a TypeError naming both", () => {
  // the core's message (core/observables/lensing.ts), pinned as the interface
  const eds = Cosmology.fromSpec("EDS");
  expect(() => criticalSurfaceDensityMsunPc2(eds, 0.5, 2, "proper" as LensingCoordinates)).toThrow(new TypeError('unknown coordinates "proper": use physical or comoving'));
});
