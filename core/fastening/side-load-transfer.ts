import type { BeamAnalysis } from "../beam/analyse-beam.js";
import { memberActions, momentAt, shearAt, type LoadSet, type MemberActions } from "../beam/member-actions.js";
import { interfaceTransfer, plyShares, type LoadFace, type Ply } from "../multi-ply/ply-shares.js";
import { GRAVITY } from "../units/quantity.js";
import type { JobDocument } from "../schema/job.js";
import type { Combination } from "../schema/result.js";
import { geometricTolerance } from "../section/contacts.js";
import type { JointPlane } from "../section/joints.js";
import type { SectionModel } from "../section/section-model.js";

/** Side-by-side plies, left to right, of any depths, each at any level. */
export interface MultiPly {
  parts: string[];
  plies: Ply[];
  /** The member's overall depth, mm. */
  depth: number;
  /** Self-weight of each ply, N/mm: each ply's own weight arrives on it, and it keeps its E·I share of the whole. */
  selfWeights: number[];
  /** The plies' mid-depths are not at one level (a plate flush with the top of the timber). */
  offCentre: boolean;
  /** Σ n_j·I_j of the plies, each about its own centroid (no composite action between them), mm⁴ in the section's reference modulus. */
  ownSecondMoment: number;
}

/** The parts as plies standing side by side, touching face to face, left to right; null when they are not. */
function sideBySide(section: SectionModel) {
  if (section.parts.length < 2 || section.parts.some((p) => p.rects.length !== 1)) return null;
  const tol = geometricTolerance(section);
  const ordered = [...section.parts].sort((a, b) => a.rects[0]!.x0 - b.rects[0]!.x0);
  for (let i = 1; i < ordered.length; i++) {
    const [l, r] = [ordered[i - 1]!.rects[0]!, ordered[i]!.rects[0]!];
    if (Math.abs(l.x1 - r.x0) > tol || Math.min(l.y1, r.y1) - Math.max(l.y0, r.y0) <= tol) return null;
    // Plies stand side by side when their contact spans both their mid-depths (a plate flush with the top of the
    // timber does); two parts that only touch at a corner or over a sliver are a section of another kind.
    const [lo, hi] = [Math.max(l.y0, r.y0), Math.min(l.y1, r.y1)];
    if ([l, r].some((x) => (x.y0 + x.y1) / 2 < lo - tol || (x.y0 + x.y1) / 2 > hi + tol)) return null;
  }
  return { ordered, tol };
}

/**
 * The section as side-by-side plies (lumber, LVL, steel plates) touching face to face, or null when it is
 * not one. Plies may differ in depth and stand at any level: joined by connectors that carry only the
 * load passed across (no composite action between plies), each bends about its own centroid with the
 * member's curvature, so the E·I shares hold whether or not their mid-depths lie at one level [D].
 */
export function multiPlyOf(section: SectionModel): MultiPly | null {
  const found = sideBySide(section);
  if (!found) return null;
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
    offCentre: offCentre(ordered, tol),
    ownSecondMoment: ordered.reduce((sum, p) => sum + (p.n * (p.rects[0]!.x1 - p.rects[0]!.x0) * (p.rects[0]!.y1 - p.rects[0]!.y0) ** 3) / 12, 0),
  };
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

/** The plies of each stretch of the member, where every stretch is a member of side-by-side plies; null otherwise. */
export interface PlyStretch {
  x0: number;
  x1: number;
  plies: MultiPly;
}

export function plyStretchesOf(stretches: { x0: number; x1: number; section: SectionModel }[]): PlyStretch[] | null {
  const out: PlyStretch[] = [];
  for (const s of stretches) {
    const plies = multiPlyOf(s.section);
    if (!plies) return null;
    out.push({ x0: s.x0, x1: s.x1, plies });
  }
  return out;
}

/** The plies' E·I shares by part id, 0 for a part absent from the stretch. */
function sharesById(plies: MultiPly): Map<string, number> {
  const shares = plyShares(plies.plies);
  return new Map(plies.parts.map((id, j) => [id, shares[j]!]));
}

/** The E·I shares among some of a stretch's plies (those named, in its order). */
function sharesAmong(plies: MultiPly, ids: string[]): number[] {
  return ids.length < 2 ? ids.map(() => 1) : plyShares(ids.map((id) => plies.plies[plies.parts.indexOf(id)]!));
}

/** Interface index k in a stretch's plies of a contact line between parts a and b; null where they are not neighbours there. */
function interfaceIn(plies: MultiPly, a: string, b: string): number | null {
  const [i, j] = [plies.parts.indexOf(a), plies.parts.indexOf(b)];
  return i < 0 || j < 0 || Math.abs(i - j) !== 1 ? null : Math.min(i, j);
}

/**
 * The force per unit length that the contact lines of a joint between side-by-side plies must pass, for
 * each combination of the beam analysis, as exact piecewise polynomials (held in the V slot of member
 * actions, so the spacing design reads it as it reads a shear flow), in the joint's own coordinate from
 * the start of its extent (the whole member when null). Stretch by stretch, where plies start or stop:
 * loads on a face or on top are passed on by that stretch's E·I shares; a concentrated load is spread over
 * the member depth centred on it (connectors within d/2 each side of it, [CP]); a ply that stops hands its
 * share of the shear there (its end reaction) to the plies that continue, and one that starts takes its
 * share, through the connectors within d/2 of its end (the same rule). For a joint on several interfaces
 * (a ply held between two others, connectors in double shear) each line gets the most any of them passes:
 * the largest fraction of each load, with no load relieving another.
 */
export function interfaceDemand(job: JobDocument, beam: BeamAnalysis, stretches: PlyStretch[], lines: readonly { a: string; b: string }[], extent: { from: number; to: number } | null): MemberActions[] {
  return interfaceDemandAndBands(job, beam, stretches, lines, extent).actions;
}

/**
 * A force handed across within d/2 of a load, a support or a ply's end (the concentrated-load rule, [CP]):
 * the connectors within the band must carry it, whatever the rows outside it could take by their tributary length.
 */
export interface ConcentratedBand {
  /** In the joint's coordinate, mm (kept to the joint's extent). */
  from: number;
  to: number;
  /** Where the joint's coordinate starts along the member, mm. */
  origin: number;
  /** The force each contact line passes within the band, N, per combination where it is not zero. */
  forces: { combination: string; force: number }[];
  /** What hands the force there, at x along the member (mm from its left end), for the notes. */
  source: { kind: "load" | "support" | "ply-end"; at: number; ply?: string } | { kind: "overlapping"; at: number[] };
}

/** interfaceDemand, and the bands where a concentrated force is handed across (see ConcentratedBand). */
export function interfaceDemandAndBands(job: JobDocument, beam: BeamAnalysis, stretches: PlyStretch[], lines: readonly { a: string; b: string }[], extent: { from: number; to: number } | null): { actions: MemberActions[]; bands: ConcentratedBand[] } {
  const pairs = [...new Map(lines.map((l) => [[l.a, l.b].sort().join("|"), [l.a, l.b] as const])).values()];
  const single = pairs.length === 1;
  const L = beam.length;
  const tol = 1e-9 * L;
  const ksOf = (s: PlyStretch) => pairs.map(([a, b]) => interfaceIn(s.plies, a, b)).filter((k): k is number => k !== null);
  // Of several interfaces, the one force each line is designed for: signed for one, the largest magnitude for several.
  const pick = (forces: number[]) => (forces.length === 0 ? 0 : single ? forces[0]! : Math.max(...forces.map(Math.abs)));
  const fraction = (s: PlyStretch, face: LoadFace) => pick(ksOf(s).map((k) => interfaceTransfer(s.plies.plies, [{ face, magnitude: 1 }]).interfaces[k]!.force));
  const stretchAt = (x: number) => stretches.find((s) => x >= s.x0 - tol && x <= s.x1 + tol) ?? stretches[stretches.length - 1]!;
  const [lo, hi] = extent ? [extent.from, extent.to] : [0, L];
  const bands = new Map<string, ConcentratedBand>();
  // The signed force of each band per combination (∫|t| for several interfaces), for bands that overlap.
  const signed = new Map<ConcentratedBand, Map<string, number>>();
  const perCombination = beam.results.map(({ combination, reactions, actions }) => {
    const intensity: { x0: number; x1: number; t0: number; t1: number }[] = [];
    // The force of what is pushed since the last band began: ∫t dx (∫|t| dx for several interfaces).
    let gathered = 0;
    const band = (key: string, source: ConcentratedBand["source"], x0: number, x1: number, add: () => void) => {
      gathered = 0;
      add();
      const [a, b] = [Math.max(x0, lo), Math.min(x1, hi)];
      if (!(b > a + tol) || !(Math.abs(gathered) > 0)) return;
      let entry = bands.get(key);
      if (!entry) bands.set(key, (entry = { from: a - lo, to: b - lo, origin: lo, forces: [], source }));
      entry.forces.push({ combination: combination.id, force: Math.abs(gathered) });
      if (!signed.has(entry)) signed.set(entry, new Map());
      signed.get(entry)!.set(combination.id, gathered);
    };
    const push = (x0: number, x1: number, t0: number, t1: number) => {
      // Kept to the joint's extent, where the intensity is linear: t at the clipped ends by interpolation.
      const [a, b] = [Math.max(x0, lo), Math.min(x1, hi)];
      if (!(b > a + tol)) return;
      const at = (x: number) => (x1 > x0 ? t0 + ((t1 - t0) * (x - x0)) / (x1 - x0) : t0);
      [x0, x1, t0, t1] = [a, b, at(a), at(b)];
      const pieces =
        single || (t0 >= 0 && t1 >= 0)
          ? [{ x0, x1, t0, t1 }]
          : t0 <= 0 && t1 <= 0
            ? [{ x0, x1, t0: -t0, t1: -t1 }]
            : // |t| of a linear intensity that changes sign: split where it crosses zero.
              ((xz) => [{ x0, x1: xz, t0: Math.abs(t0), t1: 0 }, { x0: xz, x1, t0: 0, t1: Math.abs(t1) }])(x0 + ((x1 - x0) * t0) / (t0 - t1));
      for (const piece of pieces) {
        intensity.push(piece);
        gathered += ((piece.t0 + piece.t1) / 2) * (piece.x1 - piece.x0);
      }
    };
    /** A linear intensity over [x0, x1] at f(stretch) times w(x), each stretch by its own fraction. */
    const spread = (x0: number, x1: number, f: (s: PlyStretch) => number, w: (x: number) => number) => {
      for (const s of stretches) {
        const [a, b] = [Math.max(x0, s.x0), Math.min(x1, s.x1)];
        const k = b > a ? f(s) : 0;
        if (k !== 0) push(a, b, k * w(a), k * w(b));
      }
    };
    // A support pushes up on the plies that reach the bottom; a ply that does not reach it (a shallower plate) hands
    // its share of the reaction to them through the connectors within d/2 of the support, the concentrated-load rule
    // above. As a load, the reaction is −R on the bottom face.
    for (const r of reactions) {
      if (r.R === 0) continue;
      const d = stretchAt(r.x).plies.depth;
      const [a, b] = [Math.max(0, r.x - d / 2), Math.min(L, r.x + d / 2)];
      if (b > a) band(`support ${r.x}`, { kind: "support", at: r.x }, a, b, () => spread(a, b, (s) => fraction(s, "bottom"), () => -r.R / (b - a)));
    }
    if (job.beam.selfWeight) {
      // A ply heavier than its share (a steel plate) passes the rest of its weight to the others: T_k = Σ_{j≤k} (w_j − s_j·Σw).
      const dead = factorOf(combination, "dead");
      spread(0, L, (s) => {
        const shares = plyShares(s.plies.plies);
        const total = s.plies.selfWeights.reduce((a, b) => a + b, 0);
        return dead * pick(ksOf(s).map((k) => s.plies.selfWeights.slice(0, k + 1).reduce((sum, w, j) => sum + w - shares[j]! * total, 0)));
      }, () => 1);
    }
    for (const [index, load] of job.beam.loads.entries()) {
      if (load.type === "moment") continue;
      const f = factorOf(combination, load.category);
      if (f === 0) continue;
      const face = load.face ?? "top";
      const depth = load.type === "point" ? stretchAt(load.at).plies.depth : 0;
      const span = extentOf(load, L, depth);
      if (load.type === "point") {
        band(`load ${index}`, { kind: "load", at: load.at }, span[0], span[1], () => {
          for (const [x0, x1] of loadedExtents(beam, combination, load.category, span)) spread(x0, x1, (s) => f * fraction(s, face), () => load.P / (span[1] - span[0]));
        });
        continue;
      }
      const [from, to] = [load.from ?? 0, load.to ?? L];
      const w = (x: number) => (load.type === "uniform" ? load.w : load.wStart + ((load.wEnd - load.wStart) * (x - from)) / (to - from));
      for (const [x0, x1] of loadedExtents(beam, combination, load.category, span)) spread(x0, x1, (s) => f * fraction(s, face), w);
    }
    // Where plies start or stop, each ply's shares of the shear and moment change. Taken in two steps, each
    // self-equilibrated: the plies that stop hand their shares to the plies that run on (from the left stretch's shares
    // to those of the plies common to both), then the plies that start take theirs from them. Ply j takes, through the
    // connectors within d/2 of the end on the side where it runs (a bolt group; the concentrated-load rule, [CP]), the
    // force P_j = Δs_j·V spread evenly and the couple C_j = Δs_j·M at the group's centre by the elastic method (force
    // in proportion to the distance from that centre [M]), Δs_j = s_j − s_j′ going along the member [D]: a ply that
    // stops where the moment is not small carries its share of it up to its end bolts.
    for (let i = 0; i + 1 < stretches.length; i++) {
      const [left, right] = [stretches[i]!, stretches[i + 1]!];
      const x = left.x1;
      const d = Math.max(left.plies.depth, right.plies.depth);
      const common = left.plies.parts.filter((id) => right.plies.parts.includes(id));
      const between = common.length > 0 ? new Map(sharesAmong(left.plies, common).map((sh, j) => [common[j]!, sh])) : sharesById(right.plies);
      for (const [side, v, reach] of [
        [left, shearAt(actions, x, "left"), [Math.max(x - d / 2, left.x0), x]],
        [right, shearAt(actions, x, "right"), [x, Math.min(x + d / 2, right.x1)]],
      ] as const) {
        const [a, b] = reach;
        const h = b - a;
        if (!(h > 0)) continue;
        const centre = (a + b) / 2;
        const m = momentAt(actions, centre, "right");
        const own = sharesById(side.plies);
        const change = (id: string) => (side === left ? (own.get(id) ?? 0) - (between.get(id) ?? 0) : (between.get(id) ?? 0) - (own.get(id) ?? 0));
        const sums = ksOf(side).map((k) => side.plies.parts.slice(0, k + 1).reduce((sum, id) => sum + change(id), 0));
        if (sums.every((c) => Math.abs(c) <= 1e-12)) continue;
        const ends = [...left.plies.parts.filter((id) => !right.plies.parts.includes(id)), ...right.plies.parts.filter((id) => !left.plies.parts.includes(id))];
        band(`ply end ${i} ${side === left ? "left" : "right"}`, { kind: "ply-end", at: x, ply: ends.join(", ") }, a, b, () => {
          // e(X) = P/h − 12·C·(X − centre)/h³: ∫e = P, ∫e·(X − centre) = −C.
          if (single) {
            const [P, C] = [sums[0]! * v, sums[0]! * m];
            push(a, b, P / h + (6 * C) / h ** 2, P / h - (6 * C) / h ** 2);
          } else {
            // Several interfaces: the largest force and couple of any, with no relief between them.
            const P = Math.max(...sums.map((c) => Math.abs(c * v)));
            const C = Math.max(...sums.map((c) => Math.abs(c * m)));
            push(a, centre, P / h + (6 * C) / h ** 2, P / h);
            push(centre, b, P / h, P / h + (6 * C) / h ** 2);
          }
        });
      }
    }
    // V(x) = t(x): a step up of t0 at x0, a slope along the extent, a step down of t1 at x1; in the joint's coordinate.
    const set: LoadSet = { points: [], moments: [], lines: [] };
    for (const s of intensity) {
      set.points.push({ x: s.x0 - lo, P: -s.t0 }, { x: s.x1 - lo, P: s.t1 });
      if (s.t1 !== s.t0) set.lines.push({ x0: s.x0 - lo, x1: s.x1 - lo, w0: -(s.t1 - s.t0) / (s.x1 - s.x0), w1: -(s.t1 - s.t0) / (s.x1 - s.x0) });
    }
    return memberActions(hi - lo, set, []);
  });
  return { actions: perCombination, bands: [...bands.values(), ...overlapping([...bands.values()], signed, tol)] };
}

/**
 * Bands that overlap share the rows in their overlap: each run of them is a band too, from the first's start to the
 * last's end, carrying the sum of their forces (signed for one interface; each already a magnitude for several).
 */
function overlapping(bands: ConcentratedBand[], signed: Map<ConcentratedBand, Map<string, number>>, tol: number): ConcentratedBand[] {
  const sorted = [...bands].sort((a, b) => a.from - b.from);
  const runs: ConcentratedBand[][] = [];
  for (const b of sorted) {
    const run = runs[runs.length - 1];
    if (run && b.from < Math.max(...run.map((r) => r.to)) - tol) run.push(b);
    else runs.push([b]);
  }
  return runs
    .filter((run) => run.length > 1)
    .flatMap((run) => {
      const combinations = [...new Set(run.flatMap((b) => b.forces.map((f) => f.combination)))];
      const forces = combinations
        .map((combination) => ({ combination, force: Math.abs(run.reduce((sum, b) => sum + (signed.get(b)?.get(combination) ?? 0), 0)) }))
        .filter((f) => f.force > 0);
      if (forces.length === 0) return [];
      const at = run.flatMap((b) => (b.source.kind === "overlapping" ? b.source.at : [b.source.at]));
      return [{ from: run[0]!.from, to: Math.max(...run.map((b) => b.to)), origin: run[0]!.origin, forces, source: { kind: "overlapping" as const, at } }];
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
