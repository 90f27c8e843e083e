import { kindOf, type Connector } from "../connector/registry.js";
import type { Fastening, JobDocument } from "../schema/job.js";
import type { ContactLine } from "./contacts.js";
import { jointForHeldGroup, searchJoints, type FlowSharing, type JointPlane, type UncoveredContact } from "./joints.js";
import type { SectionModel } from "./section-model.js";

export interface FastenedJoint {
  joint: JointPlane;
  connector: Connector;
  fastening: Fastening;
  /** Where the fastening comes from in the job, for error paths: "fastening.default" or "fastening.joints[i]". */
  path: string;
}

/** A glue line shares a cut's flow by width (one stress τ = VQ/(I·t)); connectors and welds share it equally per line. */
const sharingOf = (connector: Connector): FlowSharing => (kindOf(connector).mechanism === "bond-line" ? "by-width" : "per-line");

/**
 * The joints of the section with their fastening: the held groups the job names, then the joints
 * found from the contacts for every line none of those claims, fastened by the default; and the
 * contact lines no joint fastens as it must (see `searchJoints`).
 */
export function fastenedJointsOf(job: JobDocument, section: SectionModel, contacts: ContactLine[]): { joints: FastenedJoint[]; uncovered: UncoveredContact[] } {
  const connectors = new Map(job.connectors.map((c) => [c.id, c]));
  // Where parts start and stop along the member, a held group is a joint only in the stretches where it
  // touches the rest (a cover plate over the middle of a beam): elsewhere it crosses no line and holds nothing.
  const custom = job.fastening.joints
    .map((f, i) => ({ joint: jointForHeldGroup(section, contacts, f.held), connector: connectors.get(f.connector)!, fastening: f, path: `fastening.joints[${i}]` }))
    .filter((c) => c.joint.lines.length > 0);
  const fallback = connectors.get(job.fastening.default.connector)!;
  const search = searchJoints(section, contacts, { sharing: sharingOf(fallback), fixed: custom.map((c) => ({ joint: c.joint, sharing: sharingOf(c.connector) })) });
  const found = search.joints.map((joint) => ({ joint, connector: fallback, fastening: job.fastening.default, path: "fastening.default" }));
  return { joints: [...custom, ...found], uncovered: search.uncovered };
}

export function fastenedJoints(job: JobDocument, section: SectionModel, contacts: ContactLine[]): FastenedJoint[] {
  return fastenedJointsOf(job, section, contacts).joints;
}
