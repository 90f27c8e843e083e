import { beamIssues } from "./beam/beam-issues.js";
import { checkConnectorPlacement } from "./connector/check-placement.js";
import { kindOf } from "./connector/registry.js";
import { layersFromSection } from "./composite/layers-from-section.js";
import { plyStretchesOf } from "./fastening/side-load-transfer.js";
import { physicalRangeIssues } from "./physical-ranges.js";
import { JobDocument } from "./schema/job.js";
import { issuesFromZod, type JobIssue } from "./schema/job-issues.js";
import { connectedGroups, findContacts, findOverlaps, type ContactLine } from "./section/contacts.js";
import { memberJoints, type MemberJoint } from "./fastening/member-joints.js";
import { resolvePlacement } from "./section/place-parts.js";
import { partExtent, partStretches, sectionStretches } from "./section/stretches.js";
import { buildSection, positioned, type SectionModel } from "./section/section-model.js";
import { toCoreUnits } from "./units/convert.js";
import { inJobUnits } from "./units/format.js";

export type PreparedJob = { ok: true; job: JobDocument; core: JobDocument } | { ok: false; issues: JobIssue[] };

/**
 * Parses a job document, checks what the schema cannot, and converts it to core units. Checks of
 * fields against each other run on the job as written; checks of the geometry run in core units
 * (after placements are resolved) and quote their numbers back in the job's units.
 */
export function prepareJob(input: unknown): PreparedJob {
  const parsed = JobDocument.safeParse(input, { reportInput: true });
  if (!parsed.success) return { ok: false, issues: issuesFromZod(parsed.error) };
  const converted = toCoreUnits(JobDocument, parsed.data, parsed.data.units);
  // Ranges first: a number outside them is the problem to report, not what other checks make of it.
  const ranges = physicalRangeIssues(parsed.data, converted);
  if (ranges.length > 0) return { ok: false, issues: ranges };
  const issues = checkJob(parsed.data);
  if (issues.length > 0) return { ok: false, issues };
  const placement = resolvePlacement(converted.parts);
  if (placement.issues.length > 0) return { ok: false, issues: placement.issues };
  const core = { ...converted, parts: placement.parts };
  const geometric = geometryOf(core);
  if (geometric.issues.length > 0) return { ok: false, issues: geometric.issues };
  const placed = checkConnectorPlacement(core, geometric.whole);
  if (placed.length > 0) return { ok: false, issues: placed };
  return { ok: true, job: parsed.data, core };
}

/** Checks of a schema-valid job that need more than one field: ids and references, the beam and its loads. */
export function checkJob(job: JobDocument): JobIssue[] {
  const issues: JobIssue[] = [];
  const add = (path: string, message: string) => issues.push({ path, message });

  for (const list of ["materials", "parts", "connectors"] as const) {
    const seen = new Map<string, number>();
    job[list].forEach((item, i) => {
      const first = seen.get(item.id);
      if (first !== undefined) add(`${list}[${i}].id`, `"${item.id}" is already the id of ${list}[${first}]; ids must be unique`);
      else seen.set(item.id, i);
    });
  }
  const materialIds = new Set(job.materials.map((m) => m.id));
  const connectorIds = new Set(job.connectors.map((c) => c.id));
  const partIds = new Set(job.parts.map((p) => p.id));
  job.parts.forEach((p, i) => {
    if (!materialIds.has(p.material)) add(`parts[${i}].material`, `"${p.material}" is not one of the materials (${[...materialIds].join(", ")})`);
  });
  const checkConnector = (path: string, id: string) => {
    if (!connectorIds.has(id)) add(path, `"${id}" is not one of the connectors (${[...connectorIds].join(", ")})`);
  };
  checkConnector("fastening.default.connector", job.fastening.default.connector);
  job.connectors.forEach((c, i) => {
    if (c.kind === "rated" && c.maxSpacing !== undefined && c.maxSpacing < c.minSpacing) {
      add(`connectors[${i}].maxSpacing`, `${c.maxSpacing} is less than the minimum spacing ${c.minSpacing}`);
    }
  });
  const heldSeen = new Map<string, number>();
  job.fastening.joints.forEach((j, k) => {
    const path = `fastening.joints[${k}]`;
    checkConnector(`${path}.connector`, j.connector);
    const unknown = j.held.filter((id) => !partIds.has(id));
    if (unknown.length > 0) return add(`${path}.held`, `names part(s) not in the section: ${unknown.join(", ")}`);
    const held = new Set(j.held);
    if (held.size === partIds.size) return add(`${path}.held`, "holds every part of the section; a joint must leave some parts on the other side of the cut");
    const key = [...held].sort().join("+");
    const first = heldSeen.get(key);
    if (first !== undefined) add(`${path}.held`, `the same held group as fastening.joints[${first}]`);
    else heldSeen.set(key, k);
  });
  if (issues.length > 0) return issues;
  for (const issue of beamIssues(job)) add(issue.path, issue.message);
  if (job.compression) {
    const known = new Set<string>(["dead", "live", "roof-live", "snow", "wind", ...job.beam.categories.map((c) => c.id)]);
    const L = job.beam.spans.reduce((s, l) => s + l, 0);
    job.compression.loads.forEach((l, i) => {
      if (!known.has(l.category)) add(`compression.loads[${i}].category`, `"${l.category}" is not a load category: use one of ${[...known].join(", ")}, or define it in beam.categories`);
    });
    job.compression.packing.forEach((id, i) => {
      if (!job.parts.some((p) => p.id === id)) add(`compression.packing[${i}]`, `"${id}" is not one of the parts`);
    });
    if (job.compression.rule === "en1993-6.4" && job.basis !== "factored") add("basis", `EN 1993-1-1 §6.4 (compression.rule "en1993-6.4") works with design values (γ_M1) only: set basis to "factored"`);
    const spaced = job.compression.spaced;
    if (spaced) {
      if (job.compression.packing.length === 0) add("compression.packing", "a spaced column (compression.spaced) needs its packs or gussets listed here");
      if (spaced.packSpacing >= L * (1 + 1e-9)) add("compression.spaced.packSpacing", `${spaced.packSpacing} is longer than the column (its height is the member's length, ${Number(L.toPrecision(6))})`);
    }
    for (const axis of ["x", "y"] as const) {
      job.compression[axis].bracedAt.forEach((x, i) => {
        if (x >= L * (1 - 1e-9)) add(`compression.${axis}.bracedAt[${i}]`, `${x} is at or beyond the top of the column (its height is the member's length, ${Number(L.toPrecision(6))})`);
      });
    }
  }
  return issues;
}

/** Checks of the section and what depends on it, on a job in core units with its placements resolved. */
export function checkGeometry(job: JobDocument): JobIssue[] {
  return geometryOf(job).issues;
}

/** checkGeometry's issues, and the whole section with its contacts once it got that far (the placement check reads the same). */
function geometryOf(job: JobDocument): { issues: JobIssue[]; whole?: { section: SectionModel; contacts: ContactLine[] } } {
  const issues: JobIssue[] = [];
  const add = (path: string, message: string) => issues.push({ path, message });
  const text = (value: number, quantity: Parameters<typeof inJobUnits>[1]) => inJobUnits(value, quantity, job.units);
  const L = job.beam.spans.reduce((s, l) => s + l, 0);
  job.parts.forEach((p, i) => {
    if (!p.extent) return;
    const { from, to } = partExtent(p, L);
    if (to > L * (1 + 1e-9)) add(`parts[${i}].extent.to`, `${text(to, "span")} is beyond the end of the member (length ${text(L, "span")})`);
    else if (from >= to) add(`parts[${i}].extent.from`, `the part must start before it ends (from ${text(from, "span")} to ${text(to, "span")})`);
  });
  if (issues.length > 0) return { issues };
  const all = positioned(job.parts);
  const stretches = partStretches(job, L);
  const several = stretches.length > 1;
  // A stretch of every part has the whole section: built and searched for contacts once, for both checks.
  let whole: { section: SectionModel; contacts: ContactLine[] } | undefined;
  for (const stretch of stretches) {
    const where = several ? ` between ${text(stretch.x0, "span")} and ${text(stretch.x1, "span")} along the member` : "";
    if (stretch.parts.length === 0) {
      add("parts", `no part runs${where}: every point of the member needs a section`);
      continue;
    }
    const present = all.filter((p) => stretch.parts.includes(p.id));
    const here = buildSection(present, job.materials);
    for (const o of findOverlaps(here)) {
      const i = job.parts.findIndex((p) => p.id === o.b);
      const j = job.parts.findIndex((p) => p.id === o.a);
      add(`parts[${i}]`, `part "${o.b}" overlaps part "${o.a}" (parts[${j}]) over an area of ${text(o.area, "area")}${where}; parts may touch but not overlap`);
    }
    if (issues.length > 0) return { issues };
    const touching = findContacts(here);
    if (!whole && present.length === all.length) whole = { section: here, contacts: touching };
    const groups = connectedGroups(here, touching);
    if (groups.length > 1) {
      const main = groups.reduce((a, b) => (b.length > a.length ? b : a));
      for (const g of groups) {
        if (g === main) continue;
        for (const id of g) {
          const i = job.parts.findIndex((p) => p.id === id);
          add(`parts[${i}]`, `part "${id}" does not touch the rest of the section (${main.join(", ")})${where}; every part must share a face with another over some length`);
        }
      }
    }
  }
  if (issues.length > 0) return { issues };
  if (!whole) {
    const section = buildSection(all, job.materials);
    whole = { section, contacts: findContacts(section) };
  }
  const { section, contacts } = whole;
  job.fastening.joints.forEach((j, k) => {
    const held = new Set(j.held);
    if (!contacts.some((c) => held.has(c.a) !== held.has(c.b))) add(`fastening.joints[${k}].held`, "these parts touch no other part, so no connectors can hold them");
  });
  if (!plyStretchesOf(sectionStretches(job, L))) {
    job.beam.loads.forEach((load, i) => {
      if (load.type !== "moment" && load.face !== "top") {
        add(`beam.loads[${i}].face`, `a load on the ${load.face} face applies to members of side-by-side plies (of any depths and levels, standing face to face); this section is not one, so the load must act on top`);
      }
    });
  }
  if (job.compositeAction.model === "slip-aware") {
    const layered = layersFromSection(section);
    if (several) add("compositeAction.model", "slip-aware composite action (the γ-method of EN 1995-1-1 Annex B) is for members of one section; parts here start or stop along the member");
    else if (!layered.covered) add("compositeAction.model", `slip-aware composite action (the γ-method of EN 1995-1-1 Annex B) does not apply to this section: ${layered.reason}`);
  }
  if (issues.length > 0) return { issues };
  if (job.mode === "check") issues.push(...checkProvidedSchedules(memberJoints(job, sectionStretches(job, L), L), L, (x) => text(x, "span")));
  return { issues, whole };
}

/** Check mode: every connector joint needs the schedule to check, with zones from end to end and rows on the member. */
function checkProvidedSchedules(joints: MemberJoint[], L: number, span: (x: number) => string): JobIssue[] {
  const issues: JobIssue[] = [];
  const seen = new Set<string>();
  for (const { connector, fastening, path, extent } of joints) {
    const [start, end] = extent ? [extent.from, extent.to] : [0, L];
    const mechanism = kindOf(connector).mechanism;
    if (seen.has(path) || mechanism === "bond-line") continue;
    seen.add(path);
    const provided = fastening.provided;
    // A weld without a provided schedule is checked as the connector lays it out (continuous, or segments at its pitch).
    if (!provided && mechanism === "weld") continue;
    if (!provided) {
      issues.push({ path: `${path}.provided`, message: "check mode needs the schedule to check here: zones (from, to, spacing) or the positions of the rows" });
      continue;
    }
    const tol = 1e-6 * Math.max(L, 1);
    if (provided.type === "zones") {
      provided.zones.forEach((z, i) => {
        const at = `${path}.provided.zones[${i}]`;
        const expectedFrom = i === 0 ? start : provided.zones[i - 1]!.to;
        if (Math.abs(z.from - expectedFrom) > tol) issues.push({ path: `${at}.from`, message: `must be ${span(expectedFrom)}: zones run from the left end to the right end without gaps or overlaps` });
        if (z.to <= z.from) issues.push({ path: `${at}.to`, message: `must be beyond its start (${span(z.from)})` });
      });
      // The rows a zone schedule gives are limited with the physical ranges (MAX_PROVIDED_ROWS), which are checked first.
      const last = provided.zones[provided.zones.length - 1]!;
      if (Math.abs(last.to - end) > tol) issues.push({ path: `${path}.provided.zones[${provided.zones.length - 1}].to`, message: extent ? `must be where the joint ends, ${span(end)}` : `must be the member's length, ${span(L)}` });
    } else {
      provided.positions.forEach((x, i) => {
        if (x > end + tol || x < start - tol) issues.push({ path: `${path}.provided.positions[${i}]`, message: extent ? `${span(x)} is outside the joint, which runs from ${span(start)} to ${span(end)}` : `${span(x)} is beyond the end of the member (length ${span(L)})` });
        else if (i > 0 && x <= provided.positions[i - 1]!) issues.push({ path: `${path}.provided.positions[${i}]`, message: "positions must increase from the left end" });
      });
    }
  }
  return issues;
}
