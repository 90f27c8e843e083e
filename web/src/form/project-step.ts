import { unitLabel } from "../../../core/units/quantity.js";
import { el } from "../dom.js";
import type { FormContext } from "./controls.js";
import { field, selectControl, textControl } from "./controls.js";
import { fieldGrid, step } from "./step.js";

export function projectStep(ctx: FormContext, number: number): HTMLElement {
  const text = (path: string, label: string, maxLength: number, wide = false) => field(ctx, path, label, textControl(ctx, path, label, { maxLength }), { wide });
  const units = ctx.state.units;
  const unitList = (["length", "span", "force", "lineLoad", "stress"] as const).map((q) => unitLabel(q, units)).join(", ");
  const system = units === "us" ? "US customary" : "SI";
  const unitsBox = el("div", { className: "field wide units-shown", attrs: { "data-path": "units" } }, [
    el("span", { className: "label", text: "Units of this job" }),
    el("output", { className: "units-value", text: `${system} (${unitList})`, attrs: { "aria-label": `Units of this job: ${system}` } }),
    el("span", { className: "hint", text: "Every number below is in these units; the SI / US switch above converts the whole job." }),
  ]);
  ctx.registry.register({ path: "units", label: "Units", marker: unitsBox, host: unitsBox });
  const basis = selectControl(ctx, "basis", "Design basis", [
    { value: "allowable", label: "allowable (ASD)" },
    { value: "factored", label: "factored (LRFD, limit states)" },
  ]);
  return step(number, "Project and member", null, [
    fieldGrid([
      text("project.name", "Project name", 120, true),
      text("project.number", "Project number", 40),
      text("project.client", "Client", 120, true),
      text("project.engineer", "Engineer", 80),
    ]),
    fieldGrid([
      text("member.mark", "Member mark", 40),
      text("member.revision", "Revision", 12),
      field(ctx, "member.date", "Date", textControl(ctx, "member.date", "Date", { type: "date", removeWhenEmpty: true })),
      text("member.description", "Description", 200, true),
    ]),
    fieldGrid([field(ctx, "basis", "Design basis", basis, { wide: true, hint: "Allowable: service loads against allowable values. Factored: factored loads against design values. Loads, resistances and strengths are all compared on this basis." }), unitsBox]),
  ]);
}
