/**
 * A plain drawing: paths in SVG path syntax and text, in drawing units (1 unit = 1 px on the page,
 * 1 pt in the PDF). Renderers never compute geometry; they only paint these items.
 */
export interface PathItem {
  type: "path";
  d: string;
  stroke?: string;
  fill?: string;
  strokeWidth?: number;
  dash?: number[];
  opacity?: number;
  /** Hook for the page's styles and tests, e.g. "joint-plane selected". */
  role?: string;
}

export interface TextItem {
  type: "text";
  x: number;
  y: number;
  text: string;
  size: number;
  anchor: "start" | "middle" | "end";
  fill?: string;
  bold?: boolean;
  role?: string;
}

export type DrawItem = PathItem | TextItem;

export interface Drawing {
  width: number;
  height: number;
  items: DrawItem[];
  /** Short text alternative for the page's accessibility tree. */
  title: string;
}

/** The project's own palette: graphite ink on a pale ground, ochre for the held area, teal for joints. */
export const palette = {
  ink: "#22303c",
  faint: "#8a96a3",
  grid: "#d9dee4",
  material: ["#e9e2cf", "#d7e3e8", "#e6d7e3", "#dfe8d3", "#efe0cc", "#d9dcef"],
  held: "#d9a441",
  joint: "#167a7a",
  neutral: "#5b3f8c",
  series: ["#1f5f99", "#b4531a", "#2e7d4f", "#8a2f6b", "#6b6b1f", "#3d3d99"],
  fail: "#b3261e",
  pass: "#2e7d4f",
} as const;

/** Fixed-decimal number for path data, so the same drawing always yields the same text. */
export const fx = (v: number) => (Math.abs(v) < 5e-3 ? "0" : v.toFixed(2).replace(/\.?0+$/, ""));

export const moveTo = (x: number, y: number) => `M${fx(x)} ${fx(y)}`;
export const lineTo = (x: number, y: number) => `L${fx(x)} ${fx(y)}`;
export const rectPath = (x: number, y: number, w: number, h: number) => `${moveTo(x, y)}${lineTo(x + w, y)}${lineTo(x + w, y + h)}${lineTo(x, y + h)}Z`;
export const polyline = (points: [number, number][]) => points.map(([x, y], i) => (i === 0 ? moveTo(x, y) : lineTo(x, y))).join("");
