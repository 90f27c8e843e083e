import type { BuilderDimensions } from "./builder-dimensions.js";
import { lineTo, moveTo, palette, rectPath, type DrawItem } from "./drawing.js";
import type { FieldJoint, FieldZone } from "./field-layout.js";
import { labelWidth, placeInTiers } from "./label-tiers.js";
import { supportSymbol, xOf, type AlongMember } from "./member-elevation.js";
import { staggeredSide } from "../spacing/place-rows.js";
import { rowAcrossInOneLine } from "./row-across.js";

const ZONE_LABEL = 8.5;
const POSITION_LABEL = 7.5;
const TIER = 11;
const NUMBER_ROW = 10;
const MAX_LANES = 4;

/** Joint names as a heading: "Joint top", "Joints top and bottom". */
export function jointNames(joints: string[]): string {
  if (joints.length === 1) return `Joint ${joints[0]}`;
  return `Joints ${joints.slice(0, -1).join(", ")} and ${joints[joints.length - 1]}`;
}

/** What one zone asks the builder for: "@ 55 mm", "2 in @ 5 in", "continuous". */
export function zoneCallOut(j: FieldJoint, z: FieldZone, dims: BuilderDimensions): string {
  if (j.kind === "bond-line") return j.run ? "glued over the part's whole run" : "glued over the whole length";
  if (j.kind === "weld") return z.spacing === null || z.segment === null ? "continuous" : `${dims.length(z.segment, "up")} @ ${dims.length(z.spacing, "down")}`;
  return z.spacing === null ? "—" : `@ ${dims.length(z.spacing, "down")}`;
}

/** One line on how the joint is made across the member, for the strip and the sheet. */
export function jointMakeUp(j: FieldJoint, dims: BuilderDimensions): string {
  const along = j.run ? ` from ${dims.position(j.run.from)} to ${dims.position(j.run.to)}` : "";
  const lines = `${j.lineCount === 1 ? "on its 1 joint line" : `on each of its ${j.lineCount} joint lines`}${along}`;
  if (j.kind === "bond-line") return "bond line over the whole contact width and length";
  if (j.kind === "weld") {
    const sides = j.across === 2 ? "2 fillets per line, one each side" : `${j.across} fillet${j.across === 1 ? "" : "s"} per line`;
    const arrangement = j.arrangement === "staggered" ? ", segments staggered side to side, with one at each end on both sides" : j.arrangement === "chain" ? ", segments opposite each other" : "";
    return `${sides}${arrangement}, ${lines}`;
  }
  const count = j.zones.reduce((s, z) => s + (z.connectors ?? 0), 0);
  const per = j.across === 1 ? "1 per row" : `${j.across} per row side by side`;
  // A row in line across the contact is said here in full; the sheet draws only staggered rows.
  const oneLine = rowAcrossInOneLine(j.joints, j.acrossLayouts, dims);
  if (oneLine) return `${j.across} per row ${oneLine}, ${lines}; ${count} per joint`;
  const apart = j.acrossLine.spacing !== null ? ` at least ${dims.length(j.acrossLine.spacing, "up")} apart` : "";
  const edge = j.acrossLine.edge !== null ? `, at least ${dims.length(j.acrossLine.edge, "up")} from every edge` : "";
  return `${per}${apart}${edge}, ${lines}; ${count} per joint`;
}

/**
 * One joint along the member as the builder lays it out: each zone's call-out above, zone numbers,
 * a lane per connector across the row (or per fillet) with every row or weld segment drawn, zone
 * boundaries dimensioned from END A below, supports and point loads marked, and the first and last
 * rows called out at their end distances. Returns items from y = top and the height used.
 */
export function jointStrip(
  j: FieldJoint,
  dims: BuilderDimensions,
  along: AlongMember,
  marks: { supports: { x: number; type: "pinned" | "roller" | "fixed" }[]; pointLoads: number[] },
  top: number,
): { items: DrawItem[]; height: number } {
  const items: DrawItem[] = [];
  const X = (x: number) => xOf(along, x);
  const failing = (z: FieldZone) => !z.passes;
  let y = top;

  items.push({ type: "text", x: along.left, y: y + 10, text: `${jointNames(j.joints)}${j.mode === "check" ? " (given schedule, checked)" : ""} — ${j.connectorLabel}`, size: 9.5, anchor: "start", bold: true, fill: j.passes ? palette.ink : palette.fail, role: "joint-title" });
  y += 14;
  // A long make-up (joints driven from different parts) runs on to further lines rather than past the strip.
  for (const line of wrapped(jointMakeUp(j, dims), 8, along.right - along.left)) {
    items.push({ type: "text", x: along.left, y: y + 8, text: line, size: 8, anchor: "start", fill: palette.ink, role: "joint-make-up" });
    y += 12;
  }

  // Call-outs above their zones, in as many tiers as they need to stay apart.
  const callOuts = j.zones.map((z) => zoneCallOut(j, z, dims));
  const placed = placeInTiers(
    j.zones.map((z, i) => ({ x: (X(z.from) + X(z.to)) / 2, width: labelWidth(callOuts[i]!, ZONE_LABEL, true) })),
    along.left,
    along.right,
    4,
    marks.pointLoads.map((x) => ({ left: X(x) - 5, right: X(x) + 5 })),
  );
  const tiers = placed.reduce((m, p) => Math.max(m, p.tier + 1), 0);
  const stripTop = y + tiers * TIER + 4;
  placed.forEach((p, i) => {
    const z = j.zones[i]!;
    const textY = stripTop - 4 - p.tier * TIER;
    items.push({ type: "text", x: p.textX, y: textY, text: callOuts[i]!, size: ZONE_LABEL, anchor: p.anchor, bold: true, fill: failing(z) ? palette.fail : palette.ink, role: `zone-call-out ${i + 1}` });
    if (p.tier > 0) {
      const mid = (X(z.from) + X(z.to)) / 2;
      items.push({ type: "path", d: `${moveTo(mid, textY + 2)}${lineTo(mid, stripTop)}`, stroke: palette.faint, strokeWidth: 0.5 });
    }
  });

  // Zone numbers in a band over the lanes; a failing zone is shaded red.
  const lanes = Math.min(MAX_LANES, Math.max(1, j.across));
  const laneHeight = lanes > 2 ? 7 : 9;
  const lanesTop = stripTop + NUMBER_ROW;
  const stripBottom = lanesTop + lanes * laneHeight;
  j.zones.forEach((z, i) => {
    const x0 = X(z.from);
    const x1 = X(z.to);
    items.push({ type: "path", d: rectPath(x0, stripTop, x1 - x0, stripBottom - stripTop), fill: failing(z) ? palette.fail : i % 2 ? palette.material[1] : palette.material[0], opacity: failing(z) ? 0.25 : 1, role: `zone ${i + 1}${failing(z) ? " fails" : ""}` });
    if (x1 - x0 >= 9) items.push({ type: "text", x: (x0 + x1) / 2, y: stripTop + 7.5, text: String(i + 1), size: 7, anchor: "middle", bold: true, fill: failing(z) ? palette.fail : palette.faint, role: "zone-number" });
  });
  items.push({ type: "path", d: `${moveTo(along.left, lanesTop)}${lineTo(along.right, lanesTop)}`, stroke: palette.grid, strokeWidth: 0.6 });

  if (j.run) items.push(...outsideRun(j.run, along, stripTop, stripBottom));
  items.push(...laneMarks(j, dims, along, lanesTop, laneHeight, lanes));

  // Zone boundaries through the strip and down to the dimension line.
  const dimY = stripBottom + 16;
  const boundaries = [0, ...j.zones.flatMap((z) => [z.from, z.to]), along.length]
    .sort((a, b) => a - b)
    .filter((b, i, all) => i === 0 || b - all[i - 1]! > 1e-9 * along.length);
  const inner = boundaries.filter((b) => b > 1e-9 && b < along.length - 1e-9);
  if (inner.length > 0) items.push({ type: "path", d: inner.map((b) => `${moveTo(X(b), stripTop)}${lineTo(X(b), dimY)}`).join(""), stroke: palette.ink, strokeWidth: 0.7, dash: [2, 1.5], role: "zone-boundary" });
  items.push({ type: "path", d: rectPath(along.left, stripTop, along.right - along.left, stripBottom - stripTop), stroke: palette.ink, strokeWidth: 1.1 });

  for (const x of marks.pointLoads) {
    const px = X(x);
    items.push({ type: "path", d: `${moveTo(px, stripTop + 0.5)}${lineTo(px - 3.5, stripTop - 5.5)}${lineTo(px + 3.5, stripTop - 5.5)}Z`, fill: palette.neutral, role: "point-load" });
  }
  for (const s of marks.supports) items.push(...supportSymbol(X(s.x), stripBottom, s.type, s.x <= 1e-9 ? "left" : s.x >= along.length - 1e-9 ? "right" : "inside", 5));

  // Zone boundaries dimensioned from END A.
  items.push({ type: "path", d: `${moveTo(along.left, dimY)}${lineTo(along.right, dimY)}`, stroke: palette.ink, strokeWidth: 0.6, role: "dimension" });
  items.push({ type: "path", d: boundaries.map((b) => `${moveTo(X(b) - 2.5, dimY + 2.5)}${lineTo(X(b) + 2.5, dimY - 2.5)}${moveTo(X(b), dimY - 4)}${lineTo(X(b), dimY + 4)}`).join(""), stroke: palette.ink, strokeWidth: 0.8 });
  const positionTexts = boundaries.map((b) => dims.position(b));
  const dimPlaced = placeInTiers(
    boundaries.map((b, i) => ({ x: X(b), width: labelWidth(positionTexts[i]!, POSITION_LABEL) })),
    along.left - 12,
    along.right + 12,
    3,
  );
  const dimTiers = dimPlaced.reduce((m, p) => Math.max(m, p.tier + 1), 0);
  dimPlaced.forEach((p, i) => {
    const textY = dimY + 12 + p.tier * 9;
    items.push({ type: "text", x: p.textX, y: textY, text: positionTexts[i]!, size: POSITION_LABEL, anchor: p.anchor, fill: palette.ink, role: "zone-boundary-position" });
    if (p.tier > 0) items.push({ type: "path", d: `${moveTo(X(boundaries[i]!), dimY + 4)}${lineTo(X(boundaries[i]!), textY - 7)}`, stroke: palette.faint, strokeWidth: 0.5 });
  });
  y = dimY + 4 + dimTiers * 9 + 4;

  const ends = endCallOuts(j, dims);
  if (ends) {
    y += 8;
    const first = j.positions[0]!;
    const last = j.positions[j.positions.length - 1]!;
    items.push({ type: "text", x: along.left, y, text: ends.start, size: 8, anchor: "start", bold: true, fill: palette.joint, role: "end-distance start" });
    // Two call-outs too long to share a line go one under the other.
    if (labelWidth(ends.start, 8, true) + labelWidth(ends.end, 8, true) + 16 > along.right - along.left) y += 11;
    items.push({ type: "text", x: along.right, y, text: ends.end, size: 8, anchor: "end", bold: true, fill: palette.joint, role: "end-distance end" });
    items.push({ type: "path", d: `${moveTo(X(first), stripBottom)}${lineTo(X(first), lanesTop)}${moveTo(X(last), stripBottom)}${lineTo(X(last), lanesTop)}`, stroke: palette.held, strokeWidth: 2.2, role: "end-rows" });
    y += 4;
  }
  return { items, height: y - top };
}

/** Words into lines no wider than `width` at this size; prose averages a little under half an em a character in DejaVu Sans. */
function wrapped(text: string, size: number, width: number): string[] {
  const widthOf = (t: string) => t.length * size * 0.48;
  const lines: string[] = [];
  let line = "";
  for (const word of text.split(" ")) {
    const next = line ? `${line} ${word}` : word;
    if (line && widthOf(next) > width) {
      lines.push(line);
      line = word;
    } else line = next;
  }
  return [...lines, line];
}

/** Where the joint's part is absent: hatched grey, with a heavy mark at each end of the part. */
function outsideRun(run: NonNullable<FieldJoint["run"]>, along: AlongMember, top: number, bottom: number): DrawItem[] {
  const items: DrawItem[] = [];
  const X = (x: number) => xOf(along, x);
  const gaps = [
    [0, run.from],
    [run.to, along.length],
  ].filter(([a, b]) => b! - a! > 1e-9 * along.length) as [number, number][];
  for (const [a, b] of gaps) {
    const x0 = X(a);
    const x1 = X(b);
    items.push({ type: "path", d: rectPath(x0, top, x1 - x0, bottom - top), fill: palette.grid, role: "outside-run" });
    let d = "";
    for (let x = x0 - (bottom - top); x < x1; x += 6) {
      const a0 = Math.max(x0, x);
      const a1 = Math.min(x1, x + (bottom - top));
      d += `${moveTo(a0, bottom - (a0 - x))}${lineTo(a1, bottom - (a1 - x))}`;
    }
    items.push({ type: "path", d, stroke: palette.faint, strokeWidth: 0.5 });
    if (x1 - x0 > 70) items.push({ type: "text", x: (x0 + x1) / 2, y: (top + bottom) / 2 + 3, text: "no connectors here", size: 7.5, anchor: "middle", fill: palette.ink, role: "outside-run-label" });
  }
  const marks = [run.from, run.to].filter((x) => x > 1e-9 && x < along.length - 1e-9);
  if (marks.length > 0) items.push({ type: "path", d: marks.map((x) => `${moveTo(X(x), top - 4)}${lineTo(X(x), bottom + 4)}`).join(""), stroke: palette.ink, strokeWidth: 2, role: "run-end" });
  return items;
}

/** What the builder starts and finishes with at each end; none for a continuous weld or a bond line. */
function endCallOuts(j: FieldJoint, dims: BuilderDimensions): { start: string; end: string } | null {
  if (!j.endDistance || j.positions.length === 0) return null;
  // A joint that runs along part of the member (a cover plate) starts and stops at that part's ends.
  const from = (side: "start" | "end") => (j.run ? `the end of ${j.run.part} at ${dims.position(side === "start" ? j.run.from : j.run.to)}` : side === "start" ? "END A" : "END B");
  if (j.kind === "weld") return { start: `▸ a segment starts at ${from("start")}`, end: `a segment ends at ${from("end")} ◂` };
  const one = j.positions.length === 1;
  return {
    start: `▸ ${one ? "the only row" : "1st row"} ${dims.length(j.endDistance.start, "up")} from ${from("start")}`,
    end: `last row ${dims.length(j.endDistance.end, "up")} from ${from("end")} ◂`,
  };
}

/** Every row (a tick per connector across the row) or weld segment, lane by lane. */
function laneMarks(j: FieldJoint, dims: BuilderDimensions, along: AlongMember, lanesTop: number, laneHeight: number, lanes: number): DrawItem[] {
  const items: DrawItem[] = [];
  const X = (x: number) => xOf(along, x);
  const laneY = (l: number) => lanesTop + l * laneHeight;
  const zoneOf = (x: number) => j.zones.find((z, i) => x >= z.from - 1e-9 && (i === j.zones.length - 1 ? x <= z.to + 1e-9 : x < z.to - 1e-9));
  const colour = (pass: boolean) => (pass ? palette.joint : palette.fail);

  if (j.kind === "bond-line") {
    const step = 5;
    const h = laneHeight * lanes;
    let d = "";
    for (let x = along.left - h; x < along.right; x += step) {
      const x0 = Math.max(along.left, x);
      const x1 = Math.min(along.right, x + h);
      d += `${moveTo(x0, laneY(0) + h - (x0 - x))}${lineTo(x1, laneY(0) + h - (x1 - x))}`;
    }
    items.push({ type: "path", d, stroke: colour(j.passes), strokeWidth: 0.7, role: "bond-line" });
    return items;
  }

  if (j.kind === "weld") {
    j.zones.forEach((z) => {
      if (z.spacing !== null) return;
      for (let l = 0; l < lanes; l++) items.push({ type: "path", d: rectPath(X(z.from), laneY(l) + 2, X(z.to) - X(z.from), laneHeight - 4), fill: colour(z.passes), role: "weld continuous" });
    });
    const passing = { true: "", false: "" } as Record<"true" | "false", string>;
    // A staggered weld's far-side segments (every other lane) sit midway between the near-side ones, with one at each end too.
    const far = j.arrangement === "staggered" ? staggeredSide(j.positions) : j.positions;
    for (let l = 0; l < lanes; l++) {
      for (const c of l % 2 === 1 ? far : j.positions) {
        const z = zoneOf(c);
        if (!z || z.segment === null || z.spacing === null) continue;
        const half = z.segment / dims.spanToLength / 2;
        const a = Math.max(0, c - half);
        const b = Math.min(along.length, c + half);
        if (b <= a) continue;
        passing[String(z.passes) as "true" | "false"] += rectPath(X(a), laneY(l) + 2, Math.max(0.8, X(b) - X(a)), laneHeight - 4);
      }
    }
    if (passing.true) items.push({ type: "path", d: passing.true, fill: palette.joint, role: "weld segments" });
    if (passing.false) items.push({ type: "path", d: passing.false, fill: palette.fail, role: "weld segments fails" });
    return items;
  }

  const paths = { true: "", false: "" } as Record<"true" | "false", string>;
  for (const x of j.positions) {
    const z = zoneOf(x);
    const key = String(z ? z.passes : true) as "true" | "false";
    for (let l = 0; l < lanes; l++) paths[key] += `${moveTo(X(x), laneY(l) + 1.5)}${lineTo(X(x), laneY(l + 1) - 1.5)}`;
  }
  if (paths.true) items.push({ type: "path", d: paths.true, stroke: palette.joint, strokeWidth: 0.7, role: "connector-rows" });
  if (paths.false) items.push({ type: "path", d: paths.false, stroke: palette.fail, strokeWidth: 0.7, role: "connector-rows fails" });
  return items;
}
