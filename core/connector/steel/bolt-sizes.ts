import { fallsShort } from "../../units/limits.js";

/**
 * Structural bolt data. Metric: tensile stress areas A_s (ISO 898-1), property classes (f_yb, f_ub
 * of EN 1993-1-8 Table 3.1) and normal round hole clearances (EN 1090-2). Inch: sizes with the AISC
 * 360-16 minimum pretension (Table J3.1), hole dimensions (Table J3.3) and minimum edge distances
 * (Table J3.4).
 */
export interface MetricBolt {
  name: string;
  /** Nominal diameter d, mm. */
  d: number;
  /** Tensile stress area A_s, mm². */
  As: number;
  /** Normal round hole d₀, mm. */
  d0: number;
}

const metric: Record<number, [number, number]> = {
  12: [84.3, 13],
  14: [115, 15],
  16: [157, 18],
  18: [192, 20],
  20: [245, 22],
  22: [303, 24],
  24: [353, 26],
  27: [459, 30],
  30: [561, 33],
  36: [817, 39],
};

/** "M20" → its data; null when not a metric size in the table. */
export function metricBoltSize(text: string): MetricBolt | null {
  const m = /^\s*M\s*(\d+)\s*$/i.exec(text);
  const row = m ? metric[Number(m[1])] : undefined;
  return row ? { name: `M${Number(m![1])}`, d: Number(m![1]), As: row[0], d0: row[1] } : null;
}

export const knownMetricSizes = () => Object.keys(metric).map((d) => `M${d}`);

/** Property classes: f_yb and f_ub, MPa; α_v for a shear plane through the thread (EN 1993-1-8 Table 3.4). */
export const propertyClasses: Record<string, { fyb: number; fub: number; alphaVThreads: number }> = {
  "4.6": { fyb: 240, fub: 400, alphaVThreads: 0.6 },
  "4.8": { fyb: 320, fub: 400, alphaVThreads: 0.5 },
  "5.6": { fyb: 300, fub: 500, alphaVThreads: 0.6 },
  "5.8": { fyb: 400, fub: 500, alphaVThreads: 0.5 },
  "6.8": { fyb: 480, fub: 600, alphaVThreads: 0.5 },
  "8.8": { fyb: 640, fub: 800, alphaVThreads: 0.6 },
  "10.9": { fyb: 900, fub: 1000, alphaVThreads: 0.5 },
};

export interface InchBolt {
  name: string;
  diameterIn: number;
  /** Minimum bolt pretension T_b, kips, Group A and Group B (Table J3.1). */
  pretensionKips: { A: number; B: number };
  /** Minimum edge distance, in (Table J3.4). */
  minEdgeIn: number;
  /** Oversized hole diameter and short-slot length, in (Table J3.3). */
  oversizedIn: number;
  shortSlotLengthIn: number;
}

const inch: [string, number, number, number, number, number, number][] = [
  ["1/2", 0.5, 12, 15, 0.75, 0.625, 0.6875],
  ["5/8", 0.625, 19, 24, 0.875, 0.8125, 0.875],
  ["3/4", 0.75, 28, 35, 1, 0.9375, 1],
  ["7/8", 0.875, 39, 49, 1.125, 1.0625, 1.125],
  ["1", 1, 51, 64, 1.25, 1.25, 1.3125],
  ["1-1/8", 1.125, 56, 80, 1.5, 1.4375, 1.5],
  ["1-1/4", 1.25, 71, 102, 1.625, 1.5625, 1.625],
  ["1-3/8", 1.375, 85, 121, 1.71875, 1.6875, 1.75],
  ["1-1/2", 1.5, 103, 148, 1.875, 1.8125, 1.875],
];

/** The AISC data of an inch bolt of diameter D (in), or null when D is not a standard size. */
export function inchBolt(diameterIn: number): InchBolt | null {
  const row = inch.find((r) => Math.abs(r[1] - diameterIn) < 0.002);
  return row ? { name: row[0], diameterIn: row[1], pretensionKips: { A: row[2], B: row[3] }, minEdgeIn: row[4], oversizedIn: row[5], shortSlotLengthIn: row[6] } : null;
}

export const knownInchSizes = () => inch.map((r) => r[0]);

/** Standard hole diameter, in (Table J3.3): d + 1/16 below 1 in, d + 1/8 from 1 in. */
export const standardHoleIn = (diameterIn: number) => diameterIn + (fallsShort(diameterIn, 1) ? 1 / 16 : 1 / 8);

export type BoltGroup = "A" | "B" | "A307";

/** AISC bolt grades by name → group. */
const gradeGroups: Record<string, BoltGroup> = {
  a: "A",
  "group a": "A",
  "group-a": "A",
  a325: "A",
  "f3125 a325": "A",
  "f3125 grade a325": "A",
  f1852: "A",
  "f3125 f1852": "A",
  a354bc: "A",
  b: "B",
  "group b": "B",
  "group-b": "B",
  a490: "B",
  "f3125 a490": "B",
  "f3125 grade a490": "B",
  f2280: "B",
  "f3125 f2280": "B",
  a354bd: "B",
  a307: "A307",
};

export function aiscBoltGroup(grade: string): BoltGroup | null {
  return gradeGroups[grade.trim().toLowerCase().replace(/\s+/g, " ")] ?? null;
}

export const knownAiscGrades = () => ["A (A325, F1852)", "B (A490, F2280)", "A307"];
