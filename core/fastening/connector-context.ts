import type { ConnectorContext, JoinedMember } from "../connector/connector-kind.js";
import type { JobDocument } from "../schema/job.js";
import type { Combination } from "../schema/result.js";
import { geometricTolerance, type ContactLine } from "../section/contacts.js";
import type { JointPlane } from "../section/joints.js";
import type { SectionModel } from "../section/section-model.js";

/** Context of a connector at one contact line of a joint, for one combination. */
export function contextFor(combination: Combination, job: Pick<JobDocument, "basis" | "units">, joint: JointPlane, line: ContactLine, headSide: "auto" | "held" | "other", rows: number, section: SectionModel): ConnectorContext {
  const parts = new Map(section.parts.map((p) => [p.id, p]));
  const member = (id: string): JoinedMember => {
    const part = parts.get(id)!;
    const tol = geometricTolerance(section);
    const at = (v: number) => Math.abs(v - line.level) <= tol;
    const touching = part.rects.filter((r) => (line.orientation === "horizontal" ? at(r.y0) || at(r.y1) : at(r.x0) || at(r.x1)));
    const rects = touching.length > 0 ? touching : part.rects;
    const thickness = Math.max(...rects.map((r) => (line.orientation === "horizontal" ? r.y1 - r.y0 : r.x1 - r.x0)));
    const width = Math.max(...rects.map((r) => (line.orientation === "horizontal" ? r.x1 - r.x0 : r.y1 - r.y0)));
    return { part: id, material: part.material, thickness, width };
  };
  const held = new Set(joint.held);
  const inside = member(held.has(line.a) ? line.a : line.b);
  const outside = member(held.has(line.a) ? line.b : line.a);
  const headIsHeld = headSide === "held" || (headSide === "auto" && inside.thickness <= outside.thickness);
  const ids = new Set(joint.lines.flatMap((l) => [l.a, l.b]));
  const materials = new Map(section.parts.filter((p) => ids.has(p.id)).map((p) => [p.material.id, p.material]));
  return {
    duration: combination.duration,
    categories: combination.categories,
    timeEffect: combination.timeEffect,
    combinationName: combination.name,
    basis: job.basis,
    rows,
    units: job.units,
    members: headIsHeld ? [inside, outside] : [outside, inside],
    adherends: [...materials.values()].map((m) => ({ material: m.name, shearStrength: m.strength.shear, rollingShear: m.strength.rollingShear })),
  };
}
