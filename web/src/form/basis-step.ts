import { unitLabel } from "../../../core/units/quantity.js";
import { el } from "../dom.js";
import { field, selectControl, type FormContext } from "./controls.js";
import { fieldGrid, step } from "./step.js";

const setNames: Record<string, string> = {
  unfactored: "As entered, unfactored",
  "asce7-22-strength": "ASCE 7-22, strength",
  "asce7-22-allowable": "ASCE 7-22, allowable stress",
  "en1990-6.10": "EN 1990, expression 6.10",
  custom: "Own combinations (job file)",
};

const modeNames: Record<string, string> = {
  design: "Design the schedule",
  check: "Check a given schedule",
};

export function basisStep(ctx: FormContext, number: number): HTMLElement {
  const { state, schema } = ctx;
  const units = state.units;
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

  const sets = schema.choices("combinations.set");
  const modes = schema.choices("mode");
  const custom = state.list("combinations.custom");
  const optional = [
    sets && sets.length > 1
      ? field(ctx, "combinations.set", "Load combinations", selectControl(ctx, "combinations.set", "load combinations", sets.map((s) => ({ value: s, label: setNames[s] ?? s })), { whenAbsent: "unfactored" }), {
          wide: true,
          ...(custom.length ? { hint: `${custom.length} own combination(s) in the job file.` } : {}),
        })
      : null,
    modes && modes.length > 1
      ? field(ctx, "mode", "Task", selectControl(ctx, "mode", "task", modes.map((m) => ({ value: m, label: modeNames[m] ?? m })), { whenAbsent: "design" }), { hint: "A schedule to check is given in the job file." })
      : null,
  ].filter((f): f is HTMLElement => f !== null);
  ctx.registry.register({ path: "combinations", label: "Load combinations", marker: unitsBox, host: unitsBox });

  return step(number, "Basis and units", null, [
    fieldGrid([
      field(ctx, "basis", "Design basis", basis, { hint: "Allowable: service loads against allowable values. Factored: factored loads against design values." }),
      unitsBox,
      ...optional,
    ]),
  ]);
}
