import { beamIssues } from "./beam/beam-issues.js";
import { checkConnectorPlacement } from "./connector/check-placement.js";
import { kindOf } from "./connector/registry.js";
import { JobDocument } from "./schema/job.js";
import { issuesFromZod, type JobIssue } from "./schema/job-issues.js";
import { connectedGroups, findContacts, findOverlaps } from "./section/contacts.js";
import { fastenedJoints, type FastenedJoint } from "./section/fastened-joints.js";
import { resolvePlacement } from "./section/place-parts.js";
import { buildSection, positioned } from "./section/section-model.js";
import { allowedSpacings } from "./spacing/allowed-spacings.js";
import { toCoreUnits } from "./units/convert.js";
import { spacingDefaults } from "./spacing/spacing-defaults.js";

export type PreparedJob = { ok: true; job: JobDocument; core: JobDocument } | { ok: false; issues: JobIssue[] };

/** Parses a job document, checks what the schema cannot, and converts it to core units. */
export function prepareJob(input: unknown): PreparedJob {
  const parsed = JobDocument.safeParse(input, { reportInput: true });
  if (!parsed.success) return { ok: false, issues: issuesFromZod(parsed.error) };
  const placement = resolvePlacement(parsed.data.parts);
  if (placement.issues.length > 0) return { ok: false, issues: placement.issues };
  const job = { ...parsed.data, parts: placement.parts };
  const issues = checkJob(job);
  if (issues.length > 0) return { ok: false, issues };
  const core = toCoreUnits(JobDocument, job, job.units);
  const placed = checkConnectorPlacement(core);
  if (placed.length > 0) return { ok: false, issues: placed };
  return { ok: true, job: parsed.data, core };
}

/** Checks of a schema-valid job (placements resolved) that need more than one field: references, geometry, positions, limits. */
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
  if (issues.length > 0) return issues;

  const section = buildSection(positioned(job.parts), job.materials);
  for (const o of findOverlaps(section)) {
    const i = job.parts.findIndex((p) => p.id === o.b);
    const j = job.parts.findIndex((p) => p.id === o.a);
    add(`parts[${i}]`, `part "${o.b}" overlaps part "${o.a}" (parts[${j}]) over an area of ${round(o.area)} ${job.units === "si" ? "mm²" : "in²"}; parts may touch but not overlap`);
  }
  if (issues.length > 0) return issues;
  const contacts = findContacts(section);
  const groups = connectedGroups(section, contacts);
  if (groups.length > 1) {
    const main = groups.reduce((a, b) => (b.length > a.length ? b : a));
    for (const g of groups) {
      if (g === main) continue;
      for (const id of g) {
        const i = job.parts.findIndex((p) => p.id === id);
        add(`parts[${i}]`, `part "${id}" does not touch the rest of the section (${main.join(", ")}); every part must share a face with another over some length`);
      }
    }
    return issues;
  }

  const heldSeen = new Map<string, number>();
  job.fastening.joints.forEach((j, k) => {
    const path = `fastening.joints[${k}]`;
    checkConnector(`${path}.connector`, j.connector);
    const unknown = j.held.filter((id) => !partIds.has(id));
    if (unknown.length > 0) return add(`${path}.held`, `names part(s) not in the section: ${unknown.join(", ")}`);
    const held = new Set(j.held);
    if (held.size === partIds.size) return add(`${path}.held`, "holds every part of the section; a joint must leave some parts on the other side of the cut");
    if (!contacts.some((c) => held.has(c.a) !== held.has(c.b))) return add(`${path}.held`, "these parts touch no other part, so no connectors can hold them");
    const key = [...held].sort().join("+");
    const first = heldSeen.get(key);
    if (first !== undefined) add(`${path}.held`, `the same held group as fastening.joints[${first}]`);
    else heldSeen.set(key, k);
  });

  const L = job.beam.spans.reduce((s, l) => s + l, 0);
  const spanUnit = job.units === "si" ? "m" : "ft";
  if (job.mode === "check") issues.push(...checkProvidedSchedules(job, fastenedJoints(job, section, contacts), L, spanUnit));
  for (const issue of beamIssues(job)) add(issue.path, issue.message);

  const defaults = spacingDefaults(job.units);
  const rules = job.spacing;
  const usedDiscrete = new Set([job.fastening.default, ...job.fastening.joints].map((f) => f.connector));
  job.connectors.forEach((c, i) => {
    if (!usedDiscrete.has(c.id)) return;
    const kind = kindOf(c);
    if (kind.mechanism !== "discrete") return;
    const limits = kind.detailing(c);
    const min = Math.max(limits.minSpacing, rules.minimum ?? 0);
    const max = Math.min(limits.maxSpacing ?? defaults.maxSpacing, rules.maximum ?? Infinity);
    if (min > max) {
      add(rules.maximum !== undefined ? "spacing.maximum" : `connectors[${i}].minSpacing`, `connector "${c.id}" needs a spacing of at least ${round(min)} but at most ${round(max)} is allowed`);
    } else if (allowedSpacings({ module: rules.module ?? defaults.module, preferred: rules.preferred ?? null, min, max }).length === 0) {
      add(rules.preferred ? "spacing.preferred" : "spacing.module", `no spacing on this module or list lies between ${round(min)} and ${round(max)} for connector "${c.id}"`);
    }
  });
  return issues;
}

const round = (x: number) => Number(x.toPrecision(4));

/** Check mode: every connector joint needs the schedule to check, with zones from end to end and rows on the member. */
function checkProvidedSchedules(job: JobDocument, joints: FastenedJoint[], L: number, spanUnit: string): JobIssue[] {
  const issues: JobIssue[] = [];
  const seen = new Set<string>();
  for (const { connector, fastening, path } of joints) {
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
    const tol = 1e-9 * Math.max(L, 1);
    if (provided.type === "zones") {
      provided.zones.forEach((z, i) => {
        const at = `${path}.provided.zones[${i}]`;
        const expectedFrom = i === 0 ? 0 : provided.zones[i - 1]!.to;
        if (Math.abs(z.from - expectedFrom) > tol) issues.push({ path: `${at}.from`, message: `must be ${round(expectedFrom)} ${spanUnit}: zones run from the left end to the right end without gaps or overlaps` });
        if (z.to <= z.from) issues.push({ path: `${at}.to`, message: `must be beyond its start (${round(z.from)} ${spanUnit})` });
      });
      const last = provided.zones[provided.zones.length - 1]!;
      if (Math.abs(last.to - L) > tol) issues.push({ path: `${path}.provided.zones[${provided.zones.length - 1}].to`, message: `must be the member's length, ${round(L)} ${spanUnit}` });
    } else {
      provided.positions.forEach((x, i) => {
        if (x > L + tol) issues.push({ path: `${path}.provided.positions[${i}]`, message: `${x} ${spanUnit} is beyond the end of the member (length ${round(L)} ${spanUnit})` });
        else if (i > 0 && x <= provided.positions[i - 1]!) issues.push({ path: `${path}.provided.positions[${i}]`, message: "positions must increase from the left end" });
      });
    }
  }
  return issues;
}
