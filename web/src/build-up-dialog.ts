import { buildUpFields, buildUpJob, buildUps, defaultSizes, type BuildUp, type BuildUpSizes } from "../../core/build-up/build-ups.js";
import { unitLabel, type UnitSystem } from "../../core/units/quantity.js";
import { el, nextId } from "./dom.js";
import type { JobDraft } from "./job-state.js";

/**
 * "New member from a typical build-up": one choice and the few sizes that define it, then the usual
 * form filled in, every value editable there.
 */
export function openBuildUpDialog(units: UnitSystem, fill: (job: JobDraft, buildUp: BuildUp) => void): void {
  const choice = el("select", { attrs: { id: nextId("build-up") } }, buildUps.map((b) => el("option", { text: b.name, attrs: { value: b.id } })));
  const summary = el("p", { className: "build-up-summary" });
  const fieldset = el("div", { className: "build-up-fields" });
  let inputs: { key: string; input: HTMLInputElement; numeric: boolean }[] = [];

  const current = () => buildUps.find((b) => b.id === choice.value) ?? buildUps[0]!;
  const showFields = () => {
    const buildUp = current();
    summary.textContent = buildUp.summary;
    const defaults = defaultSizes(buildUp, units);
    inputs = [];
    fieldset.replaceChildren(
      ...buildUpFields(buildUp, units).map((field) => {
        const id = nextId("build-up-field");
        const numeric = field.kind !== "lumber";
        const unit = field.kind === "lumber" || field.kind === "count" ? "" : ` (${unitLabel(field.kind, units)})`;
        const input = el("input", {
          attrs: { id, value: String(defaults[field.key]), inputmode: numeric ? "decimal" : "text", ...(numeric ? {} : { placeholder: "2x12", pattern: "\\d{1,2}x\\d{1,2}" }), required: true },
        });
        inputs.push({ key: field.key, input, numeric });
        return el("div", { className: "build-up-field" }, [el("label", { text: `${field.label}${unit}`, attrs: { for: id } }), input]);
      }),
    );
  };
  choice.addEventListener("change", showFields);
  showFields();

  const problem = el("p", { className: "build-up-problem", attrs: { role: "alert" } });
  const form = el("form", { className: "build-up-form", attrs: { method: "dialog" } }, [
    el("h2", { text: "New member from a typical build-up" }),
    el("p", { className: "build-up-note", text: `Sizes in ${units === "us" ? "US customary" : "SI"} units. The form is filled with these, common grades, a common connector and a dead and a live load; change anything there afterwards.` }),
    el("div", { className: "build-up-field build-up-choice" }, [el("label", { text: "Build-up", attrs: { for: choice.id } }), choice]),
    summary,
    fieldset,
    problem,
    el("div", { className: "button-row" }, [
      el("button", { className: "primary", text: "Fill the form", attrs: { type: "submit" } }),
      el("button", { text: "Cancel", attrs: { type: "button" }, on: { click: () => dialog.close() } }),
    ]),
  ]);
  const dialog = el("dialog", { className: "build-up-dialog", attrs: { "aria-label": "New member from a typical build-up" } }, [form]);
  form.addEventListener("submit", (event) => {
    event.preventDefault();
    const sizes: BuildUpSizes = {};
    for (const { key, input, numeric } of inputs) {
      const text = input.value.trim();
      const value = numeric ? Number(text) : text;
      const label = input.labels?.[0]?.textContent ?? key;
      if (text === "" || (numeric && !(Number.isFinite(value) && (value as number) >= 0)) || (!numeric && !/^\d{1,2}x\d{1,2}$/.test(text))) {
        problem.textContent = `${label}: ${numeric ? "enter a number, 0 or more" : 'enter a nominal size such as "2x12"'}.`;
        input.focus();
        return;
      }
      sizes[key] = value;
    }
    const buildUp = current();
    fill(buildUpJob(buildUp.id, units, sizes) as unknown as JobDraft, buildUp);
    dialog.close();
  });
  dialog.addEventListener("close", () => dialog.remove());
  document.body.append(dialog);
  dialog.showModal();
  choice.focus();
}
