import type { Connector } from "../connector/registry.js";
import type { Fastening, JobDocument } from "../schema/job.js";
import type { ContactLine } from "./contacts.js";
import { findJoints, jointForHeldGroup, type JointPlane } from "./joints.js";
import type { SectionModel } from "./section-model.js";

export interface FastenedJoint {
  joint: JointPlane;
  connector: Connector;
  fastening: Fastening;
  /** Where the fastening comes from in the job, for error paths: "fastening.default" or "fastening.joints[i]". */
  path: string;
}

/**
 * The joints of the section with their fastening: the held groups the job names, then every joint
 * found from the contacts whose lines none of those claims, fastened by the default.
 */
export function fastenedJoints(job: JobDocument, section: SectionModel, contacts: ContactLine[]): FastenedJoint[] {
  const connectors = new Map(job.connectors.map((c) => [c.id, c]));
  // Where parts start and stop along the member, a held group is a joint only in the stretches where it
  // touches the rest (a cover plate over the middle of a beam): elsewhere it crosses no line and holds nothing.
  const custom = job.fastening.joints
    .map((f, i) => ({ joint: jointForHeldGroup(section, contacts, f.held), connector: connectors.get(f.connector)!, fastening: f, path: `fastening.joints[${i}]` }))
    .filter((c) => c.joint.lines.length > 0);
  const claimed = new Set(custom.flatMap((c) => c.joint.lines.map(lineKey)));
  const found = findJoints(section, contacts)
    .filter((j) => !j.lines.some((l) => claimed.has(lineKey(l))))
    .map((joint) => ({ joint, connector: connectors.get(job.fastening.default.connector)!, fastening: job.fastening.default, path: "fastening.default" }));
  return [...custom, ...found];
}

const lineKey = (l: { a: string; b: string; level: number }) => `${l.a}|${l.b}|${l.level}`;
