import type { ConnectorContext, DoubleShearMembers, JoinedMember } from "../connector/connector-kind.js";
import type { JobDocument } from "../schema/job.js";
import type { Combination } from "../schema/result.js";
import { geometricTolerance, type ContactLine } from "../section/contacts.js";
import type { JointPlane } from "../section/joints.js";
import type { SectionModel } from "../section/section-model.js";

/** Context of a connector at one contact line of a joint, for one combination. */
export function contextFor(combination: Combination, job: Pick<JobDocument, "basis" | "units">, joint: JointPlane, line: ContactLine, headSide: "auto" | "held" | "other", rows: number, section: SectionModel, direction: "along" | "across" = "along"): ConnectorContext {
  return contextsFor([combination], job, joint, line, headSide, rows, section, direction)[0]!;
}

/**
 * Contexts of a connector at one contact line, one per combination: the line's geometry is worked out
 * once and shared (the same objects), so that resistances can be memoised by what changes between them.
 */
export function contextsFor(combinations: Combination[], job: Pick<JobDocument, "basis" | "units">, joint: JointPlane, line: ContactLine, headSide: "auto" | "held" | "other", rows: number, section: SectionModel, direction: "along" | "across" = "along"): ConnectorContext[] {
  const member = memberAt(section);
  const held = new Set(joint.held);
  const inside = member(held.has(line.a) ? line.a : line.b, line);
  const outside = member(held.has(line.a) ? line.b : line.a, line);
  const headIsHeld = headSide === "held" || (headSide === "auto" && inside.thickness <= outside.thickness);
  const ids = new Set(joint.lines.flatMap((l) => [l.a, l.b]));
  const materials = new Map(section.parts.filter((p) => ids.has(p.id)).map((p) => [p.material.id, p.material]));
  const members: [JoinedMember, JoinedMember] = headIsHeld ? [inside, outside] : [outside, inside];
  const double = doubleShearAt(joint, line, section, member);
  const adherends = [...materials.values()].map((m) => ({ material: m.name, shearStrength: m.strength.shear, rollingShear: m.strength.rollingShear }));
  return combinations.map((combination) => ({
    duration: combination.duration,
    categories: combination.categories,
    timeEffect: combination.timeEffect,
    combinationName: combination.name,
    basis: job.basis,
    rows,
    units: job.units,
    direction,
    members,
    double,
    adherends,
  }));
}

/** A part as joined at a contact line: its rectangles touching the line give the thickness across it and the width along it. */
function memberAt(section: SectionModel) {
  const parts = new Map(section.parts.map((p) => [p.id, p]));
  const tol = geometricTolerance(section);
  return (id: string, line: ContactLine): JoinedMember => {
    const part = parts.get(id)!;
    const at = (v: number) => Math.abs(v - line.level) <= tol;
    const touching = part.rects.filter((r) => (line.orientation === "horizontal" ? at(r.y0) || at(r.y1) : at(r.x0) || at(r.x1)));
    const rects = touching.length > 0 ? touching : part.rects;
    const thickness = Math.max(...rects.map((r) => (line.orientation === "horizontal" ? r.y1 - r.y0 : r.x1 - r.x0)));
    const width = Math.max(...rects.map((r) => (line.orientation === "horizontal" ? r.x1 - r.x0 : r.y1 - r.y0)));
    return { part: id, material: part.material, thickness, width };
  };
}

/**
 * The roles of a double-shear joint from its geometry: two parallel contact lines on the two opposite
 * faces of one part, facing each other across it, so that one connector crosses the outer member, the
 * central part and the other outer member. Anything else is refused with the reason.
 */
function doubleShearAt(joint: JointPlane, line: ContactLine, section: SectionModel, member: (id: string, line: ContactLine) => JoinedMember): DoubleShearMembers | { refused: string } {
  const named = (l: ContactLine) => `"${l.a}"–"${l.b}"`;
  if (joint.lines.length !== 2) {
    return { refused: `a connector in double shear crosses two contact lines, one on each face of the central part, but joint ${joint.id} has ${joint.lines.length} (${joint.lines.map(named).join(", ")})` };
  }
  const [p, q] = joint.lines as [ContactLine, ContactLine];
  const shared = [p.a, p.b].filter((id) => id === q.a || id === q.b);
  if (shared.length !== 1) {
    return { refused: `the two contact lines of joint ${joint.id} (${named(p)}, ${named(q)}) do not share one part, so no part lies between two others for a connector in double shear` };
  }
  const central = shared[0]!;
  const tol = geometricTolerance(section);
  const [lower, upper] = p.level <= q.level ? [p, q] : [q, p];
  const between = p.orientation === q.orientation && upper.level - lower.level > tol && lower.b === central && upper.a === central;
  const overlap = Math.min(p.to, q.to) - Math.max(p.from, q.from);
  if (!between || overlap <= tol) {
    return { refused: `the two contact lines of joint ${joint.id} (${named(p)}, ${named(q)}) are not on opposite faces of "${central}" facing each other, so no connector crosses both` };
  }
  const same = (l: ContactLine) => l.a === line.a && l.b === line.b && Math.abs(l.level - line.level) <= tol;
  const other = same(p) ? q : p;
  const outerOf = (l: ContactLine) => member(l.a === central ? l.b : l.a, l);
  const centralHere = member(central, line);
  const centralThere = member(central, other);
  return {
    // The length the connector crosses between the two contact lines.
    central: { ...centralHere, thickness: upper.level - lower.level, width: Math.min(centralHere.width, centralThere.width) },
    outer: [outerOf(same(p) ? p : q), outerOf(other)],
  };
}

/** What a combination changes in a context; every other field is the contact line's and compared by identity. */
const LOADING_FIELDS = new Set(["combinationName", "duration", "categories", "timeEffect"]);

/**
 * compute(context) for each combination (outer) and contact line (inner), computed once per line for
 * combinations of the same loading: the key is what a resistance may depend on (duration class, the
 * categories present, the time effect factor), never the combination's name; a context whose other
 * fields are not those of the line's first context (the same objects) is computed on its own.
 */
export function memoisedByLoading<T>(contexts: ConnectorContext[][], compute: (context: ConnectorContext) => T): T[][] {
  const caches: Map<string, T>[] = [];
  const lineKeys = (contexts[0] ?? []).map((first) => Object.keys(first).filter((k) => !LOADING_FIELDS.has(k)));
  const sameLine = (c: ConnectorContext, first: ConnectorContext, keys: string[]) => {
    const a = c as unknown as Record<string, unknown>;
    const b = first as unknown as Record<string, unknown>;
    if (c === first) return true;
    for (const k in a) if (!LOADING_FIELDS.has(k) && !(k in b)) return false;
    return keys.every((k) => a[k] === b[k]);
  };
  return contexts.map((lines) =>
    lines.map((c, j) => {
      const first = contexts[0]![j];
      if (!first || !sameLine(c, first, lineKeys[j]!)) return compute(c);
      const key = JSON.stringify([c.duration, c.categories, c.timeEffect?.value ?? null, c.timeEffect?.reason ?? null]);
      const cache = (caches[j] ??= new Map());
      if (cache.has(key)) return cache.get(key)!;
      const made = compute(c);
      cache.set(key, made);
      return made;
    }),
  );
}
