import type { BeamAnalysis } from "../beam/analyse-beam.js";
import { poly } from "../beam/member-actions.js";
import type { JobDocument } from "../schema/job.js";
import type { SectionModel } from "../section/section-model.js";
import { interfaceDemand, type MultiPly, type PlyStretch } from "./side-load-transfer.js";

export type LoadedEdge = "top" | "bottom";

/**
 * Which edges of the timber plies at a joint between side-by-side plies the connectors push the wood
 * toward (the loaded edges of NDS-2018 Table 12.5.1C and EN 1995-1-1 Table 8.4, a₄,t).
 *
 * Free body of a ply at interface k, the force passed T_k > 0 when the plies left of it hand load on to
 * those right of it (downward loads positive): the ply that hands load on is held up by the connectors,
 * so they push it up and its top edge is loaded; the ply that takes the load is pushed down by them, so
 * its bottom edge is loaded. For a top load on two timber plies with a plate between, each timber ply
 * hands its surplus to the plate: the bolts bear upward on the wood above them, the top edge is loaded.
 * Near a support a plate that does not reach the bottom hands its share of the reaction back to the
 * timber: there the force reverses and the bolts push the timber down. Every sign that occurs anywhere
 * along the member in any combination counts, so an edge loaded anywhere is loaded (both where the
 * force reverses; both when nothing passes, as it cannot be told).
 */
export function loadedEdgesOf(job: JobDocument, beam: BeamAnalysis, stretches: PlyStretch[], plies: MultiPly, interfaces: number[], section: SectionModel, extent: { from: number; to: number } | null): { edges: LoadedEdge[]; note: string } {
  const timber = (id: string) => section.parts.find((p) => p.id === id)!.material.family !== "steel";
  const byPart = new Map<string, Set<LoadedEdge>>();
  for (const k of interfaces) {
    const [left, right] = [plies.parts[k]!, plies.parts[k + 1]!];
    // One interface at a time, so the force passed keeps its sign.
    const { positive, negative } = signsOf(interfaceDemand(job, beam, stretches, [{ a: left, b: right }], extent));
    const mark = (id: string, edge: LoadedEdge) => {
      if (!timber(id)) return;
      if (!byPart.has(id)) byPart.set(id, new Set());
      byPart.get(id)!.add(edge);
    };
    if (positive) {
      mark(left, "top");
      mark(right, "bottom");
    }
    if (negative) {
      mark(left, "bottom");
      mark(right, "top");
    }
  }
  const all = new Set([...byPart.values()].flatMap((s) => [...s]));
  const name = (id: string) => {
    const i = plies.parts.indexOf(id);
    return plies.plies[i]?.name ?? id;
  };
  if (all.size === 0) {
    return { edges: ["top", "bottom"], note: "Force across the grain: no force is passed across this joint, so which edge is loaded cannot be told; both edges are taken as loaded." };
  }
  const edges = (["top", "bottom"] as const).filter((e) => all.has(e));
  const told = [...byPart].map(([id, s]) => `"${name(id)}" ${[...s].sort((a, b) => (a === "top" ? -1 : b === "top" ? 1 : 0)).map((e) => (e === "top" ? "top (it hands load on: the connectors push it up)" : "bottom (it takes load: the connectors push it down)")).join(" and ")}`);
  return {
    edges,
    note: `Force across the grain: the loaded edge is the one the connectors push the wood toward (NDS-2018 Table 12.5.1C; EN 1995-1-1 Table 8.4, a₄,t [M]); from the force passed at each interface over the member and every combination: ${told.join("; ")}; ${edges.length === 2 ? "both edges are loaded" : `the ${edges[0]} edge is loaded, the ${edges[0] === "top" ? "bottom" : "top"} edge unloaded`}.`,
  };
}

/** Whether the force passed (held in the V slot) is positive or negative anywhere, in any combination. */
function signsOf(demand: { pieces: { x0: number; x1: number; v: [number, number, number] }[] }[]): { positive: boolean; negative: boolean } {
  const values: number[] = [];
  for (const actions of demand) {
    for (const p of actions.pieces) {
      const L = p.x1 - p.x0;
      if (!(L > 0)) continue;
      const us = [0, L / 2, L];
      // A quadratic's extreme inside the piece.
      if (p.v[2] !== 0) {
        const u = -p.v[1] / (2 * p.v[2]);
        if (u > 0 && u < L) us.push(u);
      }
      for (const u of us) values.push(poly(p.v, u));
    }
  }
  const scale = Math.max(0, ...values.map(Math.abs));
  if (!(scale > 0)) return { positive: false, negative: false };
  const tol = 1e-9 * scale;
  return { positive: values.some((v) => v > tol), negative: values.some((v) => v < -tol) };
}
