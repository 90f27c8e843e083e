import { grades, gradeMaterial } from "../materials/grades.js";
import type { JobInput } from "../schema/job.js";
import { lumberSize } from "../section/lumber-sizes.js";
import type { Quantity, UnitSystem } from "../units/quantity.js";

/**
 * Typical build-ups of a new member: each asks for the few sizes that define it and returns a whole
 * job in the job's units, which the form then shows for editing like any other. Materials come from the
 * grade library, connectors are common trade sizes, loads one dead and one live line load. Every value is
 * a starting point for the user, none a recommendation.
 */
export type BuildUpId = "nailed-box" | "nailed-i" | "glued-i" | "glued-laminations" | "side-by-side-plies" | "welded-plate-girder" | "cover-plated-beam";

export interface BuildUpField {
  key: string;
  label: string;
  /** A number in the job's units of this kind, a nominal lumber size ("lumber"), or a whole count. */
  kind: Quantity | "lumber" | "count";
  defaults: Record<UnitSystem, number | string>;
  /** Only for the unit system given. */
  only?: UnitSystem;
}

export interface BuildUp {
  id: BuildUpId;
  name: string;
  /** One line on what the build-up is, shown beside the choice. */
  summary: string;
  fields: BuildUpField[];
}

export type BuildUpSizes = Record<string, number | string>;

const span: BuildUpField = { key: "span", label: "Span", kind: "span", defaults: { si: 5, us: 16 } };
const dead: BuildUpField = { key: "dead", label: "Dead load", kind: "lineLoad", defaults: { si: 1.5, us: 100 } };
const live: BuildUpField = { key: "live", label: "Live load", kind: "lineLoad", defaults: { si: 2, us: 150 } };
const loads = [span, dead, live];

const timberFlange = (what: string, si: [number, number], us: string): BuildUpField[] => [
  { key: "flangeLumber", label: `${what} lumber (nominal)`, kind: "lumber", defaults: { si: "", us }, only: "us" },
  { key: "flangeWidth", label: `${what} width`, kind: "length", defaults: { si: si[0], us: 0 }, only: "si" },
  { key: "flangeDepth", label: `${what} depth`, kind: "length", defaults: { si: si[1], us: 0 }, only: "si" },
];

/** The fields of a timber I: a lumber flange on each edge of one web, 4 m or 12 ft, with its loads' defaults. */
const timberI = (deadLoad: { si: number; us: number }, liveLoad: { si: number; us: number }): BuildUpField[] => [
  ...timberFlange("Flange", [120, 45], "2x6"),
  { key: "webLumber", label: "Web lumber (nominal)", kind: "lumber", defaults: { si: "", us: "2x8" }, only: "us" },
  { key: "webThickness", label: "Web thickness", kind: "length", defaults: { si: 45, us: 0 }, only: "si" },
  { key: "webDepth", label: "Web depth", kind: "length", defaults: { si: 200, us: 0 }, only: "si" },
  { ...span, defaults: { si: 4, us: 12 } },
  { ...dead, defaults: deadLoad },
  { ...live, defaults: liveLoad },
];

export const buildUps: BuildUp[] = [
  {
    id: "nailed-box",
    name: "Nailed box beam",
    summary: "Two lumber flanges between two panel webs, nailed through the webs.",
    fields: [
      ...timberFlange("Flange", [95, 70], "2x4"),
      { key: "webThickness", label: "Web panel thickness", kind: "length", defaults: { si: 18, us: 0.75 } },
      { key: "depth", label: "Overall depth", kind: "length", defaults: { si: 400, us: 16 } },
      { ...span, defaults: { si: 5, us: 14 } },
      { ...dead, defaults: { si: 1.5, us: 60 } },
      { ...live, defaults: { si: 2, us: 90 } },
    ],
  },
  {
    id: "nailed-i",
    name: "Nailed I",
    summary: "A lumber flange on each edge of a single web, nailed through the flanges into the web.",
    fields: timberI({ si: 0.3, us: 20 }, { si: 0.4, us: 30 }),
  },
  {
    id: "glued-i",
    name: "Glued I",
    summary: "A lumber flange on each edge of a single web, glued.",
    fields: timberI({ si: 0.5, us: 40 }, { si: 0.8, us: 60 }),
  },
  {
    id: "glued-laminations",
    name: "Glued laminations",
    summary: "Laminations of one size stacked flat and glued.",
    fields: [
      { key: "width", label: "Lamination width", kind: "length", defaults: { si: 115, us: 5.125 } },
      { key: "thickness", label: "Lamination thickness", kind: "length", defaults: { si: 45, us: 1.5 } },
      { key: "count", label: "Number of laminations", kind: "count", defaults: { si: 6, us: 8 } },
      ...loads,
    ],
  },
  {
    id: "side-by-side-plies",
    name: "Side-by-side plies",
    summary: "Plies of one size on edge, side by side, nailed; optionally a steel plate between the first two (a flitch beam), bolted, centred on the plies' depth.",
    fields: [
      { key: "plyLumber", label: "Ply lumber (nominal)", kind: "lumber", defaults: { si: "", us: "2x12" }, only: "us" },
      { key: "plyThickness", label: "Ply thickness", kind: "length", defaults: { si: 45, us: 0 }, only: "si" },
      { key: "plyDepth", label: "Ply depth", kind: "length", defaults: { si: 220, us: 0 }, only: "si" },
      { key: "count", label: "Number of plies", kind: "count", defaults: { si: 3, us: 3 } },
      { key: "plate", label: "Steel plate thickness between plies 1 and 2 (0 for none)", kind: "length", defaults: { si: 0, us: 0 } },
      { key: "plateDepth", label: "Steel plate depth (0: as deep as the plies)", kind: "length", defaults: { si: 0, us: 0 } },
      { ...span, defaults: { si: 5, us: 12 } },
      dead,
      live,
    ],
  },
  {
    id: "welded-plate-girder",
    name: "Welded plate girder",
    summary: "Two flange plates and a web plate, fillet-welded both sides of the web.",
    fields: [
      { key: "flangeWidth", label: "Flange plate width", kind: "length", defaults: { si: 250, us: 10 } },
      { key: "flangeThickness", label: "Flange plate thickness", kind: "length", defaults: { si: 20, us: 0.75 } },
      { key: "webThickness", label: "Web plate thickness", kind: "length", defaults: { si: 10, us: 0.375 } },
      { key: "webDepth", label: "Web plate depth", kind: "length", defaults: { si: 600, us: 24 } },
      { ...span, defaults: { si: 10, us: 32 } },
      { ...dead, defaults: { si: 15, us: 1000 } },
      { ...live, defaults: { si: 20, us: 1200 } },
    ],
  },
  {
    id: "cover-plated-beam",
    name: "Rolled beam with a cover plate",
    summary: "A rolled I with a plate bolted under its bottom flange over the middle half of the span.",
    fields: [
      { key: "beamDepth", label: "Beam depth d", kind: "length", defaults: { si: 300, us: 12 } },
      { key: "beamFlangeWidth", label: "Beam flange width", kind: "length", defaults: { si: 150, us: 8 } },
      { key: "beamFlangeThickness", label: "Beam flange thickness", kind: "length", defaults: { si: 10.7, us: 0.5 } },
      { key: "beamWebThickness", label: "Beam web thickness", kind: "length", defaults: { si: 7.1, us: 0.3 } },
      { key: "plateWidth", label: "Cover plate width", kind: "length", defaults: { si: 200, us: 10 } },
      { key: "plateThickness", label: "Cover plate thickness", kind: "length", defaults: { si: 15, us: 0.5 } },
      { ...span, defaults: { si: 8, us: 26 } },
      { ...dead, defaults: { si: 10, us: 500 } },
      { ...live, defaults: { si: 15, us: 700 } },
    ],
  },
];

/** The fields a build-up asks for in a unit system. */
export const buildUpFields = (buildUp: BuildUp, units: UnitSystem) => buildUp.fields.filter((f) => !f.only || f.only === units);

/** The build-up's sizes as first offered, in the job's units. */
export const defaultSizes = (buildUp: BuildUp, units: UnitSystem): BuildUpSizes =>
  Object.fromEntries(buildUpFields(buildUp, units).map((f) => [f.key, f.defaults[units]]));

const grade = (id: string) => grades.find((g) => g.id === id)!;

/** Basis and standards that give values for the unit system: Eurocodes (factored) in SI, NDS/AISC (allowable) in US. */
const basisFor = (units: UnitSystem) => (units === "us" ? "allowable" : "factored");

function material(gradeId: string, units: UnitSystem, extra: Record<string, unknown> = {}) {
  return { ...gradeMaterial(grade(gradeId), basisFor(units), units), ...extra };
}

/** Plywood as a nailed web: the library gives no strengths for panels; a US panel also needs its G for NDS nails. */
function panelMaterial(units: UnitSystem) {
  const m = material("PLY", units);
  // NDS Table 12.3.3B: plywood side members G = 0.50 (all other grades) [M].
  return units === "us" ? { ...m, id: "PLY", specificGravity: 0.5 } : { ...m, id: "PLY" };
}

const timberGrade = (units: UnitSystem) => (units === "us" ? "DFL-2" : "C24");
const steelGrade = (units: UnitSystem, rolled = false) => (units === "us" ? (rolled ? "A992" : "A572-50") : "S355");

function nail(units: UnitSystem) {
  return units === "us"
    ? { id: "N", kind: "nail", standard: "NDS-2018", size: "16d common", source: "ASTM F1667 common wire nails" }
    : { id: "N", kind: "nail", standard: "EN1995-1-1", diameter: 3.1, length: 75, shank: "smooth", source: "smooth round wire nails" };
}

const num = (sizes: BuildUpSizes, key: string) => Number(sizes[key]);
const text = (sizes: BuildUpSizes, key: string) => String(sizes[key] ?? "");

/** A part's shape from either a nominal lumber size (US) or a width and depth (SI). */
function timberShape(sizes: BuildUpSizes, units: UnitSystem, lumberKey: string, widthKey: string, depthKey: string, orientation: "edge" | "flat") {
  if (units === "us") return { type: "lumber", nominal: text(sizes, lumberKey), orientation };
  return { type: "rectangle", b: num(sizes, widthKey), h: num(sizes, depthKey) };
}

function frame(buildUp: BuildUp, units: UnitSystem, sizes: BuildUpSizes): Record<string, any> {
  return {
    format: "stitchplan-job",
    version: 1,
    units,
    basis: basisFor(units),
    mode: "design",
    project: { name: "New project" },
    member: { mark: "B-1", description: buildUp.name },
    materials: [],
    parts: [],
    connectors: [],
    fastening: { default: { rows: 1 } },
    beam: {
      spans: [num(sizes, "span")],
      loads: [
        { type: "uniform", category: "dead", label: "dead", w: num(sizes, "dead") },
        { type: "uniform", category: "live", label: "live", w: num(sizes, "live") },
      ],
    },
  };
}

/** The job for a build-up and its sizes, in the job's units. Pure: the same sizes give the same job. */
export function buildUpJob(id: BuildUpId, units: UnitSystem, given: BuildUpSizes = {}): JobInput {
  const buildUp = buildUps.find((b) => b.id === id);
  if (!buildUp) throw new Error(`unknown build-up ${id}`);
  const sizes = { ...defaultSizes(buildUp, units), ...given };
  const job = frame(buildUp, units, sizes);
  const wood = { ...material(timberGrade(units), units), id: "W" };
  switch (id) {
    case "nailed-box": {
      job.materials = [wood, panelMaterial(units)];
      const web = { type: "rectangle", b: num(sizes, "webThickness"), h: num(sizes, "depth") };
      const flange = timberShape(sizes, units, "flangeLumber", "flangeWidth", "flangeDepth", "flat");
      job.parts = [
        { id: "web-left", name: "Left web", material: "PLY", shape: web, x: 0, y: 0 },
        { id: "bottom", name: "Bottom flange", material: "W", shape: flange, place: { on: "web-left", side: "right", align: "start" } },
        { id: "top", name: "Top flange", material: "W", shape: flange, place: { on: "web-left", side: "right", align: "end" } },
        { id: "web-right", name: "Right web", material: "PLY", shape: web, place: { on: "bottom", side: "right", align: "start" } },
      ];
      job.connectors = [nail(units)];
      // A 2x flange on flat is 1.5 in deep: one 16d per row fits across it.
      job.fastening = { default: { connector: "N", rows: units === "us" ? 1 : 2 } };
      break;
    }
    case "nailed-i":
    case "glued-i": {
      job.materials = [wood];
      const flange = timberShape(sizes, units, "flangeLumber", "flangeWidth", "flangeDepth", "flat");
      const web = timberShape(sizes, units, "webLumber", "webThickness", "webDepth", "edge");
      job.parts = [
        { id: "bottom", name: "Bottom flange", material: "W", shape: flange, x: 0, y: 0 },
        { id: "web", name: "Web", material: "W", shape: web, place: { on: "bottom", side: "top" } },
        { id: "top", name: "Top flange", material: "W", shape: flange, place: { on: "web", side: "top" } },
      ];
      job.connectors = id === "glued-i" ? [{ id: "G", kind: "glue", label: "Structural adhesive", source: "" }] : [nail(units)];
      job.fastening = { default: { connector: id === "glued-i" ? "G" : "N", rows: 1 } };
      break;
    }
    case "glued-laminations": {
      job.materials = [{ ...material(units === "us" ? "DFL-2" : "GL24h", units), id: "W" }];
      const count = Math.max(2, Math.round(num(sizes, "count")));
      const shape = { type: "rectangle", b: num(sizes, "width"), h: num(sizes, "thickness") };
      job.parts = Array.from({ length: count }, (_, i) =>
        i === 0 ? { id: "lam-1", name: "Lamination 1 (bottom)", material: "W", shape, x: 0, y: 0 } : { id: `lam-${i + 1}`, name: `Lamination ${i + 1}`, material: "W", shape, place: { on: `lam-${i}`, side: "top" } },
      );
      job.connectors = [{ id: "G", kind: "glue", label: "Structural adhesive", source: "" }];
      job.fastening = { default: { connector: "G", rows: 1 } };
      break;
    }
    case "side-by-side-plies": {
      const count = Math.max(2, Math.round(num(sizes, "count")));
      const plate = num(sizes, "plate");
      const shape = timberShape(sizes, units, "plyLumber", "plyThickness", "plyDepth", "edge");
      job.materials = [wood];
      const parts: Record<string, unknown>[] = [{ id: "ply-1", name: "Ply 1", material: "W", shape, x: 0, y: 0 }];
      let last = "ply-1";
      if (plate > 0) {
        job.materials.push({ ...material(steelGrade(units), units), id: "ST" });
        // Unless its depth is given, the plate is as deep as the plies: a nominal size's depth comes from its dressed width.
        const plyDepth = units === "us" ? dressedDepthIn(text(sizes, "plyLumber")) : num(sizes, "plyDepth");
        const plateDepth = num(sizes, "plateDepth") > 0 ? num(sizes, "plateDepth") : plyDepth;
        // Centred on the plies' depth (a flitch plate shallower than the timber keeps clear of the top and bottom).
        parts.push({ id: "plate", name: "Steel plate", material: "ST", shape: { type: "rectangle", b: plate, h: plateDepth }, place: { on: last, side: "right", align: "centre" } });
        last = "plate";
      }
      for (let i = 2; i <= count; i++) {
        parts.push({ id: `ply-${i}`, name: `Ply ${i}`, material: "W", shape, place: { on: last, side: "right", align: plate > 0 ? "centre" : "start" } });
        last = `ply-${i}`;
      }
      job.parts = parts;
      if (plate > 0) {
        const bolt = units === "us" ? { kind: "timber-bolt", standard: "NDS-2018", size: "5/8", source: "" } : { kind: "timber-bolt", standard: "EN1995-1-1", size: "M16", grade: "4.6", source: "" };
        // One bolt passes through ply, plate and ply: a joint holding the plate, in double shear (not one joint per face).
        job.connectors = [{ id: "B", ...bolt, shear: "double" }, ...(count > 2 ? [{ id: "B1", ...bolt }] : [])];
        job.fastening = { default: { connector: count > 2 ? "B1" : "B", rows: 2 }, joints: [{ held: ["plate"], connector: "B", rows: 2 }] };
      } else {
        job.connectors = [nail(units)];
        job.fastening = { default: { connector: "N", rows: 3 } };
      }
      break;
    }
    case "welded-plate-girder": {
      job.materials = [{ ...material(steelGrade(units), units), id: "ST" }];
      const flange = { type: "rectangle", b: num(sizes, "flangeWidth"), h: num(sizes, "flangeThickness") };
      job.parts = [
        { id: "bottom", name: "Bottom flange", material: "ST", shape: flange, x: 0, y: 0 },
        { id: "web", name: "Web", material: "ST", shape: { type: "rectangle", b: num(sizes, "webThickness"), h: num(sizes, "webDepth") }, place: { on: "bottom", side: "top" } },
        { id: "top", name: "Top flange", material: "ST", shape: flange, place: { on: "web", side: "top" } },
      ];
      job.connectors = [
        units === "us"
          ? { id: "FW", kind: "fillet-weld", standard: "AISC-360-16", leg: 0.25, electrode: "E70", pattern: "continuous", source: "" }
          : { id: "FW", kind: "fillet-weld", standard: "EN1993-1-8", throat: 4, pattern: "continuous", source: "" },
      ];
      job.fastening = { default: { connector: "FW", rows: 2 } };
      break;
    }
    case "cover-plated-beam": {
      job.materials = [{ ...material(steelGrade(units, true), units), id: "BM" }, { ...material(units === "us" ? "A36" : "S355", units), id: "PL" }];
      const L = num(sizes, "span");
      job.parts = [
        { id: "plate", name: "Cover plate", material: "PL", shape: { type: "rectangle", b: num(sizes, "plateWidth"), h: num(sizes, "plateThickness") }, x: 0, y: 0, extent: { from: L / 4, to: (3 * L) / 4 } },
        {
          id: "beam",
          name: "Rolled beam",
          material: "BM",
          shape: { type: "i-section", designation: "", d: num(sizes, "beamDepth"), tw: num(sizes, "beamWebThickness"), bf: num(sizes, "beamFlangeWidth"), tf: num(sizes, "beamFlangeThickness") },
          place: { on: "plate", side: "top" },
        },
      ];
      job.connectors = [units === "us" ? { id: "B", kind: "steel-bolt", standard: "AISC-360-16", size: "3/4", grade: "A", slipCritical: "class-A", source: "" } : { id: "B", kind: "steel-bolt", standard: "EN1993-1-8", size: "M20", grade: "8.8", category: "B", frictionSurface: "A", source: "" }];
      job.fastening = { default: { connector: "B", rows: 2 } };
      break;
    }
  }
  // Parts built from one shape must not share it (structuredClone keeps shared objects shared): editing one part's size in the form would change the other.
  return JSON.parse(JSON.stringify(job)) as JobInput;
}

/** Dressed width of a nominal size in inches (PS 20 dry sizes), for a plate as deep as the plies. */
const dressedDepthIn = (nominal: string) => (/^\d{1,2}x\d{1,2}$/.test(nominal) ? lumberSize(nominal).width / 25.4 : 0);
