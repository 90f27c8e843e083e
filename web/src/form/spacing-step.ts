import { spacingDefaults } from "../../../core/spacing/spacing-defaults.js";
import { toCore, unitLabel } from "../../../core/units/quantity.js";
import { formatNumber } from "../../../core/units/format.js";
import { el } from "../dom.js";
import { checkboxControl, field, numberControl, type FormContext } from "./controls.js";
import { numberFromText } from "./field-registry.js";
import { fieldGrid, step } from "./step.js";

export function spacingStep(ctx: FormContext, number: number): HTMLElement {
  const { state } = ctx;
  const length = unitLabel("length", state.units);
  // A converted job keeps the practice of the system it came from (spacing.practice); its defaults are shown in the job's units.
  const practice = state.read("spacing.practice") === "si" || state.read("spacing.practice") === "us" ? (state.read("spacing.practice") as "si" | "us") : state.units;
  const inJob = (v: number) => Number((toCore(v, "length", practice) / toCore(1, "length", state.units)).toPrecision(4));
  const own = spacingDefaults(practice);
  const defaults = { module: inJob(own.module), minZoneLength: inJob(own.minZoneLength) };
  const num = (key: string, label: string, placeholder: string, hint?: string) =>
    field(ctx, `spacing.${key}`, label, numberControl(ctx, `spacing.${key}`, label, { placeholder }), { unit: length, ...(hint ? { hint } : {}) });
  const issues = el("div", { className: "row-issues" });
  const box = step(number, "Spacing limits and module", "How the schedule is laid out for the builder. Empty fields use the defaults shown.", [
    fieldGrid([
      num("module", "Spacing module", formatNumber(defaults.module), "Spacings are whole multiples of this"),
      num("minZoneLength", "Shortest zone", formatNumber(defaults.minZoneLength)),
      field(ctx, "spacing.maxZonesPerSpan", "Most zones per span", numberControl(ctx, "spacing.maxZonesPerSpan", "zones", { integer: true, placeholder: "5" }), { unit: "zones" }),
      num("minimum", "Minimum spacing override", "connector's", "Used when larger than the connector's own"),
      num("maximum", "Maximum spacing override", "connector's", "Used when smaller than the connector's own"),
      field(ctx, "spacing.symmetric", "Mirror the zones about midspan when the demand is symmetric", checkboxControl(ctx, "spacing.symmetric", "symmetric", true), { wide: true }),
    ]),
    preferredField(ctx, length),
    issues,
  ]);
  ctx.registry.register({ path: "spacing", label: "Spacing rules", marker: box, host: issues });
  return box;
}

/** Preferred spacings: when given, only these are used (instead of multiples of the module). */
function preferredField(ctx: FormContext, length: string): HTMLElement {
  const { state } = ctx;
  const input = el("input", { attrs: { type: "text", id: "preferred-spacings", "data-path": "spacing.preferred", autocomplete: "off", spellcheck: "false", placeholder: "none: multiples of the module", "aria-label": `Preferred spacings (${length})` } });
  const value = state.read("spacing.preferred");
  input.value = Array.isArray(value) ? value.map(String).join(", ") : "";
  input.addEventListener("input", () => {
    const tokens = input.value.split(/[\s,;]+/).filter(Boolean);
    state.set("spacing.preferred", tokens.length ? tokens.map((t) => numberFromText(t) ?? t) : undefined);
  });
  const issues = el("div", { className: "row-issues" });
  const box = el("div", { className: "field wide preferred" }, [
    el("label", { text: "Preferred spacings", attrs: { for: "preferred-spacings" } }),
    el("span", { className: "with-unit" }, [input, el("span", { className: "unit", text: length, attrs: { "aria-hidden": "true" } })]),
    el("span", { className: "hint", text: `When given, only these spacings are used, e.g. ${state.units === "us" ? "3, 4, 6, 8, 12" : "50, 75, 100, 150, 200"}.` }),
    issues,
  ]);
  ctx.registry.register({ path: "spacing.preferred", label: "Preferred spacings", control: input, marker: box, host: issues });
  return box;
}
