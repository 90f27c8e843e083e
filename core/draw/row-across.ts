import type { Schedule } from "../schema/result.js";
import type { BuilderDimensions } from "./builder-dimensions.js";
import { lineTo, moveTo, palette, rectPath, type Drawing, type DrawItem } from "./drawing.js";

/** Where a row's connectors sit across the contact (the result's layoutAcross), in the result's length units. */
export type LayoutAcross = NonNullable<Schedule["layoutAcross"]>;

/** What the field sheet and the page know about a row across the contact, from a schedule. */
export interface RowAcross {
  joints: string[];
  /** Connectors side by side in one row. */
  perRow: number;
  layout: LayoutAcross | null;
  /** The contact's dimension across which the row is set (rowFit.available), length units; null when unknown. */
  contact: number | null;
  /** Least distances (limits.edgeDistance, limits.rowSpacing), length units. */
  edgeDistance: number | null;
  rowSpacing: number | null;
}

export function rowAcrossOf(joints: string[], s: Pick<Schedule, "rows" | "layoutAcross" | "rowFit" | "limits">): RowAcross {
  return {
    joints,
    perRow: s.rows,
    layout: s.layoutAcross ?? null,
    contact: s.rowFit?.available ?? null,
    edgeDistance: s.limits.edgeDistance ?? null,
    rowSpacing: s.rows > 1 ? (s.limits.rowSpacing ?? null) : null,
  };
}

/**
 * The face the connectors go in from: "driven from <part>", or "from either face" where the result names none
 * (a through bolt; also a nail the standard sets no penetration for, so not "through bolts", which a builder
 * would read as a change of connector).
 */
export function drivingFace(layout: LayoutAcross): string {
  return layout.drivenFrom === null ? "from either face" : `driven from ${layout.drivenFrom}`;
}

/** A row worth drawing: a stagger (alternate connectors set along the member); a row in line reads fully in words. */
export const drawnAcross = (layout: LayoutAcross): boolean => layout.offsets.length > 1 && layout.stagger !== null;

/** One joint's layout across the contact, with the contact's width there (length units). */
export interface RowAcrossOfJoint {
  joint: string;
  layout: LayoutAcross;
  contact: number | null;
}

/**
 * Where the connectors of a row sit across the contact, in a few words for the joints' line on the field
 * sheet: "centred 3/4 in from the left edge of the contact, driven from Top flange", "at 15 mm and 30 mm
 * from the left edge of the contact, from either face", "…, alternate ones 3-3/4 in along the
 * member, …"; "centred" where a single connector stands in the middle of the contact; joints that differ
 * are named. Null unless every one of the joints has a layout.
 */
export function rowAcrossInOneLine(joints: string[], layouts: RowAcrossOfJoint[], dims: BuilderDimensions): string | null {
  if (layouts.length === 0 || !joints.every((j) => layouts.some((l) => l.joint === j))) return null;
  const where = (l: RowAcrossOfJoint) => {
    const offsets = l.layout.offsets.map((o) => dims.length(o));
    const one = l.layout.offsets.length === 1 ? l.layout.offsets[0]! : null;
    const centred = one !== null && l.contact !== null && Math.abs(one - l.contact / 2) <= 1e-6 * Math.max(1, l.contact);
    const list = offsets.length === 1 ? offsets[0]! : `${offsets.slice(0, -1).join(", ")} and ${offsets[offsets.length - 1]}`;
    const stagger = l.layout.stagger !== null && l.layout.offsets.length > 1 ? `, alternate ones ${dims.length(l.layout.stagger)} along the member` : "";
    return `${centred ? "centred" : "at"} ${list} from the ${l.layout.edge}${stagger}`;
  };
  const places = new Set(layouts.map(where));
  const faces = new Set(layouts.map((l) => drivingFace(l.layout)));
  if (places.size === 1 && faces.size === 1) return `${where(layouts[0]!)}, ${drivingFace(layouts[0]!.layout)}`;
  if (places.size === 1) return `${where(layouts[0]!)}, ${layouts.map((l) => `${l.joint} ${drivingFace(l.layout)}`).join(", ")}`;
  return layouts.map((l) => `${l.joint} ${where(l)}, ${drivingFace(l.layout)}`).join("; ");
}

/**
 * The sentences a builder reads about a row across the contact. With the result's layout: each
 * connector's distance from the named edge, the stagger and the face. Without it: only what the
 * limits say (how many, the least distances, the contact they must fit in); never a position that
 * the result does not give.
 */
export function rowAcrossLines(r: RowAcross, dims: BuilderDimensions): string[] {
  const L = r.layout;
  if (L) {
    const offsets = L.offsets.map((o) => dims.length(o)).join(", ");
    return [
      `${L.offsets.length === 1 ? "Connector" : "Connectors"} across the contact at ${offsets} from the ${L.edge}${r.contact !== null ? ` (contact ${dims.length(r.contact)})` : ""}.`,
      L.stagger === null ? "Rows in line: no stagger." : `Staggered: alternate connectors ${dims.length(L.stagger)} apart along the member.`,
      `${drivingFace(L).replace(/^./, (c) => c.toUpperCase())}.`,
    ];
  }
  const least = [
    r.edgeDistance !== null ? `at least ${dims.length(r.edgeDistance, "up")} from each edge` : null,
    r.rowSpacing !== null ? `at least ${dims.length(r.rowSpacing, "up")} apart` : null,
  ].filter(Boolean);
  return [
    `${r.perRow} per row across the contact${r.contact !== null ? ` of ${dims.length(r.contact)}` : ""}${least.length ? `, ${least.join(" and ")}` : ""}.`,
    "The result gives no positions across the contact, stagger or driving face for this joint: the engineer of record sets them within these distances.",
  ];
}

const DOT = 2.2;
const ROWS = 3;

/**
 * A row across the contact, seen on the face the connectors go in from: the contact as a band (the named
 * edge heavy, at the top), three rows along the member with each connector where the layout puts it,
 * each connector's distance from the edge dimensioned on the left and the stagger dimensioned under the
 * rows. Across the contact to scale; along the member the rows are drawn apart for clarity. Without a
 * layout, or for a row without stagger, null (the sentences say it all).
 */
export function rowAcrossDrawing(r: RowAcross, dims: BuilderDimensions, options: { width: number; height: number }): Drawing | null {
  const L = r.layout;
  // A row in line says all it has to in words.
  if (!L || L.offsets.length === 0 || !drawnAcross(L)) return null;
  const items: DrawItem[] = [];
  const top = 14;
  const dimLeft = 46;
  const bottomRoom = L.stagger !== null ? 30 : 16;
  const across = Math.max(r.contact ?? 0, ...L.offsets.map((o) => o * 1.15));
  const scale = (options.height - top - bottomRoom) / across;
  const bandLeft = dimLeft + 6;
  const bandRight = options.width - 4;
  const bandBottom = top + across * scale;
  const Y = (offset: number) => top + offset * scale;

  items.push({ type: "path", d: rectPath(bandLeft, top, bandRight - bandLeft, bandBottom - top), fill: palette.material[0], stroke: palette.faint, strokeWidth: 0.6, role: "contact" });
  items.push({ type: "path", d: `${moveTo(bandLeft, top)}${lineTo(bandRight, top)}`, stroke: palette.ink, strokeWidth: 1.6, role: "named-edge" });
  items.push({ type: "text", x: bandLeft, y: top - 4, text: L.edge, size: 7.5, anchor: "start", bold: true, fill: palette.ink, role: "edge-name" });

  // Rows along the member, the stagger drawn at scale (at least a dot's width apart so it shows).
  const pitch = (bandRight - bandLeft) / (ROWS + 0.5);
  const shift = L.stagger === null ? 0 : Math.min(pitch * 0.45, Math.max(DOT * 3, L.stagger * scale));
  const xs = Array.from({ length: ROWS }, (_, k) => bandLeft + pitch * (k + 0.6));
  let dots = "";
  for (const x of xs) L.offsets.forEach((o, i) => (dots += circle(x + (i % 2 === 1 ? shift : 0), Y(o), DOT)));
  items.push({ type: "path", d: dots, fill: palette.joint, role: "connectors-across" });

  // Each connector's distance from the edge, as a chain of running dimensions on the left.
  const dimX = dimLeft;
  items.push({ type: "path", d: `${moveTo(dimX, top)}${lineTo(dimX, Y(Math.max(...L.offsets)))}`, stroke: palette.ink, strokeWidth: 0.6, role: "dimension" });
  // Offsets closer than a line of text apart get their labels spread about their middle, each led to its tick.
  const labelYs = spread(L.offsets.map(Y), LABEL_GAP);
  for (const [i, o] of L.offsets.entries()) {
    const y = Y(o);
    const labelY = labelYs[i]!;
    items.push({ type: "path", d: `${moveTo(dimX - 2.5, y + 2.5)}${lineTo(dimX + 2.5, y - 2.5)}${moveTo(dimX, y)}${lineTo(xs[0]! + (i % 2 === 1 ? shift : 0) - DOT, y)}`, stroke: palette.faint, strokeWidth: 0.5 });
    if (Math.abs(labelY - y) > 0.5) items.push({ type: "path", d: `${moveTo(dimX - 4, labelY)}${lineTo(dimX - 1, y)}`, stroke: palette.faint, strokeWidth: 0.4, role: "offset-leader" });
    items.push({ type: "text", x: dimX - 5, y: labelY + 2.5, text: dims.length(o), size: 7, anchor: "end", fill: palette.ink, role: "offset-from-edge" });
  }
  items.push({ type: "path", d: `${moveTo(dimX - 2.5, top + 2.5)}${lineTo(dimX + 2.5, top - 2.5)}`, stroke: palette.ink, strokeWidth: 0.8 });

  if (L.stagger !== null && L.offsets.length > 1) {
    const x0 = xs[ROWS - 1]!;
    const y = bandBottom + 8;
    items.push({ type: "path", d: `${moveTo(x0, Y(L.offsets[0]!))}${lineTo(x0, y + 3)}${moveTo(x0 + shift, Y(L.offsets[1]!))}${lineTo(x0 + shift, y + 3)}${moveTo(x0, y)}${lineTo(x0 + shift, y)}`, stroke: palette.ink, strokeWidth: 0.5, role: "stagger-dimension" });
    items.push({ type: "text", x: x0 - 3, y: y + 3, text: `stagger ${dims.length(L.stagger)}`, size: 7, anchor: "end", fill: palette.ink, role: "stagger" });
  }
  items.push({ type: "text", x: bandLeft, y: options.height - 3, text: drivingFace(L), size: 7.5, anchor: "start", bold: true, fill: palette.ink, role: "driving-face" });
  return {
    width: options.width,
    height: options.height,
    items,
    title: `Row across the contact of ${r.joints.join(", ")}: ${L.offsets.map((o) => dims.length(o)).join(", ")} from the ${L.edge}; ${drivingFace(L)}`,
  };
}

const LABEL_GAP = 8;

/** Increasing positions moved apart to at least `gap`, the group kept about its own middle. */
function spread(ys: number[], gap: number): number[] {
  const out = [...ys];
  for (let i = 1; i < out.length; i++) out[i] = Math.max(out[i]!, out[i - 1]! + gap);
  const shift = (ys.reduce((a, b) => a + b, 0) - out.reduce((a, b) => a + b, 0)) / Math.max(1, ys.length);
  return out.map((y) => y + shift);
}

const circle = (x: number, y: number, radius: number) =>
  `${moveTo(x - radius, y)}A${radius} ${radius} 0 1 0 ${(x + radius).toFixed(2)} ${y.toFixed(2)}A${radius} ${radius} 0 1 0 ${(x - radius).toFixed(2)} ${y.toFixed(2)}Z`;
