import { findContacts, geometricTolerance, type ContactLine } from "../section/contacts.js";
import type { PlacedPart, SectionModel } from "../section/section-model.js";
import { flangeNames, type FlangeName, type JointedLayer, type JointedSection } from "./jointed-section.js";

export type LayeredSection =
  | {
      covered: true;
      section: JointedSection;
      /** The part ids in each layer, so the caller can match joints to flanges. */
      parts: { web: string[] } & Partial<Record<FlangeName, string[]>>;
      /** The contact lines between each flange and the web: where that flange's connectors go. */
      jointLines: Partial<Record<FlangeName, ContactLine[]>>;
    }
  | { covered: false; reason: string };

/**
 * Reads the project's section as the layers of EN 1995-1-1 Annex B (Figure B.1) when it is one:
 * parts at the same level (same bottom and top) form one layer, so two box webs act as one web
 * and flange halves either side of a web act as one flange. Two or three layers are covered: a tee,
 * an I, a box, two or three stacked laminations, flanges on or beside the web. With three layers
 * the web is the layer whose centroid lies between the others (the middle lamination of a stack);
 * with two, the deeper layer (the lower one if equally deep). Anything else is reported as not
 * covered, with the reason.
 */
export function layersFromSection(section: SectionModel): LayeredSection {
  const tol = geometricTolerance(section);
  const groups = groupByLevel(section.parts, tol);
  if (groups.length === 1) {
    return {
      covered: false,
      reason: section.parts.length === 1
        ? "one part: there is no joint for the γ-method"
        : "all parts share the same depth side by side: no layer lies above another (a side-by-side member is a multi-ply beam)",
    };
  }
  if (groups.length > 3) {
    return { covered: false, reason: `${groups.length} layers at different levels: EN 1995-1-1 Annex B covers a web with one or two flanges (two or three layers)` };
  }
  const layers: { ids: string[]; layer: JointedLayer }[] = [];
  for (const g of groups) {
    const built = layerOf(g, tol);
    if (typeof built === "string") return { covered: false, reason: built };
    layers.push({ ids: g.map((p) => p.id), layer: built });
  }
  const byCentroid = [...layers].sort((a, b) => a.layer.centroidY - b.layer.centroidY);
  const web = groups.length === 3
    ? byCentroid[1]!
    : [...layers].sort((a, b) => b.layer.depth - a.layer.depth || a.layer.bottomY - b.layer.bottomY)[0]!;
  const flanges = layers.filter((l) => l !== web);
  const named: Partial<Record<FlangeName, { ids: string[]; layer: JointedLayer }>> = {};
  for (const f of flanges) {
    const dy = f.layer.centroidY - web.layer.centroidY;
    if (Math.abs(dy) <= tol) return { covered: false, reason: "a flange's centroid lies level with the web's: the layers are not one above the other" };
    const name: FlangeName = dy > 0 ? "top" : "bottom";
    if (named[name]) return { covered: false, reason: `two layers lie ${name === "top" ? "above" : "below"} the web: Annex B takes one flange on each side` };
    named[name] = f;
  }
  const contacts = findContacts(section);
  const touching = (a: string[], b: string[]) => contacts.filter((c) => (a.includes(c.a) && b.includes(c.b)) || (a.includes(c.b) && b.includes(c.a)));
  const jointLines: Partial<Record<FlangeName, ContactLine[]>> = {};
  for (const name of flangeNames) {
    const f = named[name];
    if (!f) continue;
    const lines = touching(f.ids, web.ids);
    if (lines.length === 0) return { covered: false, reason: `the ${name} flange (${f.ids.join(", ")}) does not touch the web (${web.ids.join(", ")}): there is no joint to fasten` };
    jointLines[name] = lines;
  }
  if (named.top && named.bottom && touching(named.top.ids, named.bottom.ids).length > 0) {
    return { covered: false, reason: "the flanges touch each other: Annex B joins each flange to the web only" };
  }
  const out: JointedSection = { web: web.layer };
  const parts: { web: string[] } & Partial<Record<FlangeName, string[]>> = { web: web.ids };
  for (const name of flangeNames) {
    const f = named[name];
    if (!f) continue;
    out[name] = f.layer;
    parts[name] = f.ids;
  }
  return { covered: true, section: out, parts, jointLines };
}

function groupByLevel(parts: PlacedPart[], tol: number): PlacedPart[][] {
  const groups: { y0: number; y1: number; parts: PlacedPart[] }[] = [];
  for (const p of parts) {
    const y0 = Math.min(...p.rects.map((r) => r.y0));
    const y1 = Math.max(...p.rects.map((r) => r.y1));
    const g = groups.find((g) => Math.abs(g.y0 - y0) <= tol && Math.abs(g.y1 - y1) <= tol);
    if (g) g.parts.push(p);
    else groups.push({ y0, y1, parts: [p] });
  }
  return groups.map((g) => g.parts);
}

/** A layer of full-depth rectangles of one modulus, or the reason it is not one. */
function layerOf(parts: PlacedPart[], tol: number): JointedLayer | string {
  const modulus = parts[0]!.material.E;
  if (parts.some((p) => Math.abs(p.material.E - modulus) > 1e-9 * modulus)) {
    return `parts ${parts.map((p) => p.id).join(", ")} lie at the same level with different moduli: Annex B takes one E per layer`;
  }
  const rects = parts.flatMap((p) => p.rects);
  const y0 = Math.min(...rects.map((r) => r.y0));
  const y1 = Math.max(...rects.map((r) => r.y1));
  const notFullDepth = parts.find((p) => p.rects.some((r) => Math.abs(r.y0 - y0) > tol || Math.abs(r.y1 - y1) > tol));
  if (notFullDepth) {
    return `part ${notFullDepth.id} is not a full-depth rectangle of its layer (a shaped part): Annex B's layers are rectangles`;
  }
  const depth = y1 - y0;
  const width = rects.reduce((s, r) => s + (r.x1 - r.x0), 0);
  return { modulus, area: width * depth, secondMoment: (width * depth ** 3) / 12, depth, width, centroidY: (y0 + y1) / 2, bottomY: y0 };
}
