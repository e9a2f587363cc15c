/**
 * Models and utilities: building and describing models, parameters, presets, unit conversion, version.
 * Each entry: the arguments in the order of the ZC.* signature (built from argumentKinds.ts) and what one
 * cell computes in reference units; the declaration with its JSDoc is in ../declarations/modelsAndUtilities.ts.
 */
import {
  convertUnit,
  Cosmology,
  formatModelSpec,
  presets,
  rescaledValue,
  rescaleQuantities,
  withChanges,
  type RescaleQuantity,
} from "../../core/index.js";
import { messages } from "../messages.js";
import { describeModel, versionText } from "../describeModel.js";
import type { ArgSpec, Cell, FunctionDef } from "../FunctionDef.js";
import { modelPairs, num, model, m, n, z } from "./argumentKinds.js";

/** ZC.PARAM names → value. */
const parameters: Record<string, (model: Cosmology) => number> = {
  H0: (x) => x.H0,
  h: (x) => x.h,
  Om: (x) => x.Om,
  OL: (x) => x.OL,
  Ok: (x) => x.Ok,
  Or: (x) => x.Or,
  Ob: (x) => {
    if (!Number.isFinite(x.Ob)) throw new RangeError(messages.notGiven("Ob"));
    return x.Ob;
  },
  w0: (x) => x.w0,
  wa: (x) => x.wa,
  Tcmb: (x) => x.Tcmb,
  Neff: (x) => x.Neff,
  mnu: (x) => x.mnuTotalEv,
  age_today: (x) => x.ageTodayGyr,
  hubble_time: (x) => x.hubbleTimeGyr,
  hubble_distance: (x) => x.hubbleDistanceMpc,
  z_eq: (x) => {
    if (!Number.isFinite(x.equalityRedshift)) throw new RangeError(messages.noEquality);
    return x.equalityRedshift;
  },
};



/** Models and utilities functions, in the order of their declarations. */
export const modelsAndUtilities: FunctionDef[] = [
  {
    name: "CONVERT",
    args: [num("value"), { kind: "text", name: "from", scalar: true }, { kind: "text", name: "to", scalar: true }, model],
    compute: (a) => convertUnit(n(a, "value"), a.from as string, a.to as string, m(a).h),
  },
  {
    name: "MODEL",
    args: [
      model,
      ...Array.from({ length: modelPairs }, (_, i): ArgSpec[] => [
        { kind: "text", name: `key${i + 1}`, optional: true, blank: { words: "no change" } },
        { kind: "numberOrText", name: `value${i + 1}`, blank: { words: "no change" } },
      ]).flat(),
    ],
    compute: (a) => {
      const changes: [string, number | string][] = [];
      for (let i = 1; i <= modelPairs; i++) {
        const key = a[`key${i}`] as string | undefined;
        const value = a[`value${i}`] as number | string | undefined;
        if (!key) {
          if (value !== undefined) throw new TypeError(messages.pairWithoutKey(i));
          continue;
        }
        if (value === undefined) throw new TypeError(`key${i} "${key}" has no value${i}`);
        changes.push([key, value]);
      }
      const p = withChanges(m(a).parameters, changes);
      new Cosmology(p); // validates the physics, so a bad model errors here, not later
      return formatModelSpec(p);
    },
  },
  {
    name: "PARAM",
    args: [{ kind: "text", name: "name", choices: Object.keys(parameters) }, model],
    compute: (a) => parameters[a.name as string](m(a)),
  },
  {
    name: "PRESETS",
    args: [],
    table: (active): Cell[][] => [
      ["preset", "description and source"],
      ...presets.map((p) => [p.name, p.description]),
      ...[...(active.models?.specs ?? [])].map(([name, spec]) => [name, `defined in this workbook: ${spec}`]),
    ],
  },
  {
    name: "DESCRIBE",
    args: [model],
    compute: (a) => describeModel(m(a)),
  },
  {
    name: "VERSION",
    args: [],
    table: (): Cell[][] => [[versionText()]],
  },
  {
    name: "RESCALE",
    args: [
      num("value"), z, { kind: "text", name: "quantity", choices: rescaleQuantities },
      { kind: "model", name: "from_model", required: true }, { kind: "model", name: "to_model" },
      { kind: "text", name: "unit", scalar: true, optional: true, blank: { words: "a unit without h" } },
    ],
    compute: (a) => rescaledValue(n(a, "value"), n(a, "z"), a.quantity as RescaleQuantity, a.from_model as Cosmology, a.to_model as Cosmology, a.unit as string),
  },
];
