/**
 * Quantity kinds and the unit each takes at the edges.
 *
 * Core computes in one coherent system: N, mm, MPa (= N/mm²), N·mm, N/mm, and mass density in kg/m³.
 * A job document and a result are written in one unit system, "si" or "us"; every number in them
 * declares its quantity kind in the schema, and `factor` turns a value in that system into core units.
 */
export const unitSystems = ["si", "us"] as const;
export type UnitSystem = (typeof unitSystems)[number];

const LBF = 4.4482216152605; // N, exact by definition of the pound-force
const INCH = 25.4; // mm, exact
const FOOT = 304.8; // mm, exact
const PSI = LBF / (INCH * INCH); // MPa
const PCF = 16.018463373960138; // kg/m³ per lb/ft³

interface UnitDef {
  label: string;
  factor: number;
}

export const quantityUnits = {
  /** Dimensions of parts, spacings, distances, weld sizes. */
  length: { si: { label: "mm", factor: 1 }, us: { label: "in", factor: INCH } },
  /** Spans and positions along the member. */
  span: { si: { label: "m", factor: 1000 }, us: { label: "ft", factor: FOOT } },
  /** Loads on the beam, shear forces and reactions. */
  force: { si: { label: "kN", factor: 1000 }, us: { label: "lbf", factor: LBF } },
  /** Force on one connector. */
  connectorForce: { si: { label: "N", factor: 1 }, us: { label: "lbf", factor: LBF } },
  /** Distributed load along the member. */
  lineLoad: { si: { label: "kN/m", factor: 1 }, us: { label: "lbf/ft", factor: LBF / FOOT } },
  /** Shear flow along a joint, resistance per unit length of a weld. */
  shearFlow: { si: { label: "N/mm", factor: 1 }, us: { label: "lbf/in", factor: LBF / INCH } },
  /** Slip modulus of one connector. */
  slipModulus: { si: { label: "N/mm", factor: 1 }, us: { label: "lbf/in", factor: LBF / INCH } },
  stress: { si: { label: "MPa", factor: 1 }, us: { label: "psi", factor: PSI } },
  modulus: { si: { label: "MPa", factor: 1 }, us: { label: "psi", factor: PSI } },
  density: { si: { label: "kg/m³", factor: 1 }, us: { label: "lb/ft³", factor: PCF } },
  moment: { si: { label: "kN·m", factor: 1e6 }, us: { label: "lbf·ft", factor: LBF * FOOT } },
  deflection: { si: { label: "mm", factor: 1 }, us: { label: "in", factor: INCH } },
  area: { si: { label: "mm²", factor: 1 }, us: { label: "in²", factor: INCH ** 2 } },
  firstMoment: { si: { label: "mm³", factor: 1 }, us: { label: "in³", factor: INCH ** 3 } },
  secondMoment: { si: { label: "mm⁴", factor: 1 }, us: { label: "in⁴", factor: INCH ** 4 } },
  /** E·I. */
  flexuralRigidity: { si: { label: "kN·m²", factor: 1e9 }, us: { label: "lbf·in²", factor: LBF * INCH ** 2 } },
  /** Q/I: shear flow per unit shear force. */
  perLength: { si: { label: "1/mm", factor: 1 }, us: { label: "1/in", factor: 1 / INCH } },
  /** Q/(I·t): shear stress per unit shear force. */
  perArea: { si: { label: "1/mm²", factor: 1 }, us: { label: "1/in²", factor: 1 / INCH ** 2 } },
} as const satisfies Record<string, Record<UnitSystem, UnitDef>>;

export type Quantity = keyof typeof quantityUnits;
export const quantities = Object.keys(quantityUnits) as Quantity[];

/** Value in the given system → core units. */
export function toCore(value: number, quantity: Quantity, system: UnitSystem): number {
  return value * quantityUnits[quantity][system].factor;
}

/** Value in core units → the given system. */
export function fromCore(value: number, quantity: Quantity, system: UnitSystem): number {
  return value / quantityUnits[quantity][system].factor;
}

export function unitLabel(quantity: Quantity, system: UnitSystem): string {
  return quantityUnits[quantity][system].label;
}

export function unitLabels(system: UnitSystem): Record<Quantity, string> {
  return Object.fromEntries(quantities.map((q) => [q, unitLabel(q, system)])) as Record<Quantity, string>;
}

/** Standard gravity, m/s² (CGPM 1901), used for self-weight. */
export const GRAVITY = 9.80665;
