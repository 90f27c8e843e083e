/**
 * Trade sizes of timber fasteners in inches: pennyweight nails (ASTM F1667 common, box and sinker
 * nails as tabulated in NDS-2018 Table L4), wood screw gauges (ASME B18.6.1, NDS Table L3) and lag
 * screw root diameters and tip lengths (ASME B18.2.1, NDS Table L2).
 */
export interface NailSize {
  name: string;
  diameterIn: number;
  lengthIn: number;
}

const nailTable: Record<"common" | "box" | "sinker", Record<number, [number, number]>> = {
  common: { 6: [0.113, 2], 8: [0.131, 2.5], 10: [0.148, 3], 12: [0.148, 3.25], 16: [0.162, 3.5], 20: [0.192, 4], 30: [0.207, 4.5], 40: [0.225, 5], 50: [0.244, 5.5], 60: [0.263, 6] },
  box: { 6: [0.099, 2], 8: [0.113, 2.5], 10: [0.128, 3], 12: [0.128, 3.25], 16: [0.135, 3.5], 20: [0.148, 4], 30: [0.148, 4.5], 40: [0.162, 5] },
  sinker: { 6: [0.092, 1.875], 8: [0.113, 2.375], 10: [0.12, 2.875], 12: [0.135, 3.125], 16: [0.148, 3.25], 20: [0.177, 3.75], 30: [0.192, 4.25], 40: [0.225, 4.75] },
};

/** "16d common", "8d box", "10d sinker" (a bare "16d" is a common nail) → diameter and length, in; null when unknown. */
export function nailSize(name: string): NailSize | null {
  const m = /^\s*(\d+)\s*d\s*(common|box|sinker)?\s*(nails?)?\s*$/i.exec(name);
  if (!m) return null;
  const type = (m[2]?.toLowerCase() ?? "common") as keyof typeof nailTable;
  const row = nailTable[type][Number(m[1])];
  if (!row) return null;
  return { name: `${Number(m[1])}d ${type}`, diameterIn: row[0], lengthIn: row[1] };
}

/** Nail sizes of the same type (common, box, sinker) with a larger diameter than this one, smallest first. */
export function largerNailSizes(name: string): string[] {
  const size = nailSize(name);
  if (!size) return [];
  const type = size.name.split(" ")[1] as keyof typeof nailTable;
  return Object.entries(nailTable[type])
    .filter(([, [d]]) => d > size.diameterIn + 1e-9)
    .sort(([, [a]], [, [b]]) => a - b)
    .map(([penny]) => `${penny}d ${type}`);
}

export const knownNailSizes = (): string[] =>
  Object.entries(nailTable).flatMap(([type, rows]) => Object.keys(rows).map((d) => `${d}d ${type}`));

/** Wood screw gauges: shank diameter D and root diameter D_r, in. */
const screwGauges: Record<number, [number, number]> = {
  6: [0.138, 0.113],
  7: [0.151, 0.122],
  8: [0.164, 0.131],
  9: [0.177, 0.142],
  10: [0.19, 0.152],
  12: [0.216, 0.171],
  14: [0.242, 0.196],
  16: [0.268, 0.209],
  18: [0.294, 0.232],
  20: [0.32, 0.255],
  24: [0.372, 0.3],
};

/** "#10" or "No. 10" → shank and root diameters, in; null when unknown. */
export function screwGauge(name: string): { name: string; diameterIn: number; rootDiameterIn: number } | null {
  const m = /^\s*(?:#|no\.?\s*)(\d+)\s*$/i.exec(name);
  const row = m ? screwGauges[Number(m[1])] : undefined;
  return row ? { name: `#${Number(m![1])}`, diameterIn: row[0], rootDiameterIn: row[1] } : null;
}

export const knownScrewGauges = (): string[] => Object.keys(screwGauges).map((g) => `#${g}`);

/**
 * Lag screws by shank diameter D: root diameter D_r and length of the tapered tip E, in (ASME B18.2.1,
 * NDS-2018 Appendix Table L2 [M]).
 */
const lagSizes: [number, number, number][] = [
  [0.25, 0.173, 5 / 32],
  [0.3125, 0.227, 3 / 16],
  [0.375, 0.265, 7 / 32],
  [0.4375, 0.328, 9 / 32],
  [0.5, 0.371, 5 / 16],
  [0.625, 0.471, 13 / 32],
  [0.75, 0.579, 1 / 2],
  [0.875, 0.683, 9 / 16],
  [1, 0.78, 5 / 8],
];

const lagRow = (diameterIn: number) => lagSizes.find(([d]) => Math.abs(d - diameterIn) < 0.002);

/** Root diameter of a lag screw of shank diameter D (in), or null when D is not a standard size. */
export function lagScrewRoot(diameterIn: number): number | null {
  return lagRow(diameterIn)?.[1] ?? null;
}

/** Tip length E of a lag screw of shank diameter D (in), or null when D is not a standard size. */
export function lagScrewTip(diameterIn: number): number | null {
  return lagRow(diameterIn)?.[2] ?? null;
}

/** "3/4", "3/4 in", "1-1/8", "1", "0.75" → inches; null when not a size written in inches. */
export function inchSize(text: string): number | null {
  const m = /^\s*(?:(\d+)[-\s])?(?:(\d+)\/(\d+)|(\d+(?:\.\d+)?))\s*(?:in\.?|inch|")?\s*$/i.exec(text);
  if (!m) return null;
  const whole = m[1] ? Number(m[1]) : 0;
  const fraction = m[2] ? Number(m[2]) / Number(m[3]) : Number(m[4]);
  if (m[2] && Number(m[3]) === 0) return null;
  const value = whole + fraction;
  return value > 0 ? value : null;
}
