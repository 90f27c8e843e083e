import { formatNumber } from "../units/format.js";
import { lineTo, moveTo, palette, polyline, type Drawing, type DrawItem } from "./drawing.js";

export interface Series {
  label: string;
  /** One value per x; null leaves a gap. */
  values: (number | null)[];
  colour?: string;
  /** Shade the area between the curve and zero. */
  fill?: boolean;
  /** Draw as steps (a zone schedule): value i holds from x[i] to x[i+1]. */
  steps?: boolean;
  dash?: number[];
}

export interface LineDiagramOptions {
  title: string;
  xUnit: string;
  yUnit: string;
  x: number[];
  series: Series[];
  width: number;
  height: number;
  /** Plot positive values downward (the usual way to draw bending moment). */
  invert?: boolean;
  /** Upper limit of the y axis, for curves that run to infinity (required spacing). */
  yMax?: number;
  role?: string;
  /** Name the curves in a legend even when there is only one (always when there are more). */
  legend?: boolean;
}

/** A diagram along the member: axes, zero line, one curve per series, labelled extremes and a legend. */
export function lineDiagram(o: LineDiagramOptions): Drawing {
  const margin = { left: 58, right: 14, top: 24, bottom: 30 };
  const w = o.width - margin.left - margin.right;
  const h = o.height - margin.top - margin.bottom;
  const xmin = Math.min(...o.x);
  const xmax = Math.max(...o.x);
  const all = o.series.flatMap((s) => s.values.filter((v): v is number => v !== null && Number.isFinite(v))).map((v) => (o.yMax !== undefined ? Math.min(v, o.yMax) : v));
  let lo = Math.min(0, ...all);
  let hi = Math.max(0, ...all);
  if (hi - lo < 1e-12) hi = lo + 1;
  const pad = (hi - lo) * 0.08;
  lo -= lo < 0 ? pad : 0;
  hi += pad;
  const X = (x: number) => margin.left + ((x - xmin) / (xmax - xmin || 1)) * w;
  const Y = (v: number) => {
    const t = (Math.min(v, o.yMax ?? Infinity) - lo) / (hi - lo);
    return margin.top + (o.invert ? t : 1 - t) * h;
  };
  const items: DrawItem[] = [];
  items.push({ type: "text", x: margin.left, y: 14, text: o.title, size: 11, anchor: "start", bold: true, fill: palette.ink });

  for (const v of niceTicks(lo, hi, 4)) {
    items.push({ type: "path", d: `${moveTo(margin.left, Y(v))}${lineTo(margin.left + w, Y(v))}`, stroke: palette.grid, strokeWidth: 0.75 });
    items.push({ type: "text", x: margin.left - 5, y: Y(v) + 3.5, text: formatNumber(v, 3), size: 9, anchor: "end", fill: palette.faint });
  }
  for (const x of niceTicks(xmin, xmax, 6)) {
    items.push({ type: "path", d: `${moveTo(X(x), margin.top + h)}${lineTo(X(x), margin.top + h + 4)}`, stroke: palette.faint, strokeWidth: 0.75 });
    items.push({ type: "text", x: X(x), y: margin.top + h + 15, text: formatNumber(x, 3), size: 9, anchor: "middle", fill: palette.faint });
  }
  items.push({ type: "text", x: margin.left + w, y: margin.top + h + 27, text: `x (${o.xUnit})`, size: 9, anchor: "end", fill: palette.faint });
  items.push({ type: "text", x: 4, y: margin.top - 6, text: o.yUnit, size: 9, anchor: "start", fill: palette.faint });
  items.push({ type: "path", d: `${moveTo(margin.left, Y(0))}${lineTo(margin.left + w, Y(0))}`, stroke: palette.ink, strokeWidth: 1 });

  o.series.forEach((s, k) => {
    const colour = s.colour ?? palette.series[k % palette.series.length]!;
    for (const run of runs(o.x, s)) {
      if (s.fill && run.length > 1) {
        const first = run[0]!;
        const last = run[run.length - 1]!;
        items.push({ type: "path", d: `${polyline(run.map(([x, v]) => [X(x), Y(v)]))}${lineTo(X(last[0]), Y(0))}${lineTo(X(first[0]), Y(0))}Z`, fill: colour, opacity: 0.15 });
      }
      items.push({ type: "path", d: polyline(run.map(([x, v]) => [X(x), Y(v)])), stroke: colour, strokeWidth: 1.6, role: `series ${o.role ?? ""} ${k}`.trim(), ...(s.dash ? { dash: s.dash } : {}) });
    }
    const finite = s.values.map((v, i) => [o.x[i]!, v] as const).filter((p): p is readonly [number, number] => p[1] !== null && Number.isFinite(p[1]));
    if (!s.steps && finite.length > 0 && o.yMax === undefined) {
      const peak = finite.reduce((a, b) => (Math.abs(b[1]) > Math.abs(a[1]) ? b : a));
      const anchor = X(peak[0]) > margin.left + w * 0.8 ? "end" : X(peak[0]) < margin.left + w * 0.2 ? "start" : "middle";
      const above = (peak[1] >= 0) !== Boolean(o.invert);
      items.push({ type: "text", x: X(peak[0]), y: Y(peak[1]) + (above ? -5 : 12), text: formatNumber(peak[1], 4), size: 9.5, anchor, fill: colour, bold: true, role: `peak ${o.role ?? ""}`.trim() });
    }
  });

  if (o.series.length > 1 || o.legend) {
    let lx = margin.left + w;
    for (let k = o.series.length - 1; k >= 0; k--) {
      const s = o.series[k]!;
      const colour = s.colour ?? palette.series[k % palette.series.length]!;
      const textWidth = s.label.length * 5.6;
      lx -= textWidth + 22;
      items.push({ type: "path", d: `${moveTo(lx, 10)}${lineTo(lx + 14, 10)}`, stroke: colour, strokeWidth: 2, ...(s.dash ? { dash: s.dash } : {}) });
      items.push({ type: "text", x: lx + 18, y: 13.5, text: s.label, size: 9, anchor: "start", fill: palette.ink });
    }
  }
  return { width: o.width, height: o.height, items, title: o.title };
}

function runs(x: number[], s: Series): [number, number][][] {
  const out: [number, number][][] = [];
  let current: [number, number][] = [];
  s.values.forEach((v, i) => {
    if (v === null || !Number.isFinite(v)) {
      if (current.length) out.push(current);
      current = [];
      return;
    }
    current.push([x[i]!, v]);
    if (s.steps && i + 1 < x.length) current.push([x[i + 1]!, v]);
  });
  if (current.length) out.push(current);
  return out;
}

/** Round tick values covering [lo, hi]. */
export function niceTicks(lo: number, hi: number, count: number): number[] {
  const span = hi - lo;
  if (!(span > 0)) return [lo];
  const raw = span / count;
  const mag = 10 ** Math.floor(Math.log10(raw));
  const step = [1, 2, 2.5, 5, 10].map((m) => m * mag).find((s) => s >= raw) ?? 10 * mag;
  const out: number[] = [];
  for (let v = Math.ceil(lo / step) * step; v <= hi + step * 1e-9; v += step) out.push(Math.abs(v) < step * 1e-9 ? 0 : Number(v.toPrecision(12)));
  return out;
}
