import type { BeamAnalysis } from "../beam/analyse-beam.js";
import { memberActions, type LoadSet, type MemberActions } from "../beam/member-actions.js";
import { interfaceTransfer, type LoadFace, type Ply } from "../multi-ply/ply-shares.js";
import type { JobDocument } from "../schema/job.js";
import type { Combination } from "../schema/result.js";
import { geometricTolerance } from "../section/contacts.js";
import type { JointPlane } from "../section/joints.js";
import type { SectionModel } from "../section/section-model.js";

/** Side-by-side plies of equal depth, left to right. */
export interface MultiPly {
  parts: string[];
  plies: Ply[];
  depth: number;
}

/** The section as side-by-side plies of one depth touching face to face, or null when it is not one. */
export function multiPlyOf(section: SectionModel): MultiPly | null {
  if (section.parts.length < 2 || section.parts.some((p) => p.rects.length !== 1)) return null;
  const tol = geometricTolerance(section);
  const ordered = [...section.parts].sort((a, b) => a.rects[0]!.x0 - b.rects[0]!.x0);
  const { y0, y1 } = ordered[0]!.rects[0]!;
  for (let i = 0; i < ordered.length; i++) {
    const r = ordered[i]!.rects[0]!;
    if (Math.abs(r.y0 - y0) > tol || Math.abs(r.y1 - y1) > tol) return null;
    if (i > 0 && Math.abs(ordered[i - 1]!.rects[0]!.x1 - r.x0) > tol) return null;
  }
  return {
    parts: ordered.map((p) => p.id),
    plies: ordered.map((p) => {
      const r = p.rects[0]!;
      return { name: p.name || p.id, modulus: p.material.E, thickness: r.x1 - r.x0, depth: r.y1 - r.y0 };
    }),
    depth: y1 - y0,
  };
}

/** Index k (0-based) of the interface between ply k and ply k + 1 that a joint's single contact line lies on. */
export function interfaceOf(plies: MultiPly, joint: JointPlane): number | null {
  if (joint.lines.length !== 1) return null;
  const { a, b } = joint.lines[0]!;
  const i = plies.parts.indexOf(a);
  const j = plies.parts.indexOf(b);
  return i >= 0 && j === i + 1 ? i : null;
}

/**
 * The force per unit length that interface k must pass, for each combination of the beam analysis,
 * as exact piecewise polynomials (held in the V slot of member actions, so the spacing design reads
 * it as it reads a shear flow). Loads on a face are passed on by ply stiffness shares; a concentrated
 * load is spread over the member depth centred on it (connectors within d/2 each side of it, [CP]).
 */
export function interfaceDemand(job: JobDocument, beam: BeamAnalysis, plies: MultiPly, k: number): MemberActions[] {
  const fraction = (face: LoadFace) => interfaceTransfer(plies.plies, [{ face, magnitude: 1 }]).interfaces[k]!.force;
  const L = beam.length;
  return beam.results.map(({ combination }) => {
    const intensity: { x0: number; x1: number; t0: number; t1: number }[] = [];
    for (const load of job.beam.loads) {
      if (load.type === "moment") continue;
      const f = factorOf(combination, load.category) * fraction(load.face ?? "top");
      if (f === 0) continue;
      for (const [x0, x1] of loadedExtents(beam, combination, load.category, extentOf(load, L, plies.depth))) {
        if (load.type === "point") {
          const [a, b] = extentOf(load, L, plies.depth);
          intensity.push({ x0, x1, t0: (f * load.P) / (b - a), t1: (f * load.P) / (b - a) });
        } else {
          const [from, to] = [load.from ?? 0, load.to ?? L];
          const w = (x: number) => (load.type === "uniform" ? load.w : load.wStart + ((load.wEnd - load.wStart) * (x - from)) / (to - from));
          intensity.push({ x0, x1, t0: f * w(x0), t1: f * w(x1) });
        }
      }
    }
    // V(x) = t(x): a step up of t0 at x0, a slope along the extent, a step down of t1 at x1.
    const set: LoadSet = { points: [], moments: [], lines: [] };
    for (const s of intensity) {
      set.points.push({ x: s.x0, P: -s.t0 }, { x: s.x1, P: s.t1 });
      if (s.t1 !== s.t0) set.lines.push({ x0: s.x0, x1: s.x1, w0: -(s.t1 - s.t0) / (s.x1 - s.x0), w1: -(s.t1 - s.t0) / (s.x1 - s.x0) });
    }
    return memberActions(L, set, []);
  });
}

function factorOf(combination: Combination, category: string): number {
  return combination.factors[category] ?? 0;
}

function extentOf(load: JobDocument["beam"]["loads"][number], L: number, depth: number): [number, number] {
  if (load.type === "point") return [Math.max(0, load.at - depth / 2), Math.min(L, load.at + depth / 2)];
  if (load.type === "moment") return [load.at, load.at];
  return [load.from ?? 0, load.to ?? L];
}

/** Parts of [a, b] where a category acts in this combination: all of it, or only the spans a live-load pattern loads. */
function loadedExtents(beam: BeamAnalysis, combination: Combination, category: string, [a, b]: [number, number]): [number, number][] {
  if (!combination.pattern || !beam.patterned.includes(category)) return b > a ? [[a, b]] : [];
  return beam.regions
    .filter((r) => combination.pattern!.includes(r.spans[0]!))
    .map((r) => [Math.max(a, r.x0), Math.min(b, r.x1)] as [number, number])
    .filter(([x0, x1]) => x1 > x0);
}
