import { foldAngle } from "./nds-yield-limit.js";
import { exceeds, fallsShort } from "../../units/limits.js";

/**
 * Spacings and distances of dowel-type fasteners in one wood member, mm, expressed along the
 * connector line (the member axis, the direction of the shear flow) and across it.
 */
export interface MemberSpacing {
  /** Least spacing of rows along the line. */
  along: number;
  /** Least spacing of connectors of one row across the line. */
  across: number;
  /** Least distance from the member end. */
  end: number;
  /** Least distance from an edge parallel to the line (for a force across the grain, the loaded edge: the one the fastener pushes toward). */
  edge: number;
  /** For a force across the grain only: the least distance from the unloaded edge. */
  unloadedEdge?: number;
  source: string;
}

export type DowelFamily = "nail" | "screw" | "lag-screw" | "bolt" | "dowel";

/**
 * NDS-2018. Bolts and lag screws (D = shank diameter): Tables 12.5.1A–D for full design value
 * (C_Δ = 1.0). Nails and wood screws: the NDS asks only for spacing that prevents splitting (§12.1.6),
 * so common-practice values after the NDS Commentary's recommended nail spacings are used.
 */
export function ndsSpacing(p: { family: DowelFamily; diameterIn: number; angleDeg: number; prebored: boolean; slenderness: number; grainAlongLine?: boolean }): MemberSpacing {
  const D = p.diameterIn * 25.4;
  const perpendicular = foldAngle(p.angleDeg) > 45;
  if (p.family === "nail" || p.family === "screw") {
    const k = p.prebored ? 10 : 15;
    const rows = p.prebored ? 3 : 5;
    const s = { along: k * D, across: rows * D, end: k * D, edge: 2.5 * D };
    if (p.grainAlongLine && perpendicular) {
      // A force across the member between side-by-side plies, the grain along it: the spacings along the grain stay
      // those along the member; the edge the nails push the wood toward keeps the end distance, the other 2.5D [CP].
      return {
        ...s,
        edge: k * D,
        unloadedEdge: 2.5 * D,
        source: `NDS-2018 §12.1.6: spacing to prevent splitting; common practice [CP]: ${k}D along the grain (along the member), ${rows}D across it, end ${k}D; force across the grain: loaded edge ${k}D, unloaded edge 2.5D`,
      };
    }
    return {
      ...(perpendicular ? { along: s.across, across: s.along, end: 4 * D, edge: s.end } : s),
      source: `NDS-2018 §12.1.6: spacing to prevent splitting; common practice [CP]: ${k}D along the grain, ${rows}D between rows, end ${perpendicular ? "4D (loaded edge)" : `${k}D`}, edge 2.5D`,
    };
  }
  const ratio = p.slenderness;
  const betweenRows = ratio <= 2 ? 2.5 * D : ratio >= 6 ? 5 * D : ((5 * ratio + 10) / 8) * D;
  if (p.grainAlongLine && perpendicular) {
    // A force across the member between side-by-side plies, the grain along it. An NDS row is aligned with the load
    // (§11.3.6.1), so here a row stands across the depth and rows follow one another along the grain: Table 12.5.1D
    // (ℓ/D) sets the spacing along the member. Within a row (across the depth, across the grain) Table 12.5.1B asks
    // for the spacing the attached member needs; 4D is taken, and never less than the ℓ/D spacing [CP].
    return {
      along: betweenRows,
      across: Math.max(4 * D, betweenRows),
      end: 4 * D,
      edge: 4 * D,
      unloadedEdge: 1.5 * D,
      source: `NDS-2018 Tables 12.5.1A–D, load perpendicular to grain (a force across the member, grain along it) [M]: end 4D, loaded edge 4D, unloaded edge 1.5D (Table 12.5.1C); between rows along the grain ${round(betweenRows / D)}D at ℓ/D = ${round(ratio)} (Table 12.5.1D: 2.5D at ℓ/D ≤ 2, (5ℓ/D + 10)/8 · D between, 5D at ℓ/D ≥ 6); within a row across the grain ${round(Math.max(4 * D, betweenRows) / D)}D (Table 12.5.1B: as the attached member needs; 4D and at least the ℓ/D spacing [CP])`,
    };
  }
  if (!perpendicular) {
    const across = Math.min(1.5 * D, 5 * 25.4);
    return {
      along: 4 * D,
      across,
      end: 7 * D,
      edge: ratio <= 6 ? 1.5 * D : Math.max(1.5 * D, across / 2),
      source: "NDS-2018 Tables 12.5.1A–D (load parallel to grain, full design value, C_Δ = 1.0): spacing 4D, end 7D (tension member, softwood), edge 1.5D, rows 1.5D ≤ 5 in [M]",
    };
  }
  return {
    along: betweenRows,
    across: 4 * D,
    end: 4 * D,
    edge: 4 * D,
    source: "NDS-2018 Tables 12.5.1A–D (load perpendicular to grain, full design value): loaded edge 4D, end 4D, spacing 4D, rows 2.5D–5D by ℓ/D [M]",
  };
}

export type Ec5Placement = "timber" | "plywood" | "osb";

/**
 * EN 1995-1-1 Tables 8.2 (nails; screws up to 6 mm), 8.4 (bolts; screws and lag screws over 6 mm)
 * and 8.5 (dowels). α is the angle between the force (along the member) and the grain.
 */
export function ec5Spacing(p: { family: DowelFamily; d: number; angleDeg: number; characteristicDensity: number; predrilled: boolean; placement: Ec5Placement; steelToTimber: boolean; grainAlongLine?: boolean }): MemberSpacing & { table: Ec5Distances } {
  const { d } = p;
  const a = (foldAngle(p.angleDeg) * Math.PI) / 180;
  const cos = Math.abs(Math.cos(a));
  const sin = Math.abs(Math.sin(a));
  const nailRules = p.family === "nail" || (p.family === "screw" && !exceeds(d, 6)) || (p.family === "lag-screw" && !exceeds(d, 6));
  let a1: number, a2: number, a3t: number, a3c: number, a4t: number, a4c: number;
  let source: string;
  if (nailRules) {
    if (p.predrilled) {
      [a1, a2, a3t, a3c] = [(4 + cos) * d, (3 + sin) * d, (7 + 5 * cos) * d, 7 * d];
      a4t = (fallsShort(d, 5) ? 3 + 2 * sin : 3 + 4 * sin) * d;
      a4c = 3 * d;
      source = "EN 1995-1-1 Table 8.2 (predrilled)";
    } else if (!exceeds(p.characteristicDensity, 420)) {
      [a1, a2, a3t, a3c] = [(fallsShort(d, 5) ? 5 + 5 * cos : 5 + 7 * cos) * d, 5 * d, (10 + 5 * cos) * d, 10 * d];
      a4t = (fallsShort(d, 5) ? 5 + 2 * sin : 5 + 5 * sin) * d;
      a4c = 5 * d;
      source = "EN 1995-1-1 Table 8.2 (not predrilled, ρ_k ≤ 420 kg/m³)";
    } else {
      [a1, a2, a3t, a3c] = [(7 + 8 * cos) * d, 7 * d, (15 + 5 * cos) * d, 15 * d];
      a4t = (fallsShort(d, 5) ? 7 + 2 * sin : 7 + 5 * sin) * d;
      a4c = 7 * d;
      source = "EN 1995-1-1 Table 8.2 (not predrilled, 420 < ρ_k ≤ 500 kg/m³)";
    }
    if (p.placement !== "timber") {
      a1 *= 0.85;
      a2 *= 0.85;
      source += "; spacings × 0.85 in a panel (§8.3.1.3)";
      if (p.placement === "plywood") {
        [a3t, a4t] = [(3 + 4 * sin) * d, (3 + 4 * sin) * d];
        [a3c, a4c] = [3 * d, 3 * d];
        source += ", plywood edges and ends 3d unloaded, (3 + 4 sin α)d loaded";
      }
    }
    if (p.steelToTimber) {
      a1 *= 0.7;
      a2 *= 0.7;
      source += "; spacings × 0.7 for steel-to-timber (§8.3.1.4)";
    }
  } else if (p.family === "dowel") {
    [a1, a2, a3t] = [(3 + 2 * cos) * d, 3 * d, Math.max(7 * d, 80)];
    a3c = Math.max(a3t * sin, 3 * d);
    [a4t, a4c] = [Math.max((2 + 2 * sin) * d, 3 * d), 3 * d];
    source = "EN 1995-1-1 Table 8.5 (dowels)";
  } else {
    [a1, a2, a3t] = [(4 + cos) * d, 4 * d, Math.max(7 * d, 80)];
    a3c = Math.max((1 + 6 * sin) * d, 4 * d);
    [a4t, a4c] = [Math.max((2 + 2 * sin) * d, 3 * d), 3 * d];
    source = "EN 1995-1-1 Table 8.4 (bolts)";
  }
  const table = { a1, a2, a3t, a3c, a4t, a4c };
  // With the force along the line the grain lies along it when α is small; a force across the member (between
  // side-by-side plies) says directly that the grain runs along the line, whatever α.
  const alongGrain = p.grainAlongLine ?? foldAngle(p.angleDeg) <= 45;
  return alongGrain
    ? { along: a1, across: a2, end: Math.max(a3t, a3c), edge: p.grainAlongLine ? a4t : Math.max(a4t, a4c), ...(p.grainAlongLine ? { unloadedEdge: a4c } : {}), table, source: `${source}: ${p.grainAlongLine ? `grain along the member, force across it (α = ${Number(foldAngle(p.angleDeg).toPrecision(3))}°), so ` : ""}a₁ along the line, a₂ between rows, a₃,t at the ends, ${p.grainAlongLine ? `a₄,t = ${round(a4t / d)}d at the loaded edge, a₄,c = ${round(a4c / d)}d at the unloaded edge` : "a₄ at the edges"}` }
    : { along: a2, across: a1, end: Math.max(a4t, a4c), edge: Math.max(a3t, a3c), table, source: `${source}: grain across the member, so a₂ along the line, a₁ between rows, a₄ at the member ends, a₃ at the edges` };
}

/** The distances of the EN 1995-1-1 tables, mm: a₁ ∥ grain, a₂ ⊥ grain, a₃ to the loaded (t) and unloaded (c) end, a₄ to the loaded and unloaded edge. */
export interface Ec5Distances {
  a1: number;
  a2: number;
  a3t: number;
  a3c: number;
  a4t: number;
  a4c: number;
}

const round = (x: number) => Number(x.toPrecision(3));
