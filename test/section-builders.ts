import type { Material } from "../core/schema/job.js";
import type { PositionedPart } from "../core/section/rectangles.js";
import { buildSection } from "../core/section/section-model.js";
import { findContacts } from "../core/section/contacts.js";
import { findJoints } from "../core/section/joints.js";

export const material = (id: string, E = 1, density = 0): Material => ({ id, name: id, family: "other", E, density, strength: {}, source: "" });

/** A rectangle part: b wide, h deep, bottom-left corner at (x, y). */
export const rect = (id: string, b: number, h: number, x: number, y: number, mat = "M"): PositionedPart => ({
  id,
  name: id,
  material: mat,
  shape: { type: "rectangle", b, h },
  x,
  y,
});

export function sectionOf(parts: PositionedPart[], materials: Material[] = [material("M")]) {
  const section = buildSection(parts, materials);
  const contacts = findContacts(section);
  return { section, contacts, joints: findJoints(section, contacts) };
}
