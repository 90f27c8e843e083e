/**
 * What a person calls each field of the job document, in the trade's words, with a short hint where
 * the name alone does not say enough. Keys are the document's own; "kind.key" overrides for one kind.
 */
export interface FieldName {
  label: string;
  hint?: string;
  /** Unit of a number that has no quantity kind (an angle, a ratio). */
  unit?: string;
  /** Words for the values of a choice. */
  values?: Record<string, string>;
}

const names: Record<string, FieldName> = {
  label: { label: "Label", hint: "Printed on the schedule; the trade description when empty." },
  source: { label: "Source", hint: "Product standard, evaluation report or supplier." },
  standard: { label: "Design standard", values: { "NDS-2018": "NDS 2018 (US)", "EN1995-1-1": "EN 1995-1-1 (Eurocode 5)", "AISC-360-16": "AISC 360-16 (US)", "EN1993-1-8": "EN 1993-1-8 (Eurocode 3)" } },
  shear: { label: "Shear planes", values: { single: "single shear", double: "double shear" } },
  sideAngleToGrainDeg: { label: "Load to grain, head side", unit: "°" },
  mainAngleToGrainDeg: { label: "Load to grain, point side", unit: "°" },
  moisture: { label: "Moisture in service (NDS C_M)", values: { dry: "dry", wet: "wet in service", "fabricated-wet": "fabricated wet, used dry" } },
  temperature: { label: "Sustained temperature (NDS C_t)", values: { "up-to-100F": "up to 100 °F", "100-125F": "100–125 °F", "125-150F": "125–150 °F" } },
  endGrain: { label: "Driven into end grain" },
  serviceClass: { label: "Service class (EN 1995)", values: { "1": "1 (heated indoors)", "2": "2 (covered)", "3": "3 (exposed)" } },
  panel: { label: "Panel product (EN 1995)", values: { plywood: "plywood", osb2: "OSB/2", osb3: "OSB/3" } },
  withdrawalCapacity: { label: "Withdrawal capacity F_ax,Rk", hint: "For the rope effect; left out when empty." },
  groupAction: { label: "Several fasteners loaded together in one row (group action)" },
  "groupAction.fasteners": { label: "Fasteners in the row" },
  "groupAction.spacing": { label: "Their spacing" },
  size: { label: "Size", hint: "A trade size, or leave empty and give the diameter." },
  "nail.size": { label: "Size", hint: "e.g. 16d common, 10d box; or leave empty and give diameter and length." },
  "lag-screw.size": { label: "Size", hint: "e.g. 1/2 (in); or give the diameter." },
  "timber-bolt.size": { label: "Size", hint: "e.g. 5/8 (in) or M16; or give the diameter." },
  "steel-bolt.size": { label: "Size", hint: "3/4 (AISC) or M20 (EN); or give the diameter." },
  diameter: { label: "Diameter" },
  length: { label: "Length" },
  shank: { label: "Shank", values: { smooth: "smooth round", square: "square or grooved", threaded: "ring or helical thread" } },
  predrilled: { label: "Pre-drilled" },
  toeNailed: { label: "Toe-nailed (NDS C_tn)" },
  bendingYieldStrength: { label: "Bending yield strength F_yb", hint: "When not the value for the diameter." },
  tensileStrength: { label: "Tensile strength f_u" },
  "timber-bolt.tensileStrength": { label: "Tensile strength f_u,k" },
  gauge: { label: "Gauge", hint: "e.g. 10 (US screw gauge); or give the diameter." },
  rootDiameter: { label: "Root diameter" },
  threadLength: { label: "Thread length" },
  tipLength: { label: "Tip length" },
  type: { label: "Fastener", values: { bolt: "bolt", dowel: "dowel" } },
  grade: { label: "Grade" },
  "timber-bolt.grade": { label: "Steel grade (EN)", hint: "e.g. 4.6, 8.8" },
  "steel-bolt.grade": { label: "Grade", hint: "A, B or A307 (AISC); 4.6 … 10.9 (EN)" },
  threads: { label: "Threads in the shear plane", values: { included: "included (N)", excluded: "excluded (X)" } },
  holeType: { label: "Holes", values: { standard: "standard", oversized: "oversized", "short-slot-transverse": "short slot, across", "short-slot-parallel": "short slot, along", "long-slot-transverse": "long slot, across", "long-slot-parallel": "long slot, along" } },
  slipCritical: { label: "Slip-critical", values: { no: "no (bearing)", "class-A": "class A surface", "class-B": "class B surface" } },
  fillers: { label: "Fillers between plies" },
  category: { label: "Category (EN 1993-1-8 §3.4.1)", values: { A: "A, bearing type", B: "B, slip-resistant at serviceability", C: "C, slip-resistant at ultimate" } },
  frictionSurface: { label: "Class of friction surface", values: { A: "class A (μ 0.5)", B: "class B (μ 0.4)", C: "class C (μ 0.3)", D: "class D (μ 0.2)" } },
  deformationConsidered: { label: "Hole deformation at service load is a design consideration" },
  weathering: { label: "Unpainted weathering steel" },
  endDistance: { label: "End distance" },
  edgeDistance: { label: "Edge distance" },
  minSpacing: { label: "Minimum spacing" },
  maxSpacing: { label: "Maximum spacing" },
  resistance: { label: "Resistance per connector" },
  resistanceBasis: { label: "The rating is", values: { allowable: "an allowable value", design: "a design value", characteristic: "a characteristic value" } },
  partialFactor: { label: "Partial factor γ_M" },
  modificationFactor: { label: "Modification factor k_mod" },
  slipModulus: { label: "Slip modulus K_ser" },
  ultimateSlipModulus: { label: "Slip modulus K_u" },
  shearStrength: { label: "Adhesive shear strength", hint: "Only where the adhesive is weaker than the wood." },
  leg: { label: "Leg size w", hint: "Or give the throat." },
  throat: { label: "Throat a" },
  electrode: { label: "Electrode (AISC)" },
  pattern: { label: "Weld", values: { continuous: "continuous", intermittent: "intermittent" } },
  segmentLength: { label: "Segment length" },
  pitch: { label: "Largest pitch", hint: "Centre to centre of segments." },
  arrangement: { label: "Both sides of a web", values: { chain: "chain (opposite)", staggered: "staggered" } },
  // Materials
  specificGravity: { label: "Specific gravity G", hint: "NDS dowel bearing." },
  characteristicDensity: { label: "Characteristic density ρ_k", hint: "EN 1995 embedment." },
  meanDensity: { label: "Mean density ρ_mean", hint: "EN 1995 slip moduli." },
  yieldStrength: { label: "Yield strength F_y" },
  "material.tensileStrength": { label: "Tensile strength F_u" },
  rollingShear: { label: "Rolling shear strength" },
  compressionPerp: { label: "Compression ⊥ grain", hint: "F_c⊥ / f_c,90: bearing of plies at the supports." },
  "material.compression": { label: "Compression ∥ grain", hint: "F_c / f_c,0: what a column carries." },
  bearingLength: { label: "Bearing length at supports", hint: "3 in (76.2 mm) when empty." },
  // Shapes
  b: { label: "b" },
  h: { label: "h" },
  d: { label: "d" },
  tw: { label: "t_w" },
  bf: { label: "b_f" },
  tf: { label: "t_f" },
  bfBottom: { label: "b_f bottom" },
  tfBottom: { label: "t_f bottom" },
  t: { label: "t" },
  nominal: { label: "nominal", hint: "e.g. 2x10" },
  orientation: { label: "on", values: { edge: "edge", flat: "flat" } },
  toes: { label: "toes", values: { right: "right", left: "left" } },
  flange: { label: "flange", values: { top: "top", bottom: "bottom" } },
  heel: { label: "heel", values: { "bottom-left": "bottom left", "bottom-right": "bottom right", "top-left": "top left", "top-right": "top right" } },
  designation: { label: "designation" },
  // Column (job.compression)
  eccentricity: { label: "Eccentricity e" },
  ends: { label: "End conditions" },
  K: { label: "K_e" },
  bracedAt: { label: "Brace point" },
  rule: { label: "Built-up column rule" },
  packing: { label: "Packing part" },
  packSpacing: { label: "Pack spacing l_1" },
  packLength: { label: "Pack length l_2" },
  gammaM: { label: "Timber γ_M" },
};

export function fieldName(key: string, scope?: string): FieldName {
  return (scope ? names[`${scope}.${key}`] : undefined) ?? names[key] ?? { label: key.replace(/([A-Z])/g, " $1").toLowerCase() };
}

export const valueName = (key: string, value: string, scope?: string) => fieldName(key, scope).values?.[value] ?? value.replace(/-/g, " ");

const timberKinds = ["nail", "wood-screw", "lag-screw", "timber-bolt"];

/**
 * Whether a field applies to a connector as it stands: a field of the other standard, or of an
 * intermittent weld on a continuous one, is not offered (the service would refuse it). A field
 * that holds a value is always shown, so nothing in the document is hidden.
 */
export function connectorFieldApplies(kind: string, key: string, connector: Record<string, unknown>): boolean {
  if (connector[key] !== undefined) return true;
  const standard = connector.standard;
  if (timberKinds.includes(kind)) {
    const ndsOnly = ["moisture", "temperature", "endGrain", "toeNailed", "bendingYieldStrength"];
    const ec5Only = ["serviceClass", "panel", "withdrawalCapacity", "tensileStrength", "grade"];
    if (standard === "NDS-2018" && ec5Only.includes(key)) return false;
    if (standard === "EN1995-1-1" && ndsOnly.includes(key)) return false;
  }
  if (kind === "steel-bolt" && standard === "EN1993-1-8" && ["holeType", "slipCritical", "fillers", "deformationConsidered"].includes(key)) return false;
  if (kind === "steel-bolt" && standard !== "EN1993-1-8" && ["category", "frictionSurface"].includes(key)) return false;
  if (kind === "steel-bolt" && key === "frictionSurface" && (connector.category ?? "A") === "A") return false;
  if (kind === "fillet-weld") {
    if (key === "electrode" && standard === "EN1993-1-8") return false;
    if (["segmentLength", "pitch", "arrangement"].includes(key) && connector.pattern !== "intermittent") return false;
  }
  if (kind === "rated" && ["partialFactor", "modificationFactor"].includes(key) && connector.resistanceBasis !== "characteristic") return false;
  return true;
}

/** Fields whose change decides which others apply: the card is drawn again after it. */
export const controllingFields = ["standard", "pattern", "resistanceBasis", "category"];

/** Fields a person rarely changes: kept in a fold under the main ones. */
export const seldomFields = new Set([
  "sideAngleToGrainDeg",
  "mainAngleToGrainDeg",
  "moisture",
  "temperature",
  "endGrain",
  "serviceClass",
  "panel",
  "withdrawalCapacity",
  "groupAction",
  "bendingYieldStrength",
  "tensileStrength",
  "toeNailed",
  "holeType",
  "slipCritical",
  "fillers",
  "deformationConsidered",
  "weathering",
  "slipModulus",
  "ultimateSlipModulus",
  "rootDiameter",
  "threadLength",
  "tipLength",
]);
