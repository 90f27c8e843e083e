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
  /** The contact lines this joint fastens: those its cut governs (a line crossed by several cuts is fastened for the one that loads it most). */
  lines: ContactLine[];
  /** Every contact line the cut crosses: V·Q/I is shared among these. */
  crossed: ContactLine[];
  /** Total touching width across every crossed line: the t of τ = VQ/(I·t), mm. */
  contactWidth: number;
  /** First moment of the held group about the neutral axis, magnitude, mm³. */
  firstMoment: number;
  /** True when found from the contacts; false when the user named the held group. */
  found: boolean;
}

/**
 * How the flow across a cut is shared among its lines: equally per line (the same connector or weld
 * on each, so equal stiffness), or in proportion to each line's width (a glue line: one stress).
 */
export type FlowSharing = "per-line" | "by-width";

/**
 * A contact line that no joint fastens (the section has too many parts to search), or a line of a cut
 * whose lines, as the named joints fasten them, carry less than its Q.
 */
export type UncoveredContact =
  | { line: ContactLine; cause: "too-many-parts"; parts: number }
  | { line: ContactLine; cause: "no-cut" }
  | { line: ContactLine; cause: "short-cut"; held: string[]; firstMoment: number; carried: number; lines: number };

/** Upper bound on parts for the exhaustive search over cuts (2^n subsets). */
export const MAX_PARTS_FOR_JOINT_SEARCH = 16;

/** The share of a cut's flow V·Q/I (as Q, mm³) one of its crossed lines carries. */
export function lineShare(line: ContactLine, joint: Pick<JointPlane, "crossed" | "contactWidth" | "firstMoment">, sharing: FlowSharing): number {
  return sharing === "per-line" ? joint.firstMoment / joint.crossed.length : (joint.firstMoment * line.length) / joint.contactWidth;
}

/** The joints found from the contacts alone (see `searchJoints`). */
export function findJoints(section: SectionModel, contacts: ContactLine[], sharing: FlowSharing = "per-line"): JointPlane[] {
  return searchJoints(section, contacts, { sharing }).joints;
}

/**
 * Finds the joints of a connected section so that every contact line belongs to one.
 *
 * A cut is a split of the section into two connected groups; V·Q/I of the held group crosses the
 * contact lines between them, whatever their orientation, so the lines of every cut together must
 * carry it. First, for each contact line, the cut that crosses it with its lines at one level
 * (horizontal lines at one height, or vertical lines over a common depth), fewest lines, smaller side
 * held. Then every cut (any orientation) is checked: where the shares its lines are fastened for add up
 * to less than its Q, its lines that carry less than their share of it are fastened for that cut
 * instead, the cut of the largest share first, until every cut is carried. A line no cut has reached is
 * fastened for the cut that loads it most. Lines of `fixed` joints (held groups the user named) keep
 * their joint; a cut they leave short is reported, with every line no joint fastens.
 */
export function searchJoints(
  section: SectionModel,
  contacts: ContactLine[],
  options: { sharing?: FlowSharing; fixed?: { joint: JointPlane; sharing: FlowSharing }[] } = {},
): { joints: JointPlane[]; uncovered: UncoveredContact[] } {
  const sharing = options.sharing ?? "per-line";
  const fixed = options.fixed ?? [];
  const n = section.parts.length;
  const key = (l: ContactLine) => `${l.a}|${l.b}|${l.orientation}|${l.level}`;
  // The share each line is fastened for (as Q, mm³): from the user's joints, then from the search.
  const fixedShare = new Map<string, number>();
  for (const f of fixed) for (const l of f.joint.lines) fixedShare.set(key(l), Math.max(fixedShare.get(key(l)) ?? 0, lineShare(l, f.joint, f.sharing)));
  // Each line's share from the user's joints, by index (looked up again and again below).
  const fixedOf = contacts.map((c) => fixedShare.get(key(c)));
  const open = contacts.map((_, k) => k).filter((k) => fixedOf[k] === undefined);
  if (n < 2) return { joints: [], uncovered: [] };
  if (n > MAX_PARTS_FOR_JOINT_SEARCH) {
    return { joints: [], uncovered: open.map((k) => ({ line: contacts[k]!, cause: "too-many-parts" as const, parts: n })) };
  }
  const index = new Map(section.parts.map((p, i) => [p.id, i]));
  const adjacency = new Array<number>(n).fill(0);
  const ends = new Int32Array(2 * contacts.length);
  contacts.forEach((c, k) => ((ends[2 * k] = index.get(c.a)!), (ends[2 * k + 1] = index.get(c.b)!)));
  for (const c of contacts) {
    const i = index.get(c.a)!;
    const j = index.get(c.b)!;
    adjacency[i]! |= 1 << j;
    adjacency[j]! |= 1 << i;
  }
  const partMoment = section.parts.map((p) => firstMomentOfParts(section, new Set([p.id])));
  const full = (1 << n) - 1;
  const tol = geometricTolerance(section);
  // Rounding of Q is relative to A·d, the scale of a first moment: parts balanced about the neutral axis
  // (side-by-side plies centred on one level) have Q of rounding size only, which is no shear flow.
  const qTol = 1e-9 * Math.max(...section.parts.map((_, i) => Math.abs(partMoment[i]!)), tol, section.transformedArea * (section.bounds.y1 - section.bounds.y0));

  interface Cut { mask: number; crossed: number[]; firstMoment: number; width: number; smallerArea: number; oneLevel: boolean }
  const cuts: Cut[] = [];
  // Each unordered split is visited once: the side without part 0.
  for (let mask = 2; mask < full; mask += 2) {
    if (!isConnected(mask, adjacency) || !isConnected(full & ~mask, adjacency)) continue;
    const crossed: number[] = [];
    for (let k = 0; k < contacts.length; k++) if (((mask >> ends[2 * k]!) & 1) !== ((mask >> ends[2 * k + 1]!) & 1)) crossed.push(k);
    let q = 0;
    for (let i = 0; i < n; i++) if ((mask >> i) & 1) q += partMoment[i]!;
    cuts.push({
      mask,
      crossed,
      firstMoment: Math.abs(q),
      width: crossed.reduce((s, k) => s + contacts[k]!.length, 0),
      smallerArea: Math.min(areaOf(section, mask), areaOf(section, full & ~mask)),
      oneLevel: liesAtOneLevel(crossed.map((k) => contacts[k]!), tol),
    });
  }
  const shareOf = (k: number, cut: Cut) => (sharing === "per-line" ? cut.firstMoment / cut.crossed.length : (cut.firstMoment * contacts[k]!.length) / cut.width);
  // The flow each line of a cut carries: per line, or per unit width for a glue line.
  const intensity = (cut: Cut) => cut.firstMoment / (sharing === "per-line" ? cut.crossed.length : cut.width);
  const fewerThenSmaller = (c: Cut, best: Cut) => c.crossed.length < best.crossed.length || (c.crossed.length === best.crossed.length && c.smallerArea < best.smallerArea - tol * tol);

  const assigned = new Map<number, Cut>();
  for (const cut of cuts) {
    if (!cut.oneLevel) continue;
    for (const k of cut.crossed) {
      if (fixedOf[k] !== undefined) continue;
      const current = assigned.get(k);
      if (!current || fewerThenSmaller(cut, current)) assigned.set(k, cut);
    }
  }
  const carried = (k: number) => {
    const fixedHere = fixedOf[k];
    if (fixedHere !== undefined) return fixedHere;
    const cut = assigned.get(k);
    return cut ? shareOf(k, cut) : 0;
  };
  const short = new Set<Cut>();
  for (let round = 0; round < 64 * contacts.length + 16; round++) {
    let worst: Cut | null = null;
    for (const cut of cuts) {
      if (short.has(cut)) continue;
      const sum = cut.crossed.reduce((s, k) => s + carried(k), 0);
      if (sum >= cut.firstMoment - qTol) continue;
      if (!worst || intensity(cut) > intensity(worst)) worst = cut;
    }
    if (!worst) break;
    const raised = worst.crossed.filter((k) => fixedOf[k] === undefined && carried(k) < shareOf(k, worst!) - qTol);
    if (raised.length === 0) short.add(worst);
    for (const k of raised) assigned.set(k, worst);
  }
  for (const k of open) {
    if (assigned.has(k)) continue;
    let best: Cut | null = null;
    for (const cut of cuts) {
      if (!cut.crossed.includes(k)) continue;
      if (!best || shareOf(k, cut) > shareOf(k, best) + qTol || (Math.abs(shareOf(k, cut) - shareOf(k, best)) <= qTol && fewerThenSmaller(cut, best))) best = cut;
    }
    if (best) assigned.set(k, best);
  }

  const joints = new Map<string, JointPlane>();
  for (const cut of new Set(assigned.values())) {
    const held = heldSide(section, cut.mask, full & ~cut.mask).map((i) => section.parts[i]!.id);
    const lines = cut.crossed.filter((k) => assigned.get(k) === cut).map((k) => contacts[k]!);
    const joint = jointOf(section, held, cut.crossed.map((k) => contacts[k]!), true);
    joints.set(joint.id, { ...joint, lines });
  }
  // In a connected section every contact line lies on some cut (drop it from a spanning tree of the contacts).
  const uncovered: UncoveredContact[] = open.filter((k) => !assigned.has(k)).map((k) => ({ line: contacts[k]!, cause: "no-cut" as const }));
  for (const cut of short) {
    const held = heldSide(section, cut.mask, full & ~cut.mask).map((i) => section.parts[i]!.id);
    const sum = cut.crossed.reduce((s, k) => s + carried(k), 0);
    const line = contacts[cut.crossed.find((k) => fixedOf[k] !== undefined) ?? cut.crossed[0]!]!;
    uncovered.push({ line, cause: "short-cut", held, firstMoment: cut.firstMoment, carried: sum, lines: cut.crossed.length });
  }
  const order = (j: JointPlane) => -Math.max(...j.lines.map((l) => l.level));
  return { joints: [...joints.values()].sort((p, q) => order(p) - order(q) || p.id.localeCompare(q.id)), uncovered };
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
    crossed: lines,
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
