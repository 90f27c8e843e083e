import { geometricTolerance, type ContactLine } from "./contacts.js";
import { firstMomentOfParts, type SectionModel } from "./section-model.js";

/**
 * A joint: the group of parts held by connectors (or glue) against the rest of the section,
 * and the contact lines the cut between them crosses.
 */
export interface JointPlane {
  /** The held part ids joined by "+", in section order. */
  id: string;
  held: string[];
  lines: ContactLine[];
  /** Total touching width across all lines: the t of τ = VQ/(I·t), mm. */
  contactWidth: number;
  /** First moment of the held group about the neutral axis, magnitude, mm³. */
  firstMoment: number;
  /** True when found from the contacts; false when the user named the held group. */
  found: boolean;
}

/** Upper bound on parts for the exhaustive search over cuts (2^n subsets). */
export const MAX_PARTS_FOR_JOINT_SEARCH = 16;

/**
 * Finds the joints of a connected section. For each contact line, the cut that crosses it is the
 * split of the section into two connected groups whose crossed lines lie at one level (horizontal
 * lines at one height, or vertical lines over a common depth) with the fewest lines; the held group
 * is the smaller side by area (then the side farther from the neutral axis, then the upper side).
 */
export function findJoints(section: SectionModel, contacts: ContactLine[]): JointPlane[] {
  const n = section.parts.length;
  if (n < 2 || n > MAX_PARTS_FOR_JOINT_SEARCH) return [];
  const index = new Map(section.parts.map((p, i) => [p.id, i]));
  const adjacency = new Array<number>(n).fill(0);
  for (const c of contacts) {
    const i = index.get(c.a)!;
    const j = index.get(c.b)!;
    adjacency[i]! |= 1 << j;
    adjacency[j]! |= 1 << i;
  }
  const full = (1 << n) - 1;
  const tol = geometricTolerance(section);
  const best = new Map<number, { mask: number; crossed: number[]; smallerArea: number }>();
  // Each unordered split is visited once: the side without part 0.
  for (let mask = 1; mask < full; mask++) {
    if (mask & 1) continue;
    if (!isConnected(mask, adjacency) || !isConnected(full & ~mask, adjacency)) continue;
    const crossed: number[] = [];
    contacts.forEach((c, k) => {
      const inA = (mask >> index.get(c.a)!) & 1;
      const inB = (mask >> index.get(c.b)!) & 1;
      if (inA !== inB) crossed.push(k);
    });
    if (!liesAtOneLevel(crossed.map((k) => contacts[k]!), tol)) continue;
    const smallerArea = Math.min(areaOf(section, mask), areaOf(section, full & ~mask));
    for (const k of crossed) {
      const current = best.get(k);
      if (!current || crossed.length < current.crossed.length || (crossed.length === current.crossed.length && smallerArea < current.smallerArea - tol * tol)) {
        best.set(k, { mask, crossed, smallerArea });
      }
    }
  }
  const joints = new Map<string, JointPlane>();
  for (const { mask, crossed } of best.values()) {
    const held = heldSide(section, mask, full & ~mask);
    const joint = jointOf(section, held.map((i) => section.parts[i]!.id), crossed.map((k) => contacts[k]!), true);
    joints.set(joint.id, joint);
  }
  const order = (j: JointPlane) => -Math.max(...j.lines.map((l) => l.level));
  return [...joints.values()].sort((p, q) => order(p) - order(q) || p.id.localeCompare(q.id));
}

/** The joint of a held group the user names, crossing every contact line between it and the rest. */
export function jointForHeldGroup(section: SectionModel, contacts: ContactLine[], held: string[]): JointPlane {
  const inside = new Set(held);
  const lines = contacts.filter((c) => inside.has(c.a) !== inside.has(c.b));
  const ordered = section.parts.map((p) => p.id).filter((id) => inside.has(id));
  return jointOf(section, ordered, lines, false);
}

function jointOf(section: SectionModel, held: string[], lines: ContactLine[], found: boolean): JointPlane {
  return {
    id: held.join("+"),
    held,
    lines,
    contactWidth: lines.reduce((s, l) => s + l.length, 0),
    firstMoment: Math.abs(firstMomentOfParts(section, new Set(held))),
    found,
  };
}

function liesAtOneLevel(lines: ContactLine[], tol: number): boolean {
  const first = lines[0];
  if (!first) return false;
  if (lines.some((l) => l.orientation !== first.orientation)) return false;
  if (first.orientation === "horizontal") return lines.every((l) => Math.abs(l.level - first.level) <= tol);
  return lines.every((l) => lines.every((m) => Math.min(l.to, m.to) - Math.max(l.from, m.from) > tol));
}

function isConnected(mask: number, adjacency: number[]): boolean {
  if (mask === 0) return false;
  let reached = mask & -mask;
  for (;;) {
    let next = reached;
    for (let i = 0; i < adjacency.length; i++) if ((reached >> i) & 1) next |= adjacency[i]! & mask;
    if (next === reached) return reached === mask;
    reached = next;
  }
}

function areaOf(section: SectionModel, mask: number): number {
  return section.parts.reduce((s, p, i) => s + ((mask >> i) & 1 ? p.area : 0), 0);
}

function heldSide(section: SectionModel, a: number, b: number): number[] {
  const members = (mask: number) => section.parts.map((_, i) => i).filter((i) => (mask >> i) & 1);
  const stats = (mask: number) => {
    let area = 0;
    let ay = 0;
    let ax = 0;
    for (const i of members(mask)) {
      const p = section.parts[i]!;
      for (const r of p.rects) {
        const ar = (r.x1 - r.x0) * (r.y1 - r.y0);
        area += ar;
        ay += ar * (r.y0 + r.y1) / 2;
        ax += ar * (r.x0 + r.x1) / 2;
      }
    }
    return { area, y: ay / area, x: ax / area };
  };
  const sa = stats(a);
  const sb = stats(b);
  const rel = 1e-9 * Math.max(sa.area, sb.area);
  let pick: number;
  if (Math.abs(sa.area - sb.area) > rel) pick = sa.area < sb.area ? a : b;
  else {
    const da = Math.abs(sa.y - section.centroidY);
    const db = Math.abs(sb.y - section.centroidY);
    if (Math.abs(da - db) > 1e-9 * (da + db + 1)) pick = da > db ? a : b;
    else if (Math.abs(sa.y - sb.y) > 1e-9) pick = sa.y > sb.y ? a : b;
    else pick = sa.x > sb.x ? a : b;
  }
  return members(pick);
}
