import type { SectionPart } from "../schema/job.js";
import type { JobIssue } from "../schema/job-issues.js";
import { shapeSize, type PositionedPart } from "./rectangles.js";

/**
 * Positions of parts placed against others ("on top of the web, centred"), resolved in dependency
 * order. Each placed part touches the face of the part it is placed on.
 */
export function resolvePlacement(parts: SectionPart[]): { parts: PositionedPart[]; issues: JobIssue[] } {
  const issues: JobIssue[] = [];
  const index = new Map(parts.map((p, i) => [p.id, i]));
  const resolved = new Map<string, PositionedPart>();
  const visiting = new Set<string>();

  const resolve = (i: number): PositionedPart | undefined => {
    const part = parts[i]!;
    const done = resolved.get(part.id);
    if (done) return done;
    if (!part.place) {
      const positioned = { ...part, x: part.x!, y: part.y! };
      resolved.set(part.id, positioned);
      return positioned;
    }
    const path = `parts[${i}].place.on`;
    const j = index.get(part.place.on);
    if (j === undefined) return void issues.push({ path, message: `"${part.place.on}" is not one of the parts` });
    if (j === i) return void issues.push({ path, message: "a part cannot be placed on itself" });
    if (visiting.has(part.id)) return void issues.push({ path, message: `placements go round in a circle through "${part.id}"` });
    visiting.add(part.id);
    const base = resolve(j);
    visiting.delete(part.id);
    if (!base) return undefined;
    const b = shapeSize(base.shape);
    const s = shapeSize(part.shape);
    const { side, align } = part.place;
    const across = (start: number, baseSize: number, size: number) => (align === "start" ? start : align === "end" ? start + baseSize - size : start + (baseSize - size) / 2);
    const positioned: PositionedPart =
      side === "top" || side === "bottom"
        ? { ...part, x: across(base.x, b.width, s.width), y: side === "top" ? base.y + b.depth : base.y - s.depth }
        : { ...part, y: across(base.y, b.depth, s.depth), x: side === "right" ? base.x + b.width : base.x - s.width };
    resolved.set(part.id, positioned);
    return positioned;
  };

  parts.forEach((_, i) => resolve(i));
  if (issues.length > 0) return { parts: [], issues: dedupe(issues) };
  return { parts: parts.map((p) => resolved.get(p.id)!), issues };
}

function dedupe(issues: JobIssue[]): JobIssue[] {
  const seen = new Set<string>();
  return issues.filter((i) => (seen.has(i.path + i.message) ? false : (seen.add(i.path + i.message), true)));
}
