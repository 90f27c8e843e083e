import type { BeamAnalysis } from "../beam/analyse-beam.js";
import { memberActions, type LoadSet, type MemberActions } from "../beam/member-actions.js";
import { interfaceTransfer, plyShares, type LoadFace, type Ply } from "../multi-ply/ply-shares.js";
import { GRAVITY } from "../units/quantity.js";
import type { JobDocument } from "../schema/job.js";
import type { Combination } from "../schema/result.js";
import { geometricTolerance } from "../section/contacts.js";
import type { JointPlane } from "../section/joints.js";
import type { SectionModel } from "../section/section-model.js";

/** Side-by-side plies, left to right, of any depths with their mid-depths at one level. */
export interface MultiPly {
  parts: string[];
  plies: Ply[];
  /** The member's overall depth, mm. */
  depth: number;
  /** Self-weight of each ply, N/mm: each ply's own weight arrives on it, and it keeps its E·I share of the whole. */
  selfWeights: number[];
}

/** The parts as plies standing side by side, touching face to face, left to right; null when they are not. */
function sideBySide(section: SectionModel) {
  if (section.parts.length < 2 || section.parts.some((p) => p.rects.length !== 1)) return null;
  const tol = geometricTolerance(section);
  const ordered = [...section.parts].sort((a, b) => a.rects[0]!.x0 - b.rects[0]!.x0);
  for (let i = 1; i < ordered.length; i++) {
    const [l, r] = [ordered[i - 1]!.rects[0]!, ordered[i]!.rects[0]!];
    if (Math.abs(l.x1 - r.x0) > tol || Math.min(l.y1, r.y1) - Math.max(l.y0, r.y0) <= tol) return null;
  }
  return { ordered, tol };
}

/**
 * The section as side-by-side plies (lumber, LVL, steel plates) touching face to face, or null when it is
 * not one. Plies may differ in depth, but their mid-depths must lie at one level: each then bends about
 * its own centroid on the member's neutral axis, no shear flow passes between them (Q = 0 for each), and
 * the E·I shares hold. A ply whose mid-depth is off that level also takes shear flow; see `offsetPlies`.
 */
export function multiPlyOf(section: SectionModel): MultiPly | null {
  const found = sideBySide(section);
  if (!found || offCentre(found.ordered, found.tol)) return null;
  const { ordered, tol } = found;
  const top = Math.max(...ordered.map((p) => p.rects[0]!.y1));
  const bottom = Math.min(...ordered.map((p) => p.rects[0]!.y0));
  return {
    parts: ordered.map((p) => p.id),
    plies: ordered.map((p) => {
      const r = p.rects[0]!;
      return { name: p.name || p.id, modulus: p.material.E, thickness: r.x1 - r.x0, depth: r.y1 - r.y0, bearsOnTop: Math.abs(r.y1 - top) <= tol, bearsAtBottom: Math.abs(r.y0 - bottom) <= tol };
    }),
    depth: top - bottom,
    selfWeights: ordered.map((p) => p.material.density * GRAVITY * p.area * 1e-9),
  };
}

/** Side-by-side plies whose mid-depths are not at one level (the E·I shares do not apply as such); their ids, or null. */
export function offsetPlies(section: SectionModel): string[] | null {
  const found = sideBySide(section);
  return found && offCentre(found.ordered, found.tol) ? found.ordered.map((p) => p.id) : null;
}

function offCentre(ordered: SectionModel["parts"], tol: number): boolean {
  const mid = (p: SectionModel["parts"][number]) => (p.rects[0]!.y0 + p.rects[0]!.y1) / 2;
  return ordered.some((p) => Math.abs(mid(p) - mid(ordered[0]!)) > tol);
}

/**
 * The interfaces (0-based k, between ply k and ply k + 1) a joint's contact lines lie on: one for a
 * joint in single shear, two for one ply held between its neighbours (a bolt in double shear through
 * timber, flitch plate, timber); null when a line is not at an interface of the plies.
 */
export function interfacesOf(plies: MultiPly, joint: JointPlane): number[] | null {
  const out: number[] = [];
  for (const { a, b } of joint.lines) {
    const [i, j] = [plies.parts.indexOf(a), plies.parts.indexOf(b)];
    if (i < 0 || j < 0 || Math.abs(i - j) !== 1) return null;
    out.push(Math.min(i, j));
  }
  return out.length > 0 ? [...new Set(out)].sort((x, y) => x - y) : null;
}

/**
 * The force per unit length that the contact line at interface k must pass, for each combination of the
 * beam analysis, as exact piecewise polynomials (held in the V slot of member actions, so the spacing
 * design reads it as it reads a shear flow). Loads on a face or on top are passed on by ply stiffness
 * shares; a concentrated load is spread over the member depth centred on it (connectors within d/2 each
 * side of it, [CP]). For a joint on several interfaces (a ply held between two others, connectors in
 * double shear) each line gets the most any of them passes: the largest fraction of each load, with no
 * load relieving another.
 */
export function interfaceDemand(job: JobDocument, beam: BeamAnalysis, plies: MultiPly, ks: number | number[]): MemberActions[] {
  const at = Array.isArray(ks) ? ks : [ks];
  const single = at.length === 1;
  const fractions = (face: LoadFace) => at.map((k) => interfaceTransfer(plies.plies, [{ face, magnitude: 1 }]).interfaces[k]!.force);
  const fraction = (face: LoadFace) => (single ? fractions(face)[0]! : Math.max(...fractions(face).map(Math.abs)));
  const L = beam.length;
  return beam.results.map(({ combination, reactions }) => {
    const intensity: { x0: number; x1: number; t0: number; t1: number }[] = [];
    const push = (x0: number, x1: number, t0: number, t1: number) => {
      if (single || (t0 >= 0 && t1 >= 0)) intensity.push({ x0, x1, t0, t1 });
      else if (t0 <= 0 && t1 <= 0) intensity.push({ x0, x1, t0: -t0, t1: -t1 });
      else {
        // |t| of a linear intensity that changes sign: split where it crosses zero.
        const xz = x0 + ((x1 - x0) * t0) / (t0 - t1);
        intensity.push({ x0, x1: xz, t0: Math.abs(t0), t1: 0 }, { x0: xz, x1, t0: 0, t1: Math.abs(t1) });
      }
    };
    // A support pushes up on the plies that reach the bottom; a ply that does not reach it (a shallower plate) hands
    // its share of the reaction to them through the connectors within d/2 of the support, the concentrated-load rule
    // above. As a load, the reaction is −R on the bottom face.
    const bottom = fraction("bottom");
    if (bottom !== 0) {
      for (const r of reactions) {
        const [a, b] = [Math.max(0, r.x - plies.depth / 2), Math.min(L, r.x + plies.depth / 2)];
        if (b > a && r.R !== 0) push(a, b, (-bottom * r.R) / (b - a), (-bottom * r.R) / (b - a));
      }
    }
    if (job.beam.selfWeight) {
      // A ply heavier than its share (a steel plate) passes the rest of its weight to the others: T_k = Σ_{j≤k} (w_j − s_j·Σw).
      const shares = plyShares(plies.plies);
      const total = plies.selfWeights.reduce((a, b) => a + b, 0);
      const passed = at.map((k) => plies.selfWeights.slice(0, k + 1).reduce((sum, w, j) => sum + w - shares[j]! * total, 0));
      const f = factorOf(combination, "dead") * (single ? passed[0]! : Math.max(...passed.map(Math.abs)));
      if (f !== 0) push(0, L, f, f);
    }
    for (const load of job.beam.loads) {
      if (load.type === "moment") continue;
      const f = factorOf(combination, load.category) * fraction(load.face ?? "top");
      if (f === 0) continue;
      for (const [x0, x1] of loadedExtents(beam, combination, load.category, extentOf(load, L, plies.depth))) {
        if (load.type === "point") {
          const [a, b] = extentOf(load, L, plies.depth);
          push(x0, x1, (f * load.P) / (b - a), (f * load.P) / (b - a));
        } else {
          const [from, to] = [load.from ?? 0, load.to ?? L];
          const w = (x: number) => (load.type === "uniform" ? load.w : load.wStart + ((load.wEnd - load.wStart) * (x - from)) / (to - from));
          push(x0, x1, f * w(x0), f * w(x1));
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
