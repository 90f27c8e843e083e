import type { JobIssue } from "./schema/job-issues.js";
import type { JobDocument } from "./schema/job.js";
import { formatNumber, inJobUnits } from "./units/format.js";
import { exceeds, fallsShort } from "./units/limits.js";
import { fromCore, unitLabel, type Quantity } from "./units/quantity.js";

/**
 * A range outside which a number cannot describe a built-up beam, core units, for the size of a
 * number that is not zero (the schema says where zero or a sign is allowed). Inside the ranges every
 * step of the design stays finite; outside them the job is refused at the field rather than computed.
 * README "Performance and limits" lists them.
 */
export interface PhysicalRange {
  quantity: Quantity | null;
  lo: number;
  hi: number;
  what: string;
}

const range = (quantity: Quantity | null, lo: number, hi: number, what: string): PhysicalRange => ({ quantity, lo, hi, what });

const partDimension = range("length", 0.05, 20_000, "part dimensions");
const spacing = range("length", 0.05, 20_000, "spacings");
const connectorSize = range("length", 0.05, 20_000, "connector sizes and distances");
const partPosition = range("length", 0, 100_000, "part positions");
const alongMember = range("span", 0, 500_000, "positions along the member");
const strength = range("stress", 0.01, 10_000, "strengths of structural materials");
const resistance = range("connectorForce", 1, 1e7, "connector resistances");
const slipModulus = range("slipModulus", 1, 1e8, "slip moduli of connectors");
const density = range("density", 1, 25_000, "densities of structural materials");

/** Every number of the job by its field, with the indices of arrays written `[]` and record keys `*`. */
export const physicalRanges: Record<string, PhysicalRange> = {
  "materials[].E": range("modulus", 1, 1e6, "moduli of structural materials"),
  "materials[].density": density,
  "materials[].characteristicDensity": density,
  "materials[].meanDensity": density,
  "materials[].specificGravity": range(null, 0.1, 1.2, "specific gravities of wood"),
  "materials[].strength.bending": strength,
  "materials[].strength.shear": strength,
  "materials[].strength.rollingShear": strength,
  "materials[].strength.compressionPerp": strength,
  "materials[].strength.compression": strength,
  "materials[].Emin": range("modulus", 1, 1e6, "moduli of structural materials"),
  "materials[].yieldStrength": strength,
  "materials[].tensileStrength": strength,
  "parts[].x": partPosition,
  "parts[].y": partPosition,
  "parts[].shape.b": partDimension,
  "parts[].shape.h": partDimension,
  "parts[].shape.d": partDimension,
  "parts[].shape.t": partDimension,
  "parts[].shape.bf": partDimension,
  "parts[].shape.tf": partDimension,
  "parts[].shape.tw": partDimension,
  "parts[].shape.bfBottom": partDimension,
  "parts[].shape.tfBottom": partDimension,
  "parts[].extent.from": alongMember,
  "parts[].extent.to": alongMember,
  "connectors[].diameter": connectorSize,
  "connectors[].rootDiameter": connectorSize,
  "connectors[].length": connectorSize,
  "connectors[].threadLength": connectorSize,
  "connectors[].tipLength": connectorSize,
  "connectors[].leg": connectorSize,
  "connectors[].throat": connectorSize,
  "connectors[].segmentLength": connectorSize,
  "connectors[].pitch": connectorSize,
  "connectors[].minSpacing": connectorSize,
  "connectors[].maxSpacing": connectorSize,
  "connectors[].endDistance": connectorSize,
  "connectors[].edgeDistance": connectorSize,
  "connectors[].groupAction.spacing": connectorSize,
  "connectors[].resistance": resistance,
  "connectors[].withdrawalCapacity": resistance,
  "connectors[].bendingYieldStrength": strength,
  "connectors[].shearStrength": strength,
  "connectors[].tensileStrength": strength,
  "connectors[].slipModulus": slipModulus,
  "connectors[].ultimateSlipModulus": slipModulus,
  "connectors[].modificationFactor": range(null, 0.01, 2, "modification factors"),
  "fastening.default.provided.zones[].from": alongMember,
  "fastening.default.provided.zones[].to": alongMember,
  "fastening.default.provided.zones[].spacing": spacing,
  "fastening.default.provided.positions[]": alongMember,
  "fastening.joints[].provided.zones[].from": alongMember,
  "fastening.joints[].provided.zones[].to": alongMember,
  "fastening.joints[].provided.zones[].spacing": spacing,
  "fastening.joints[].provided.positions[]": alongMember,
  "beam.spans[]": range("span", 1, 500_000, "spans"),
  "beam.loads[].w": range("lineLoad", 0, 1e5, "line loads"),
  "beam.loads[].wStart": range("lineLoad", 0, 1e5, "line loads"),
  "beam.loads[].wEnd": range("lineLoad", 0, 1e5, "line loads"),
  "beam.loads[].P": range("force", 0, 1e8, "point loads"),
  "beam.loads[].M": range("moment", 0, 1e11, "applied couples"),
  "beam.loads[].at": alongMember,
  "beam.loads[].from": alongMember,
  "beam.loads[].to": alongMember,
  "beam.bearingLength": range("length", 5, 2_000, "support bearing lengths"),
  "beam.deflectionLimits.total": range(null, 1, 100_000, "deflection limits (span ÷ ratio)"),
  "beam.deflectionLimits.live": range(null, 1, 100_000, "deflection limits (span ÷ ratio)"),
  "compression.loads[].P": range("force", 0, 1e8, "point loads"),
  "compression.loads[].eccentricity": range("length", 0, 20_000, "eccentricities of axial loads"),
  "compression.x.K": range(null, 0.3, 10, "effective-length factors"),
  "compression.y.K": range(null, 0.3, 10, "effective-length factors"),
  "compression.x.bracedAt[]": alongMember,
  "compression.y.bracedAt[]": alongMember,
  "compression.gammaM": range(null, 1, 3, "partial factors of materials"),
  "compression.spaced.packSpacing": alongMember,
  "compression.spaced.packLength": range("length", 0, 20_000, "pack lengths"),
  "spacing.module": spacing,
  "spacing.preferred[]": spacing,
  "spacing.minimum": spacing,
  "spacing.maximum": spacing,
  "spacing.minZoneLength": range("length", 0, 20_000, "spacings"),
};

/**
 * Fields whose whole range the schema itself states (integers, factors between 0 and 1, angles …),
 * so that every number of the job is covered by one or the other (a test checks it).
 */
export const rangesInSchema = [
  "version",
  "fastening.default.rows",
  "fastening.joints[].rows",
  "spacing.maxZonesPerSpan",
  "beam.categories[].psi0",
  "combinations.psi0.*",
  "combinations.custom[].factors.*",
  "compositeAction.longTerm.psi2",
  "compositeAction.longTerm.kdef",
  "compression.serviceClass",
  "connectors[].fillers",
  "connectors[].groupAction.fasteners",
  "connectors[].mainAngleToGrainDeg",
  "connectors[].sideAngleToGrainDeg",
  "connectors[].partialFactor",
  "connectors[].serviceClass",
];

/** Most rows a provided zone schedule may ask for on one joint, as for a list of positions. */
export const MAX_PROVIDED_ROWS = 5000;

/** Where a number lies in the job: its key and its parent's place (null for the document). */
type Where = { parent: Where; key: string | number } | null;

/** "beam.loads[2].w" as the walk spells it: a key after a dot (none at the start), an index in brackets. */
function pathOf(where: Where): string {
  if (where === null) return "";
  const parent = pathOf(where.parent);
  return typeof where.key === "number" ? `${parent}[${where.key}]` : parent ? `${parent}.${where.key}` : where.key;
}

const patternChildren = new Map<string, Map<string, string>>();
const patternItems = new Map<string, string>();
// Keys can come from the job (a record's own names): past this many kept patterns, they are spelt out each time.
const KEPT_PATTERNS = 4096;
let keptPatterns = 0;

/** The pattern of a field ("beam.loads[].w") from its parent's and its key, made once. */
function patternChild(pattern: string, key: string): string {
  let children = patternChildren.get(pattern);
  let child = children?.get(key);
  if (child !== undefined) return child;
  child = pattern ? `${pattern}.${key}` : key;
  if (keptPatterns < KEPT_PATTERNS) {
    keptPatterns++;
    if (!children) patternChildren.set(pattern, (children = new Map()));
    children.set(key, child);
  }
  return child;
}

/** The pattern of an array's items ("beam.loads[]"), made once. */
function patternItem(pattern: string): string {
  let item = patternItems.get(pattern);
  if (item !== undefined) return item;
  item = `${pattern}[]`;
  if (keptPatterns < KEPT_PATTERNS) {
    keptPatterns++;
    patternItems.set(pattern, item);
  }
  return item;
}

/**
 * The job's numbers against their physical ranges: `job` as written (compared in its own units, so a
 * number too small to survive conversion is still seen) and `core`, the same job in core units. Each
 * issue names the field and the range in the job's units. Sizes are compared with a relative
 * tolerance, so a value on a limit converted from the other unit system stays within it.
 */
export function physicalRangeIssues(job: JobDocument, core: JobDocument): JobIssue[] {
  const issues: JobIssue[] = [];
  const text = (value: number, quantity: Quantity | null) => (quantity ? inJobUnits(value, quantity, core.units) : String(value));
  const inJob = (value: number, quantity: Quantity | null) => (quantity ? fromCore(value, quantity, job.units) : value);
  // The path of a number is spelt out only for an issue; patterns are shared strings (see patternChild).
  const visit = (x: unknown, parent: Where, key: string | number | null, pattern: string) => {
    if (typeof x === "number") {
      const r = physicalRanges[pattern];
      const size = Math.abs(x);
      if (!r || size === 0) return;
      if (fallsShort(size, inJob(r.lo, r.quantity)) || exceeds(size, inJob(r.hi, r.quantity))) {
        issues.push({ path: pathOf(key === null ? parent : { parent, key }), message: `${r.quantity ? `${formatNumber(x)} ${unitLabel(r.quantity, job.units)}` : formatNumber(x)} is outside the range of ${r.what} (${r.lo === 0 ? "up to" : `${text(r.lo, r.quantity)} to`} ${text(r.hi, r.quantity)}${r.lo === 0 && r.quantity !== "span" && r.quantity !== "length" ? " either way" : ""})` });
      }
    } else if (Array.isArray(x)) {
      const here = key === null ? parent : { parent, key };
      const item = patternItem(pattern);
      for (let i = 0; i < x.length; i++) if (i in x) visit(x[i], here, i, item);
    } else if (x && typeof x === "object") {
      const here = key === null ? parent : { parent, key };
      for (const k of Object.keys(x)) visit((x as Record<string, unknown>)[k], here, k, patternChild(pattern, k));
    }
  };
  visit(job, null, null, "");
  const L = core.beam.spans.reduce((s, l) => s + l, 0);
  if (fallsShort(L, 1) || exceeds(L, 500_000)) issues.push({ path: "beam.spans", message: `${text(L, "span")} is outside the range of member lengths (${text(1, "span")} to ${text(500_000, "span")})` });
  if (issues.length > 0) return issues;
  const provided = [
    { path: "fastening.default", fastening: core.fastening.default },
    ...core.fastening.joints.map((j, k) => ({ path: `fastening.joints[${k}]`, fastening: j })),
  ];
  for (const { path, fastening } of provided) {
    const p = fastening.provided;
    if (p?.type !== "zones") continue;
    const rows = p.zones.reduce((n, z) => n + Math.max(0, z.to - z.from) / z.spacing, 0);
    if (rows > MAX_PROVIDED_ROWS) {
      const i = p.zones.reduce((best, z, k) => (z.spacing < p.zones[best]!.spacing ? k : best), 0);
      issues.push({ path: `${path}.provided.zones[${i}].spacing`, message: `${text(p.zones[i]!.spacing, "length")} gives about ${Math.round(rows)} rows on this joint; a schedule to check has at most ${MAX_PROVIDED_ROWS} rows (as a list of positions)` });
    }
  }
  return issues;
}
