import type { UnitSystem } from "../../core/units/quantity.js";
import type { JobDraft } from "./job-state.js";

/** A job with nothing entered yet: the lists are empty and every required field is left for the user. */
export const emptyJob = (units: UnitSystem = "si"): JobDraft => ({
  format: "stitchplan-job",
  version: 1,
  units,
  basis: "allowable",
  mode: "design",
  project: { name: "" },
  member: { mark: "" },
  materials: [],
  parts: [],
  connectors: [],
  fastening: { default: { rows: 1 } },
  beam: { spans: [], loads: [] },
});
