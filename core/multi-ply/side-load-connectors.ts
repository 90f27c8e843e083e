/**
 * Connectors that pass a side load across the interfaces of a multi-ply member. The connectors are
 * loaded perpendicular to the grain of the plies: the caller supplies R⊥ per connector per shear plane
 * (bolts: the NDS Z⊥ values or EN 1995-1-1 at 90°; nails: their lateral values), already adjusted for
 * the combination. Units: N, mm, N/mm.
 */
import { allowedSpacings, largestAtMost } from "../spacing/allowed-spacings.js";
import { interfaceTransfer, type Ply, type SideLoad } from "./ply-shares.js";

/**
 * How the plies are fastened. "through": bolts or long screws through every ply, so one fastener
 * has a shear plane at every interface. "per-interface": nails or screws driven from the faces, each
 * designed for the one interface it anchors across (see fastenerReach()).
 */
export interface PlyFastening {
  kind: "through" | "per-interface";
  /** R⊥ per connector per shear plane, N: one value for every interface, or one per interface. */
  resistance: number | number[];
  /** Connectors at each station along the member, in rows across the depth. */
  rows: number;
}

export interface SideLoadZone {
  /** Zone extent along the member, mm. */
  from: number;
  to: number;
  /** Uniform side loads acting together in this zone, N/mm. */
  loads: SideLoad[];
}

export interface InterfaceSpacing {
  interface: number;
  /** Force per unit length to pass, N/mm (negative passes leftward). */
  force: number;
  /** rows·R⊥/|T_k|, mm (Infinity when nothing crosses). */
  requiredSpacing: number;
  /** Spacing given (the zone's common spacing for through-fasteners), mm. */
  spacing: number;
  utilisation: number;
  passes: boolean;
}

export interface SideLoadZoneResult {
  from: number;
  to: number;
  interfaces: InterfaceSpacing[];
  feasible: boolean;
}

/**
 * Required connector spacing by zone for uniform side loads: each interface must pass T_k (N/mm),
 * so rows·R⊥/s ≥ |T_k|. Through-fasteners take one spacing per zone, governed by the worst interface;
 * face-driven fasteners get a spacing per interface. Spacings are the largest allowed (module or
 * preferred list) within the detailing limits.
 */
export function sideLoadSpacing(p: {
  plies: Ply[];
  zones: SideLoadZone[];
  fastening: PlyFastening;
  limits: { minSpacing: number; maxSpacing: number; module: number | null; preferred?: number[] | null };
}): { zones: SideLoadZoneResult[]; passes: boolean; reasons: string[] } {
  const allowed = allowedSpacings({ module: p.limits.module, preferred: p.limits.preferred ?? null, min: p.limits.minSpacing, max: p.limits.maxSpacing });
  if (allowed.length === 0) throw new RangeError(`no allowed spacing between ${p.limits.minSpacing} and ${p.limits.maxSpacing} mm`);
  const reasons: string[] = [];
  const zones = p.zones.map((zone, z): SideLoadZoneResult => {
    const { interfaces } = interfaceTransfer(p.plies, zone.loads);
    // Loads from both faces can cancel at an interface; round-off is not a force to pass.
    const negligible = 1e-12 * zone.loads.reduce((s, l) => s + Math.abs(l.magnitude), 0);
    const required = interfaces.map((t) => {
      const r = resistanceAt(p.fastening, t.interface, p.plies.length);
      return Math.abs(t.force) > negligible ? (p.fastening.rows * r) / Math.abs(t.force) : Infinity;
    });
    const pick = (s: number) => largestAtMost(allowed, s);
    const chosen = p.fastening.kind === "through"
      ? interfaces.map(() => pick(Math.min(...required)))
      : required.map(pick);
    const feasible = chosen.every((s) => s !== undefined);
    if (!feasible) reasons.push(`zone ${z + 1} (${zone.from}–${zone.to} mm): the smallest allowed spacing does not pass the side load`);
    return {
      from: zone.from,
      to: zone.to,
      feasible,
      interfaces: interfaces.map((t, k) => {
        const spacing = chosen[k] ?? allowed[0]!;
        const r = resistanceAt(p.fastening, t.interface, p.plies.length);
        const utilisation = (Math.abs(t.force) * spacing) / (p.fastening.rows * r);
        return { interface: t.interface, force: t.force, requiredSpacing: required[k]!, spacing, utilisation, passes: utilisation <= 1 + 1e-9 };
      }),
    };
  });
  return { zones, passes: zones.every((z) => z.feasible), reasons };
}

export interface ConcentratedTransfer {
  interfaces: { interface: number; force: number; connectorsNeeded: number }[];
  /** Connectors to place within the transfer length (through-fasteners: the worst interface; face-driven: the sum over interfaces). */
  connectorsNeeded: number;
  /** Stations along the member (each with `rows` connectors) needed for the worst interface. */
  stationsNeeded: number;
  /** Distance each side of the load within which the connectors count, mm. */
  transferDistance: number;
  /** Whether those stations fit within 2 × transferDistance at the smallest spacing. */
  fits: boolean;
  rule: string;
}

/**
 * A concentrated side load (a girder or joist hanger on one face): each interface must pass T_k (N)
 * close to the load. Connectors count when they lie within the transfer distance each side of the
 * load: half the member depth by default [CP] (a stated practice, not a code rule; pass another value
 * where the connector kind or the engineer says so). Uniform side loads over the same length
 * (N/mm) add their share to the same connectors.
 */
export function concentratedSideLoad(p: {
  plies: Ply[];
  /** Concentrated side loads at this position acting together, N. */
  loads: SideLoad[];
  fastening: PlyFastening;
  /** Member depth d, mm. */
  depth: number;
  /** Smallest spacing of stations along the member, mm. */
  minSpacing: number;
  transferDistance?: number;
  uniformLoads?: SideLoad[];
}): ConcentratedTransfer {
  const distance = p.transferDistance ?? p.depth / 2;
  if (!(distance > 0)) throw new RangeError(`transfer distance must be positive, got ${distance}`);
  const point = interfaceTransfer(p.plies, p.loads).interfaces;
  const line = p.uniformLoads && p.uniformLoads.length > 0 ? interfaceTransfer(p.plies, p.uniformLoads).interfaces : null;
  const interfaces = point.map((t, k) => {
    const force = t.force + (line ? line[k]!.force * 2 * distance : 0);
    const r = resistanceAt(p.fastening, t.interface, p.plies.length);
    return { interface: t.interface, force, connectorsNeeded: Math.ceil(Math.abs(force) / r - 1e-9) };
  });
  const worst = Math.max(0, ...interfaces.map((t) => t.connectorsNeeded));
  const connectorsNeeded = p.fastening.kind === "through" ? worst : interfaces.reduce((s, t) => s + t.connectorsNeeded, 0);
  const stationsNeeded = Math.ceil(worst / p.fastening.rows - 1e-9);
  const stationsThatFit = Math.floor((2 * distance) / p.minSpacing + 1e-9) + 1;
  return {
    interfaces,
    connectorsNeeded,
    stationsNeeded,
    transferDistance: distance,
    fits: stationsNeeded <= stationsThatFit,
    rule: p.transferDistance === undefined
      ? "connectors within d/2 each side of the load [CP]"
      : `connectors within ${distance} mm each side of the load (given)`,
  };
}

function resistanceAt(f: PlyFastening, interfaceNumber: number, plies: number): number {
  const r = typeof f.resistance === "number" ? f.resistance : f.resistance[interfaceNumber - 1];
  if (typeof f.resistance !== "number" && f.resistance.length !== plies - 1) {
    throw new RangeError(`one resistance per interface: expected ${plies - 1}, got ${f.resistance.length}`);
  }
  if (r === undefined || !(r > 0)) throw new RangeError(`interface ${interfaceNumber} needs a positive R⊥, got ${r}`);
  if (!(f.rows >= 1)) throw new RangeError(`rows across the depth must be at least 1, got ${f.rows}`);
  return r;
}
