import { poly, type DeflectionCurve, type MemberActions } from "./member-actions.js";
import { rootsInto } from "./polynomial-roots.js";

const rootScratch = new Float64Array(8);

/**
 * Which sets of regions to load with a patterned load so that, at every point of the member, some
 * set gives the largest and some set the smallest value of each action (and of each support reaction
 * when `reactions` gives each region's reactions).
 *
 * The action at x under a pattern S is Σ_{r∈S} E_r(x), with E_r the action of the patterned load on
 * region r alone. Its maximum over all 2ⁿ sets is reached by S⁺(x) = {r : E_r(x) > 0} and its minimum
 * by S⁻(x) = {r : E_r(x) < 0}. Those sets change only where some E_r changes sign or jumps, so it is
 * enough to read the signs at every break (both sides), at every root of every E_r and between them.
 * The result is the exact pointwise envelope over all sets, for any number of spans, found without
 * enumerating them; `exhaustivePatterns` is the brute-force form the tests compare it with.
 *
 * Sets are bit masks over the indices of `perRegion`; regions given as null carry no patterned load.
 */
export function governingPatterns(perRegion: (MemberActions | null)[], what: "actions", reactions?: (number[] | null)[]): number[];
export function governingPatterns(perRegion: (DeflectionCurve | null)[], what: "deflection"): number[];
export function governingPatterns(perRegion: (MemberActions | DeflectionCurve | null)[], what: "actions" | "deflection", reactions: (number[] | null)[] = []): number[] {
  const loaded = perRegion.flatMap((r, i) => (r ? [{ i, pieces: piecesOf(r, what) }] : []));
  if (loaded.length === 0) return [0];
  const masks = new Set<number>();
  // Support reactions: the same sign rule, one value per support.
  const withReactions = reactions.flatMap((r, i) => (r && perRegion[i] ? [{ i, r }] : []));
  const supportCount = Math.max(0, ...withReactions.map((w) => w.r.length));
  for (let k = 0; k < supportCount; k++) {
    const scale = Math.max(0, ...withReactions.map((w) => Math.abs(w.r[k] ?? 0)));
    let above = 0;
    let below = 0;
    for (const w of withReactions) {
      const v = w.r[k] ?? 0;
      if (v > 1e-9 * scale) above |= 1 << w.i;
      else if (v < -1e-9 * scale) below |= 1 << w.i;
    }
    masks.add(above);
    masks.add(below);
  }
  const ends = new Set<number>();
  for (const r of loaded) for (const p of r.pieces) ends.add(p.x0).add(p.x1);
  const breaks = [...ends].sort((a, b) => a - b);
  const actionCount = loaded[0]!.pieces[0]!.polys.length;
  const tolerance = loaded.map((r) => {
    let scale = 0;
    for (const p of r.pieces) for (const c of p.polys) scale = Math.max(scale, Math.abs(poly(c, 0)), Math.abs(poly(c, p.x1 - p.x0)));
    return 1e-9 * scale;
  });
  const cursor = new Array<number>(loaded.length).fill(0);
  const here = new Array<Piece>(loaded.length);
  // Breaks, roots and the points between them, in order (insertion: a few per piece).
  let critical = new Float64Array(2 + 8 * loaded.length * actionCount);
  let count = 0;
  const insert = (x: number) => {
    let i = count++;
    while (i > 0 && critical[i - 1]! > x) {
      critical[i] = critical[i - 1]!;
      i--;
    }
    critical[i] = x;
  };
  for (let k = 0; k < breaks.length - 1; k++) {
    const a = breaks[k]!;
    const b = breaks[k + 1]!;
    if (!(b > a)) continue;
    for (let j = 0; j < loaded.length; j++) {
      const pieces = loaded[j]!.pieces;
      while (cursor[j]! < pieces.length - 1 && pieces[cursor[j]!]!.x1 <= a) cursor[j]!++;
      here[j] = pieces[cursor[j]!]!;
    }
    count = 0;
    insert(a);
    insert(b);
    for (const p of here) {
      for (const c of p.polys) {
        const roots = rootsInto(c, c.length, a - p.x0, b - p.x0, rootScratch);
        if (count + roots > critical.length) {
          const wider = new Float64Array(2 * (count + roots));
          wider.set(critical.subarray(0, count));
          critical = wider;
        }
        for (let r = 0; r < roots; r++) insert(p.x0 + rootScratch[r]!);
      }
    }
    for (let s = 0; s < 2 * count - 1; s++) {
      const x = s % 2 === 0 ? critical[s / 2]! : 0.5 * (critical[(s - 1) / 2]! + critical[(s + 1) / 2]!);
      for (let q = 0; q < actionCount; q++) {
        let above = 0;
        let below = 0;
        for (let j = 0; j < loaded.length; j++) {
          const p = here[j]!;
          const v = poly(p.polys[q]!, x - p.x0);
          if (v > tolerance[j]!) above |= 1 << loaded[j]!.i;
          else if (v < -tolerance[j]!) below |= 1 << loaded[j]!.i;
        }
        masks.add(above);
        masks.add(below);
      }
    }
  }
  return [...masks].sort((p, q) => popcount(q) - popcount(p) || p - q);
}

/** Every subset of the loaded regions: 2ⁿ masks. */
export function exhaustivePatterns(loadedRegions: number[]): number[] {
  const out: number[] = [];
  for (let m = 0; m < 1 << loadedRegions.length; m++) {
    let mask = 0;
    loadedRegions.forEach((r, k) => {
      if (m & (1 << k)) mask |= 1 << r;
    });
    out.push(mask);
  }
  return out;
}

export const regionsIn = (mask: number, count: number): number[] => Array.from({ length: count }, (_, i) => i).filter((i) => mask & (1 << i));

function popcount(m: number): number {
  let n = 0;
  for (let x = m; x; x &= x - 1) n++;
  return n;
}

interface Piece {
  x0: number;
  x1: number;
  polys: (readonly number[])[];
}

function piecesOf(r: MemberActions | DeflectionCurve, what: "actions" | "deflection"): Piece[] {
  if (what === "actions") return (r as MemberActions).pieces.map((p) => ({ x0: p.x0, x1: p.x1, polys: [p.v, p.m] }));
  return (r as DeflectionCurve).pieces.map((p) => ({ x0: p.x0, x1: p.x1, polys: [p.v] }));
}
