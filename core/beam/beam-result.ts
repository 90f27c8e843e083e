import type { BeamResult } from "../schema/result.js";
import type { BeamAnalysis, CombinationActions } from "./analyse-beam.js";
import { deflectionExtremes, maxAbsShear, momentExtremes, type DeflectionCurve, type MemberActions } from "./member-actions.js";
import type { Station } from "./stations.js";

export interface StationValues {
  shear: number[];
  moment: number[];
  /** Downward positive. */
  deflection: number[];
  /** Counter-clockwise positive, radians. */
  rotation: number[];
}

/** Where each station falls: the piece, the distance into it, and whether V and M are taken as zero there. */
export interface StationLocator {
  breaks: number[];
  piece: Int32Array;
  u: Float64Array;
  outside: Uint8Array;
}

/**
 * Locates stations sorted along the member (at a jump the left station first) on the pieces of
 * `actions`, in one sweep. Outside the member, and on the outer side of its ends, V and M are zero as
 * in `shearAt`.
 */
export function locateStations(actions: MemberActions, stations: Station[]): StationLocator {
  const n = stations.length;
  const out: StationLocator = { breaks: actions.breaks, piece: new Int32Array(n), u: new Float64Array(n), outside: new Uint8Array(n) };
  const { pieces, length } = actions;
  let k = 0;
  for (let j = 0; j < n; j++) {
    const { x, side } = stations[j]!;
    if (side === "left") while (k < pieces.length - 1 && x > pieces[k]!.x1) k++;
    else while (k < pieces.length - 1 && x >= pieces[k + 1]!.x0) k++;
    out.piece[j] = k;
    out.u[j] = x - pieces[k]!.x0;
    out.outside[j] = x < 0 || x > length || (x === 0 && side === "left") || (x === length && side === "right") ? 1 : 0;
  }
  return out;
}

/** A deflection curve read piece by piece (θ in 0..4, v in 5..10), where it is not built as a whole. */
export interface CurvePieces {
  piece(k: number, out: Float64Array): void;
}
const curveScratch = new Float64Array(11);

/** V, M, deflection and rotation at the stations; `at` may be shared by members on the same breaks. */
export function valuesAtStations(actions: MemberActions, curve: DeflectionCurve | CurvePieces, stations: Station[], at: StationLocator = locateStations(actions, stations)): StationValues {
  const n = stations.length;
  const out: StationValues = { shear: new Array<number>(n), moment: new Array<number>(n), deflection: new Array<number>(n), rotation: new Array<number>(n) };
  const { pieces } = actions;
  let k = -1;
  let v0 = 0, v1 = 0, v2 = 0, m0 = 0, m1 = 0, m2 = 0, m3 = 0;
  let t0 = 0, t1 = 0, t2 = 0, t3 = 0, t4 = 0, w0 = 0, w1 = 0, w2 = 0, w3 = 0, w4 = 0, w5 = 0;
  for (let j = 0; j < n; j++) {
    if (at.piece[j] !== k) {
      k = at.piece[j]!;
      const p = pieces[k]!;
      const { v, m } = p;
      v0 = v[0];
      v1 = v[1];
      v2 = v[2];
      m0 = m[0];
      m1 = m[1];
      m2 = m[2];
      m3 = m[3];
      if ("pieces" in curve) {
        const { theta: t, v: w } = curve.pieces[k]!;
        t0 = t[0]!;
        t1 = t[1]!;
        t2 = t[2]!;
        t3 = t[3]!;
        t4 = t[4]!;
        w0 = w[0]!;
        w1 = w[1]!;
        w2 = w[2]!;
        w3 = w[3]!;
        w4 = w[4]!;
        w5 = w[5]!;
      } else {
        const c = curveScratch;
        curve.piece(k, c);
        t0 = c[0]!;
        t1 = c[1]!;
        t2 = c[2]!;
        t3 = c[3]!;
        t4 = c[4]!;
        w0 = c[5]!;
        w1 = c[6]!;
        w2 = c[7]!;
        w3 = c[8]!;
        w4 = c[9]!;
        w5 = c[10]!;
      }
    }
    const u = at.u[j]!;
    const zero = at.outside[j] === 1;
    out.shear[j] = zero ? 0 : v0 + u * (v1 + u * v2);
    out.moment[j] = zero ? 0 : m0 + u * (m1 + u * (m2 + u * m3));
    out.rotation[j] = t0 + u * (t1 + u * (t2 + u * (t3 + u * t4)));
    out.deflection[j] = -(w0 + u * (w1 + u * (w2 + u * (w3 + u * (w4 + u * w5)))));
  }
  return out;
}

/** Deflection alone at the stations, as valuesAtStations gives it (a service case shows nothing else). */
function deflectionAtStations(curve: DeflectionCurve, stations: Station[], at: StationLocator): number[] {
  const out = new Array<number>(stations.length);
  for (let j = 0; j < stations.length; j++) {
    const w = curve.pieces[at.piece[j]!]!.v;
    const u = at.u[j]!;
    out[j] = -(w[0]! + u * (w[1]! + u * (w[2]! + u * (w[3]! + u * (w[4]! + u * w[5]!)))));
  }
  return out;
}

/** The beam part of the result: every combination at the stations, the envelopes and who governs them. */
export function beamResult(beam: BeamAnalysis, stations: Station[]): BeamResult {
  let at: StationLocator | undefined;
  const locate = (r: CombinationActions) => (at && at.breaks === r.actions.breaks ? at : (at = locateStations(r.actions, stations)));
  const values = beam.results.map((r) => valuesAtStations(r.actions, r.curvePiece ? { piece: (k, out) => r.curvePiece!(k, out) } : r.curve, stations, locate(r)));
  const perCombination = beam.results.map((r, i) => {
    const extremes = momentExtremes(r.actions);
    // A hogging moment of 10⁻¹² of the sagging one is rounding, not a moment: report it as none.
    const scale = Math.max(Math.abs(extremes.max.value), Math.abs(extremes.min.value));
    const clean = (e: typeof extremes.max) => (Math.abs(e.value) <= 1e-9 * scale ? { ...e, value: 0 } : e);
    const max = clean(extremes.max);
    const min = clean(extremes.min);
    const v = values[i]!;
    // Deflection under factored loads is for information: its largest value at the stations.
    let d = 0;
    for (let j = 1; j < stations.length; j++) if (v.deflection[j]! > v.deflection[d]!) d = j;
    return {
      combination: r.combination.id,
      shear: v.shear,
      moment: v.moment,
      deflection: v.deflection,
      rotation: v.rotation,
      reactions: r.reactions.map((x) => ({ x: x.x, force: x.R, moment: x.M })),
      maxShear: maxAbsShear(r.actions, 0, beam.length),
      maxMoment: max,
      minMoment: min,
      maxDeflection: { value: v.deflection[d] ?? 0, x: stations[d]?.x ?? 0 },
    };
  });
  const ids = beam.results.map((r) => r.combination.id);
  const n = stations.length;
  // Running extremes, combination by combination (the first one reaching a value keeps it).
  const best = { shearMax: new Int32Array(n), shearMin: new Int32Array(n), momentMax: new Int32Array(n), momentMin: new Int32Array(n), shearAbs: new Int32Array(n) };
  const top = { shearMax: new Float64Array(n).fill(-Infinity), shearMin: new Float64Array(n).fill(Infinity), momentMax: new Float64Array(n).fill(-Infinity), momentMin: new Float64Array(n).fill(Infinity), shearAbs: new Float64Array(n).fill(-Infinity) };
  const { shearMax, shearMin, momentMax, momentMin, shearAbs } = top;
  values.forEach(({ shear, moment }, i) => {
    for (let j = 0; j < n; j++) {
      const v = shear[j]!;
      const m = moment[j]!;
      if (v > shearMax[j]!) (shearMax[j] = v), (best.shearMax[j] = i);
      if (v < shearMin[j]!) (shearMin[j] = v), (best.shearMin[j] = i);
      if (m > momentMax[j]!) (momentMax[j] = m), (best.momentMax[j] = i);
      if (m < momentMin[j]!) (momentMin[j] = m), (best.momentMin[j] = i);
      if (Math.abs(v) > shearAbs[j]!) (shearAbs[j] = Math.abs(v)), (best.shearAbs[j] = i);
    }
  });
  // Copied by index: Array.from on a typed array goes through its iterator, about ten times slower.
  const valuesOf = (a: Float64Array) => {
    const out = new Array<number>(n);
    for (let j = 0; j < n; j++) out[j] = values.length === 0 ? 0 : a[j]!;
    return out;
  };
  const idsOf = (a: Int32Array) => {
    const out = new Array<string>(n);
    for (let j = 0; j < n; j++) out[j] = ids[a[j]!] ?? "";
    return out;
  };
  const env = { shearMax: valuesOf(top.shearMax), shearMin: valuesOf(top.shearMin), momentMax: valuesOf(top.momentMax), momentMin: valuesOf(top.momentMin) };
  const who = { shearMax: idsOf(best.shearMax), shearMin: idsOf(best.shearMin), momentMax: idsOf(best.momentMax), momentMin: idsOf(best.momentMin), shearAbs: idsOf(best.shearAbs) };
  const service = beam.service ? [...beam.service.total, ...beam.service.live] : [];
  return {
    length: beam.length,
    spans: beam.spans,
    supports: beam.supports,
    ends: beam.ends,
    regions: beam.regions,
    patterned: beam.patterned,
    selfWeight: beam.selfWeight,
    combinations: beam.results.map((r) => r.combination),
    stations: stations.map((s) => s.x),
    perCombination,
    envelope: {
      ...env,
      governingShear: who.shearAbs,
      governing: { shearMax: who.shearMax, shearMin: who.shearMin, momentMax: who.momentMax, momentMin: who.momentMin },
    },
    service: service.map((s: CombinationActions) => ({
      combination: s.combination,
      deflection: deflectionAtStations(s.curve, stations, locate(s)),
      maxDeflection: deflectionExtremes(s.curve).down,
    })),
  };
}
