// prepareJob as it was before the speed work (issue 20), its geometry check building the whole section a
// second time: the reference for test/server/answer-bytes.test.ts. Not used by the program.
import { beamIssues } from "../../../core/beam/beam-issues.js";
import { checkConnectorPlacement } from "../../../core/connector/check-placement.js";
import { kindOf } from "../../../core/connector/registry.js";
import { layersFromSection } from "../../../core/composite/layers-from-section.js";
import { plyStretchesOf } from "../../../core/fastening/side-load-transfer.js";
import { physicalRangeIssues } from "../../../core/physical-ranges.js";
import { JobDocument } from "../../../core/schema/job.js";
import { issuesFromZod, type JobIssue } from "../../../core/schema/job-issues.js";
import { connectedGroups, findContacts, findOverlaps, type ContactLine } from "../../../core/section/contacts.js";
import { memberJoints, type MemberJoint } from "../../../core/fastening/member-joints.js";
import { resolvePlacement } from "../../../core/section/place-parts.js";
import { partExtent, partStretches, sectionStretches } from "../../../core/section/stretches.js";
import { buildSection, positioned, type SectionModel } from "../../../core/section/section-model.js";
import { toCoreUnits } from "../../../core/units/convert.js";
import { inJobUnits } from "../../../core/units/format.js";
import { checkJob } from "../../../core/check-job.js";

type PreparedJob = { ok: true; job: JobDocument; core: JobDocument } | { ok: false; issues: JobIssue[] };

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
  for (const stretch of stretches) {
    const where = several ? ` between ${text(stretch.x0, "span")} and ${text(stretch.x1, "span")} along the member` : "";
    if (stretch.parts.length === 0) {
      add("parts", `no part runs${where}: every point of the member needs a section`);
      continue;
    }
    const here = buildSection(all.filter((p) => stretch.parts.includes(p.id)), job.materials);
    for (const o of findOverlaps(here)) {
      const i = job.parts.findIndex((p) => p.id === o.b);
      const j = job.parts.findIndex((p) => p.id === o.a);
      add(`parts[${i}]`, `part "${o.b}" overlaps part "${o.a}" (parts[${j}]) over an area of ${text(o.area, "area")}${where}; parts may touch but not overlap`);
    }
    if (issues.length > 0) return { issues };
    const groups = connectedGroups(here, findContacts(here));
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
  const section = buildSection(all, job.materials);
  const contacts = findContacts(section);
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
  return { issues, whole: { section, contacts } };
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
