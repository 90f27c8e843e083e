import { spacingDefaults } from "../../../core/spacing/spacing-defaults.js";
import { unitLabel } from "../../../core/units/quantity.js";
import { formatNumber } from "../../../core/units/format.js";
import { el } from "../dom.js";
import { checkboxControl, field, numberControl, type FormContext } from "./controls.js";
import { fieldGrid, step } from "./step.js";

export function spacingStep(ctx: FormContext, number: number): HTMLElement {
  const { state } = ctx;
  const length = unitLabel("length", state.units);
  const defaults = spacingDefaults(state.units);
  const num = (key: string, label: string, placeholder: string, hint?: string) =>
    field(ctx, `spacing.${key}`, label, numberControl(ctx, `spacing.${key}`, label, { placeholder }), { unit: length, ...(hint ? { hint } : {}) });
  const preferred = state.read("spacing.preferred");
  const issues = el("div", { className: "row-issues" });
  const box = step(number, "Spacing rules", "How the schedule is laid out for the builder. Empty fields use the defaults shown.", [
    fieldGrid([
      num("module", "Spacing module", formatNumber(defaults.module), "Spacings are whole multiples of this"),
      num("minZoneLength", "Shortest zone", formatNumber(defaults.minZoneLength)),
      field(ctx, "spacing.maxZonesPerSpan", "Most zones per span", numberControl(ctx, "spacing.maxZonesPerSpan", "zones", { integer: true, placeholder: "5" }), { unit: "zones" }),
      num("minimum", "Minimum spacing override", "connector's", "Used when larger than the connector's own"),
      num("maximum", "Maximum spacing override", "connector's", "Used when smaller than the connector's own"),
      field(ctx, "spacing.symmetric", "Mirror the zones about midspan when the demand is symmetric", checkboxControl(ctx, "spacing.symmetric", "symmetric", true), { wide: true }),
    ]),
    Array.isArray(preferred) ? el("p", { className: "hint", text: `Preferred spacings from the job file: ${preferred.map((v) => `${String(v)} ${length}`).join(", ")}.` }) : null,
    issues,
  ]);
  ctx.registry.register({ path: "spacing", label: "Spacing rules", marker: box, host: issues });
  return box;
}
