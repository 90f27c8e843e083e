import type { Material, SectionPart } from "../core/schema/job.js";
import { buildSection } from "../core/section/section-model.js";
import { findContacts } from "../core/section/contacts.js";
import { findJoints } from "../core/section/joints.js";

export const material = (id: string, E = 1, density = 0): Material => ({ id, name: id, family: "other", E, density, strength: {}, source: "" });

/** A rectangle part: b wide, h deep, bottom-left corner at (x, y). */
export const rect = (id: string, b: number, h: number, x: number, y: number, mat = "M"): SectionPart => ({
  id,
  name: id,
  material: mat,
  shape: { type: "rectangle", b, h },
  x,
  y,
});

export function sectionOf(parts: SectionPart[], materials: Material[] = [material("M")]) {
  const section = buildSection(parts, materials);
  const contacts = findContacts(section);
  return { section, contacts, joints: findJoints(section, contacts) };
}
