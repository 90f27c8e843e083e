import { contextFor } from "../fastening/connector-context.js";
import { fastenedJoints } from "../section/fastened-joints.js";
import type { JobDocument } from "../schema/job.js";
import type { JobIssue } from "../schema/job-issues.js";
import type { Combination } from "../schema/result.js";
import { findContacts, type ContactLine } from "../section/contacts.js";
import { buildSection, positioned, type SectionModel } from "../section/section-model.js";
import { allowedSpacings } from "../spacing/allowed-spacings.js";
import { spacingPractice } from "../spacing/spacing-defaults.js";
import { toCore } from "../units/quantity.js";
import { governingLimits, type ConnectorContext } from "./connector-kind.js";
import { inJobUnits } from "../units/format.js";
import { kindOf } from "./registry.js";

/** Most spacings a module may give between the smallest and the largest: beyond it a builder gains nothing and the zoning only slows. */
const MAX_SPACINGS = 5000;

/** Placement does not depend on the load combination; kinds are given a neutral one. */
const PLACEMENT: Combination = { id: "placement", name: "placement check", factors: {}, duration: "unspecified", categories: [] };

/**
 * Problems of the connectors where the job places them, found from the section in core units: a
 * penetration below the minimum, a bolt larger than the part, a weld larger than the thinner part
 * allows, a grade or size the standard does not know, a material property the method needs, and
 * spacing limits that leave no spacing to choose. Each issue names the field it belongs to; numbers
 * are written in the job's units.
 */
export function checkConnectorPlacement(job: JobDocument, whole?: { section: SectionModel; contacts: ContactLine[] }): JobIssue[] {
  // `whole`: the section of every part and its contacts, when the caller has them already (the geometry check).
  const section = whole?.section ?? buildSection(positioned(job.parts), job.materials);
  const contacts = whole?.contacts ?? findContacts(section);
  const joints = fastenedJoints(job, section, contacts);
  const issues: JobIssue[] = [];
  const seen = new Set<string>();
  const add = (path: string, message: string) => {
    const key = `${path}\u0000${message}`;
    if (!seen.has(key)) {
      seen.add(key);
      issues.push({ path, message });
    }
  };
  const connectorIndex = new Map(job.connectors.map((c, i) => [c.id, i]));
  const materialIndex = new Map(job.materials.map((m, i) => [m.id, i]));

  joints.forEach(({ joint, connector, fastening: { rows, headSide }, path: fastening }) => {
    const kind = kindOf(connector);
    const i = connectorIndex.get(connector.id)!;
    const contexts: ConnectorContext[] = joint.lines.map((line) => contextFor(PLACEMENT, job, joint, line, headSide, rows, section));
    for (const context of contexts) {
      for (const p of kind.problems?.(connector, context) ?? []) {
        const where = p.on !== "material" && p.wholeJoint ? `(joint ${joint.id})` : `(joint ${joint.id}, between "${context.members[0].part}" and "${context.members[1].part}")`;
        if (p.on === "connector") add(`connectors[${i}].${p.field}`, `${p.message} ${where}`);
        else if (p.on === "fastening") add(`${fastening}.${p.field}`, `${p.message} ${where}`);
        else add(`materials[${materialIndex.get(materialOf(context, p.part) ?? context.members[p.member].material.id)!}].${p.field}`, `${p.message}, for connector "${connector.id}"`);
      }
    }
    if (issues.length > 0 || kind.mechanism !== "discrete") return;
    const limits = governingLimits(contexts.map((c) => kind.detailing(connector, c)));
    const defaults = spacingPractice(job);
    const rules = job.spacing;
    const min = Math.max(limits.minSpacing, rules.minimum ?? 0);
    const max = Math.min(limits.maxSpacing ?? defaults.maxSpacing, rules.maximum ?? Infinity);
    const len = (mm: number) => inJobUnits(mm, "length", job.units);
    if (min > max * (1 + 1e-9)) {
      add(rules.maximum !== undefined ? "spacing.maximum" : `connectors[${i}]`, `connector "${connector.id}" needs a spacing of at least ${len(min)} (${limits.sources[0] ?? "its minimum"}) but at most ${len(max)} is allowed at joint ${joint.id}`);
    } else if (!rules.preferred && (max - min) / (rules.module ?? defaults.module) > MAX_SPACINGS) {
      add(
        rules.module !== undefined ? "spacing.module" : `connectors[${i}]`,
        `a module of ${len(rules.module ?? defaults.module)} gives more than ${MAX_SPACINGS} spacings between ${len(min)} and ${len(max)} for connector "${connector.id}"; choose a coarser module or a smaller maximum spacing`,
      );
    } else if (
      allowedSpacings({ module: rules.preferred ? null : rules.module ?? defaults.module, preferred: rules.preferred ?? null, min, max }).length === 0
    ) {
      add(rules.preferred ? "spacing.preferred" : "spacing.module", `no spacing on this module or list lies between ${len(min)} and ${len(max)} for connector "${connector.id}" at joint ${joint.id}`);
    }
  });
  return issues;
}

/** The material id of a part named by a placement problem: one of the context's members or a member of its double-shear joint. */
function materialOf(context: ConnectorContext, part: string | undefined): string | undefined {
  if (part === undefined) return undefined;
  const d = context.double;
  const all = [...context.members, ...(d && "central" in d ? [d.central, ...d.outer] : [])];
  return all.find((m) => m.part === part)?.material.id;
}
