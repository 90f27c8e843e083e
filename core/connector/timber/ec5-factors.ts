import type { DurationClass } from "../connector-kind.js";

/**
 * EN 1995-1-1:2004+A1:2008 factors for connections: k_mod (Table 3.1), load-duration classes
 * (§2.3.1.2, Table 2.2), γ_M (Table 2.3, recommended values) and slip moduli (Table 7.1, eq. 2.1, 7.1).
 */
export type Ec5Duration = Exclude<DurationClass, "unspecified">;
export type Ec5Product = "solid" | "plywood" | "osb2" | "osb3";
export type ServiceClass = 1 | 2 | 3;

const ORDER: Ec5Duration[] = ["permanent", "long", "medium", "short", "instantaneous"];

/** k_mod by product, service class and duration (permanent, long, medium, short, instantaneous). */
const kmodTable: Record<Ec5Product, Partial<Record<ServiceClass, number[]>>> = {
  // Solid timber, glulam, LVL; plywood takes the same values in the classes it is rated for.
  solid: { 1: [0.6, 0.7, 0.8, 0.9, 1.1], 2: [0.6, 0.7, 0.8, 0.9, 1.1], 3: [0.5, 0.55, 0.65, 0.7, 0.9] },
  plywood: { 1: [0.6, 0.7, 0.8, 0.9, 1.1], 2: [0.6, 0.7, 0.8, 0.9, 1.1], 3: [0.5, 0.55, 0.65, 0.7, 0.9] },
  osb2: { 1: [0.3, 0.45, 0.65, 0.85, 1.1] },
  osb3: { 1: [0.4, 0.5, 0.7, 0.9, 1.1], 2: [0.3, 0.4, 0.55, 0.7, 0.9] },
};

/** k_mod of Table 3.1, or null where the product may not be used in that service class. */
export function ec5Kmod(product: Ec5Product, serviceClass: ServiceClass, duration: Ec5Duration): number | null {
  const row = kmodTable[product][serviceClass];
  return row ? row[ORDER.indexOf(duration)]! : null;
}

/**
 * Duration class of each load category, after the examples of Table 2.2 (the national annex decides):
 * self-weight permanent, imposed floor load medium-term, snow and roof (maintenance) loads short-term,
 * wind short-term (Table 2.2 lists wind under short-term and instantaneous; the lower k_mod is kept). Used only
 * where the combination has no class of its own; the combinations carry the job's class for wind
 * (beam.windDuration, core/beam/load-categories.ts).
 */
export const ec5DurationByCategory: Record<string, Ec5Duration> = { dead: "permanent", live: "medium", snow: "short", "roof-live": "short", wind: "short" };

/** Duration class of a combination: the context's, or else that of its shortest-duration load (§3.1.3(2)). */
export function ec5DurationOf(duration: DurationClass, categories: string[]): { duration: Ec5Duration; why: string } {
  if (duration !== "unspecified") return { duration, why: `${duration === "instantaneous" ? "instantaneous" : `${duration}-term`}, the combination's load-duration class` };
  const known = categories.filter((c) => c in ec5DurationByCategory).map((c) => ({ c, d: ec5DurationByCategory[c]! }));
  if (known.length === 0) return { duration: "medium", why: "no load category given: medium-term assumed" };
  const shortest = known.reduce((a, b) => (ORDER.indexOf(b.d) > ORDER.indexOf(a.d) ? b : a));
  return { duration: shortest.d, why: `shortest-duration load: ${shortest.c} (${shortest.d}-term)` };
}

/** γ_M for connections, fundamental combinations (Table 2.3, recommended value). */
export const EC5_GAMMA_M_CONNECTIONS = 1.3;

/**
 * K_ser per shear plane per fastener, N/mm (Table 7.1; ρ_m in kg/m³, d in mm):
 * nails without predrilling ρ_m^1.5 d^0.8/30; dowels, bolts, screws and predrilled nails ρ_m^1.5 d/23.
 * Steel-to-timber: ×2 on the timber's ρ_m (§7.1(3)).
 */
export function ec5SlipModulus(p: { meanDensity: number; diameter: number; nailNotPredrilled: boolean; steelToTimber: boolean }): { serviceability: number; ultimate: number; formula: string } {
  const base = p.nailNotPredrilled ? (p.meanDensity ** 1.5 * p.diameter ** 0.8) / 30 : (p.meanDensity ** 1.5 * p.diameter) / 23;
  const serviceability = p.steelToTimber ? 2 * base : base;
  return {
    serviceability,
    ultimate: (2 / 3) * serviceability,
    formula: `${p.nailNotPredrilled ? "K_ser = ρ_m^1.5 d^0.8/30" : "K_ser = ρ_m^1.5 d/23"}${p.steelToTimber ? " × 2 (steel-to-timber)" : ""}; K_u = 2/3 K_ser`,
  };
}

/** Mean density of a joint of two wood members, ρ_m = √(ρ_m,1 ρ_m,2) (eq. 7.1). */
export const jointMeanDensity = (a: number, b: number) => Math.sqrt(a * b);
