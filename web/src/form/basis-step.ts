import { unitLabel } from "../../../core/units/quantity.js";
import { el } from "../dom.js";
import { field, selectControl, type FormContext } from "./controls.js";
import { fieldGrid, step } from "./step.js";

export function basisStep(ctx: FormContext, number: number): HTMLElement {
  const units = ctx.state.units;
  const unitList = (["length", "span", "force", "lineLoad", "stress"] as const).map((q) => unitLabel(q, units)).join(", ");
  const system = units === "us" ? "US customary" : "SI";
  const basis = selectControl(ctx, "basis", "Design basis", [
    { value: "allowable", label: "Allowable stress" },
    { value: "factored", label: "Factored (limit states)" },
  ]);
  const unitsBox = el("div", { className: "field wide units-shown", attrs: { "data-path": "units" } }, [
    el("span", { className: "label", text: "Units of this job" }),
    el("output", { className: "units-value", text: `${system} (${unitList})`, attrs: { "aria-label": `Units of this job: ${system}` } }),
    el("span", { className: "hint", text: "Every number below is in these units. To work in the other system, open or start from a job written in it." }),
  ]);
  ctx.registry.register({ path: "units", label: "Units", marker: unitsBox, host: unitsBox });
  return step(number, "Basis and units", null, [fieldGrid([field(ctx, "basis", "Design basis", basis, { wide: true, hint: "Allowable: service loads against allowable values. Factored: factored loads against design values." }), unitsBox])]);
}
