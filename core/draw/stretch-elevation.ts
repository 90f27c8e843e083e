import type { DesignResult } from "../schema/result.js";
import { formatNumber } from "../units/format.js";
import { lineTo, moveTo, palette, rectPath, type Drawing, type DrawItem, type PathItem, type TextItem } from "./drawing.js";
import { labelWidth, placeInTiers } from "./label-tiers.js";
import { dimensionChain, supportSymbol } from "./member-elevation.js";

export type StretchElevationSource = Pick<DesignResult, "beam" | "section" | "stretches" | "terminations" | "unitLabels">;

/** A part present over only some stretches of the member (a cover plate), on the face of the member it is nearer. */
export interface PartRun {
  part: string;
  label: string;
  material: string;
  from: number;
  to: number;
  side: "top" | "bottom";
}

/** Parts that start or stop along the member, from the result's stretches; empty for a member of one section. */
export function partRuns(result: Pick<DesignResult, "section" | "stretches">): PartRun[] {
  const stretches = result.stretches;
  if (stretches.length === 0) return [];
  return result.section.parts.flatMap((p) => {
    const on = stretches.filter((s) => s.parts.includes(p.id));
    if (on.length === stretches.length || on.length === 0) return [];
    const middle = p.rects.reduce((sum, r) => sum + (r.y0 + r.y1) / 2, 0) / Math.max(1, p.rects.length);
    return [
      {
        part: p.id,
        label: p.name || p.id,
        material: p.material,
        from: Math.min(...on.map((s) => s.from)),
        to: Math.max(...on.map((s) => s.to)),
        side: middle < result.section.centroidY ? ("bottom" as const) : ("top" as const),
      },
    ];
  });
}

const MARGIN = 16;
const BODY = 26;
const RUN = 8;
const STRIP = 22;
const CUTOFF_LABEL = 9;
const RUN_LABEL = 9;
const TIER = 11;
const PAPER = "#ffffff";

/**
 * The member in elevation (not to scale in depth): the parts that run its whole length as one body,
 * each part that starts or stops drawn on its face over its own run with where it starts and stops,
 * the supports, the theoretical cut-offs of the parts' ends (red where the connectors there do not
 * develop the force), the section's second moment stretch by stretch, and the stretches dimensioned.
 * Numbers are in the result's units.
 */
export function stretchElevation(result: StretchElevationSource, options: { width: number }): Drawing {
  const { beam, section, stretches, terminations } = result;
  const span = result.unitLabels.span ?? "";
  const length = beam.length;
  const left = MARGIN;
  const right = options.width - MARGIN;
  const X = (x: number) => left + (length > 0 ? (x / length) * (right - left) : 0);
  const items: DrawItem[] = [];
  // Labels go on last, each over a pale box, so that the cut-off lines never run through their text.
  const labels: { text: TextItem; ground: string }[] = [];
  const runs = partRuns(result);
  const materials = [...new Set(section.parts.map((p) => p.material))];
  const fillOf = (material: string): string => palette.material[Math.max(0, materials.indexOf(material)) % palette.material.length] ?? palette.material[0];

  items.push({ type: "text", x: left, y: 13, text: fitText("Member in elevation: parts that start or stop, and the section stretch by stretch", right - left, 10.5), size: 10.5, anchor: "start", bold: true, fill: palette.ink });
  let y = 22;

  // Cut-off call-outs above the member, in tiers so that none overlaps another.
  const cutoffs = terminations.filter((t) => t.cutoff !== null);
  const cutoffTexts = cutoffs.map((t) => `cut-off ${formatNumber(t.cutoff!)}${t.passes ? "" : " FAILS"}`);
  const placed = placeInTiers(
    cutoffs.map((t, i) => ({ x: X(t.cutoff!), width: labelWidth(cutoffTexts[i]!, CUTOFF_LABEL, !t.passes) })),
    left,
    right,
  );
  const tiers = placed.reduce((m, p) => Math.max(m, p.tier + 1), 0);
  y += tiers * TIER;

  // Runs on the top face stack upward from the body, those on the bottom face downward.
  const top = runs.filter((r) => r.side === "top");
  const bottom = runs.filter((r) => r.side === "bottom");
  const bodyTop = y + top.length * (RUN + 12);
  const bodyBottom = bodyTop + BODY;
  const full = section.parts.filter((p) => !runs.some((r) => r.part === p.id));
  const bodyFill = fillOf(full[0]?.material ?? section.parts[0]?.material ?? "");
  items.push({ type: "path", d: rectPath(X(0), bodyTop, X(length) - X(0), BODY), fill: bodyFill, stroke: palette.ink, strokeWidth: 1.2, role: "member" });
  const bodyLabel = full.length ? full.map((p) => p.name || p.id).join(", ") : "member";
  const bodyText = fitText(bodyLabel, X(length) - X(0) - 8, 10);
  if (bodyText) labels.push({ text: { type: "text", x: (X(0) + X(length)) / 2, y: bodyTop + BODY / 2 + 3.5, text: bodyText, size: 10, anchor: "middle", fill: palette.ink, role: "member-label" }, ground: bodyFill });

  const runBand = (run: PartRun, k: number): number => {
    const bandY = run.side === "top" ? bodyTop - (k + 1) * (RUN + 12) + 12 : bodyBottom + k * (RUN + 12);
    const x0 = X(run.from);
    const x1 = X(run.to);
    items.push({ type: "path", d: rectPath(x0, bandY, x1 - x0, RUN), fill: fillOf(run.material), stroke: palette.ink, strokeWidth: 1, role: `part-run ${run.part}` });
    const text = `${run.label}: ${formatNumber(run.from)} – ${formatNumber(run.to)} ${span}`;
    const textY = run.side === "top" ? bandY - 5 : bandY + RUN + 11;
    const x = Math.min(Math.max((x0 + x1) / 2, left + labelWidth(text, RUN_LABEL) / 2), right - labelWidth(text, RUN_LABEL) / 2);
    labels.push({ text: { type: "text", x, y: textY, text, size: RUN_LABEL, anchor: "middle", fill: palette.ink, role: `part-run-label ${run.part}` }, ground: PAPER });
    return bandY;
  };
  top.forEach((run, k) => runBand(run, k));
  const bottomBands = bottom.map((run, k) => ({ run, y: runBand(run, k) }));
  const lowest = bodyBottom + bottom.length * (RUN + 12);

  // A support bears on the lowest part present where it stands.
  for (const s of beam.supports) {
    const under = bottomBands.filter((b) => s.x >= b.run.from - 1e-9 && s.x <= b.run.to + 1e-9);
    const bearing = under.length ? Math.max(...under.map((b) => b.y + RUN)) : bodyBottom;
    items.push(...supportSymbol(X(s.x), bearing, s.type, s.x <= 1e-9 ? "left" : s.x >= length - 1e-9 ? "right" : "inside"));
  }

  // The section stretch by stretch: its second moment of area, in a band under the member.
  const stripTop = lowest + 32;
  const caption = `Second moment of area I (transformed) per stretch, ${result.unitLabels.secondMoment ?? ""}`;
  labels.push({ text: { type: "text", x: left, y: stripTop - 5, text: caption, size: 9, anchor: "start", fill: palette.faint }, ground: PAPER });
  stretches.forEach((s, k) => {
    const x0 = X(s.from);
    const x1 = X(s.to);
    const ground = k % 2 ? PAPER : "#eef1f4";
    items.push({ type: "path", d: rectPath(x0, stripTop, x1 - x0, STRIP), fill: ground, stroke: palette.faint, strokeWidth: 0.8, role: `stretch ${k + 1}` });
    const label = formatNumber(s.secondMoment);
    const text = labelWidth(label, 10, true) <= x1 - x0 - 6 ? label : labelWidth(String(k + 1), 10) <= x1 - x0 - 2 ? String(k + 1) : "";
    if (text) labels.push({ text: { type: "text", x: (x0 + x1) / 2, y: stripTop + STRIP / 2 + 3.5, text, size: 10, anchor: "middle", fill: palette.ink, bold: text === label, role: `stretch-inertia ${k + 1}` }, ground });
  });

  // Cut-offs: a dashed line from the call-out through the member to the stretch band.
  cutoffs.forEach((t, i) => {
    const x = X(t.cutoff!);
    const p = placed[i]!;
    const colour = t.passes ? palette.neutral : palette.fail;
    const textY = 22 + (tiers - p.tier) * TIER - 3;
    labels.push({ text: { type: "text", x: p.textX, y: textY, text: cutoffTexts[i]!, size: CUTOFF_LABEL, anchor: p.anchor, fill: colour, bold: !t.passes, role: `cutoff ${t.part} ${t.end}${t.passes ? "" : " fails"}` }, ground: PAPER });
    items.push({ type: "path", d: `${moveTo(x, textY + 2)}${lineTo(x, stripTop + STRIP)}`, stroke: colour, strokeWidth: t.passes ? 1 : 1.6, dash: [4, 3], role: `cutoff-line ${t.part} ${t.end}` });
  });

  for (const { text, ground } of labels) items.push(labelBox(text, ground), text);

  // The stretches dimensioned end to end.
  const ends = stretches.length ? [stretches[0]!.from, ...stretches.map((s) => s.to)] : [0, length];
  const dimY = stripTop + STRIP + 20;
  items.push(...dimensionChain(ends.map(X), ends.slice(1).map((e, k) => `${formatNumber(e - ends[k]!)} ${span}`), dimY));
  return {
    width: options.width,
    height: dimY + 14,
    items,
    title: `Member in elevation: ${runs.length ? runs.map((r) => `${r.label} from ${formatNumber(r.from)} to ${formatNumber(r.to)} ${span}`).join("; ") : "one section along its length"}; ${stretches.length} stretches`,
  };
}

/** A pale box behind a label, a little larger than its estimated extent. */
function labelBox(t: TextItem, ground: string): PathItem {
  const width = labelWidth(t.text, t.size, t.bold) + 6;
  const x = t.anchor === "start" ? t.x - 3 : t.anchor === "end" ? t.x - width + 3 : t.x - width / 2;
  return { type: "path", d: rectPath(x, t.y - t.size - 1, width, t.size * 1.22 + 1), fill: ground };
}

/** Shortens a label with an ellipsis so that it fits the width given. */
function fitText(text: string, width: number, size: number): string {
  if (labelWidth(text, size) <= width) return text;
  const keep = Math.max(0, Math.floor(width / (size * 0.62)) - 1);
  return keep > 3 ? `${text.slice(0, keep)}…` : "";
}
