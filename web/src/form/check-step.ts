import { unitLabel } from "../../../core/units/quantity.js";
import { el } from "../dom.js";
import { addButton, numberControl, recordTable, rowButton, type FormContext } from "./controls.js";
import { numberFromText } from "./field-registry.js";
import { ownFasteningIndex } from "./joints-step.js";
import { step } from "./step.js";

type Item = Record<string, unknown>;

/**
 * Design or check: in check mode the schedule that exists (or is proposed) is entered per joint, as
 * zones of one spacing or as the positions of the rows, and stitchplan checks it instead of laying one out.
 */
export function checkStep(ctx: FormContext, number: number): HTMLElement {
  const { state } = ctx;
  const mode = state.read("mode") === "check" ? "check" : "design";
  const radios = (["design", "check"] as const).map((value) => {
    const input = el("input", { attrs: { type: "radio", name: "job-mode", value, "data-path": "mode" } });
    input.checked = mode === value;
    input.addEventListener("change", () => {
      if (!input.checked) return;
      state.set("mode", value);
      ctx.rerender("mode");
    });
    const text = value === "design" ? "Design: stitchplan lays out the zones" : "Check: I give the schedule, stitchplan checks it";
    return el("label", { className: "mode-choice" }, [input, el("span", { text })]);
  });
  const issues = el("div", { className: "row-issues" });
  const modeBox = el("fieldset", { className: "mode-choices" }, [el("legend", { className: "visually-hidden", text: "Task" }), ...radios]);
  ctx.registry.register({ path: "mode", label: "Task", control: radios[0]!.querySelector("input")!, marker: modeBox, host: issues });

  const body: (HTMLElement | null)[] = [modeBox];
  if (mode === "check") {
    body.push(providedBlock(ctx, "fastening.default", "Every joint fastened by the default connector"));
    state.list("fastening.joints").forEach((j, k) => {
      const held = Array.isArray((j as Item).held) ? ((j as Item).held as unknown[]).join("+") : `group ${k + 1}`;
      body.push(providedBlock(ctx, `fastening.joints[${k}]`, `Joint ${held} (its own fastening)`));
    });
    const byDefault = (ctx.result()?.joints ?? []).filter((j) => ownFasteningIndex(ctx, j.held) < 0 && j.mechanism === "discrete");
    if (byDefault.length)
      body.push(
        el("div", { className: "button-row" }, [
          ...byDefault.map((j) =>
            addButton(`Give joint ${j.id} its own schedule`, () => {
              const fallback = (state.read("fastening.default") ?? {}) as Item;
              const k = state.insert("fastening.joints", { held: [...j.held], connector: fallback.connector ?? "", rows: fallback.rows ?? 1, ...(fallback.provided ? { provided: structuredClone(fallback.provided) } : {}) });
              ctx.rerender(`fastening.joints[${k}].provided.type`);
            }),
          ),
        ]),
      );
  }
  body.push(issues);
  return step(number, "Design or check", mode === "check" ? "Enter the schedule to check for each joint, in zones of one spacing or as the positions of the rows." : "Design lays out zones of spacing along each joint; check takes a schedule you give.", body);
}

/** The schedule given for one fastening entry: zones (from, to, spacing) or row positions. */
function providedBlock(ctx: FormContext, fasteningPath: string, title: string): HTMLElement {
  const { state } = ctx;
  const path = `${fasteningPath}.provided`;
  const provided = state.read(path) as Item | undefined;
  const type = provided?.type === "positions" ? "positions" : provided?.type === "zones" ? "zones" : "none";
  const issues = el("div", { className: "row-issues" });
  const typeSelect = el("select", { attrs: { "aria-label": `${title}: schedule given as`, "data-path": `${path}.type` } }, [
    el("option", { text: "— no schedule given —", attrs: { value: "none" } }),
    el("option", { text: "zones of one spacing", attrs: { value: "zones" } }),
    el("option", { text: "positions of the rows", attrs: { value: "positions" } }),
  ]);
  typeSelect.value = type;
  typeSelect.addEventListener("change", () => {
    const next = typeSelect.value;
    if (next === "none") state.replaceItem(path, undefined);
    else state.replaceItem(path, next === "zones" ? { type: "zones", zones: startingZones(ctx, fasteningPath) } : { type: "positions", positions: startingPositions(ctx, fasteningPath) });
    ctx.rerender(`${path}.type`);
  });
  const editor = type === "zones" ? zonesTable(ctx, path, title) : type === "positions" ? positionsField(ctx, path, title) : null;
  const box = el("div", { className: "provided" }, [el("h3", { text: title }), el("label", { className: "provided-type" }, [el("span", { text: "Schedule given as " }), typeSelect]), editor, issues]);
  ctx.registry.register({ path, label: `${title}: schedule`, control: typeSelect, marker: box, host: issues });
  return box;
}

/** The zones the last design gave this joint, as a starting point for the schedule to check; else one zone over the member. */
function startingZones(ctx: FormContext, fasteningPath: string): Item[] {
  const schedule = scheduleFor(ctx, fasteningPath);
  if (schedule) return schedule.zones.map((z) => ({ from: z.from, to: z.to, spacing: z.spacing }));
  const length = (ctx.state.list("beam.spans") as unknown[]).reduce<number>((s, v) => s + (typeof v === "number" ? v : 0), 0);
  return [{ from: 0, to: length || 1, spacing: ctx.state.units === "us" ? 6 : 150 }];
}

function startingPositions(ctx: FormContext, fasteningPath: string): number[] {
  return scheduleFor(ctx, fasteningPath)?.positions.slice() ?? [];
}

function scheduleFor(ctx: FormContext, fasteningPath: string) {
  const result = ctx.result();
  if (!result || result.units !== ctx.state.units) return undefined;
  const held = ctx.state.read(`${fasteningPath}.held`);
  const id = Array.isArray(held) ? held.join("+") : undefined;
  return id ? result.schedules.find((s) => s.joint === id) : result.schedules[0];
}

function zonesTable(ctx: FormContext, path: string, title: string): HTMLElement {
  const { state } = ctx;
  const listPath = `${path}.zones`;
  const count = state.list(listPath).length;
  const span = unitLabel("span", state.units);
  const length = unitLabel("length", state.units);
  const at = (i: number, key: string) => `${listPath}[${i}].${key}`;
  const name = (i: number) => `${title}, zone ${i + 1}`;
  const { table, issues } = recordTable(ctx, {
    caption: `${title}: zones`,
    listPath,
    itemName: name,
    count,
    columns: [
      { header: "From", unit: span, className: "col-num", cell: (i) => ({ path: at(i, "from"), name: "from", control: numberControl(ctx, at(i, "from"), "from") }) },
      { header: "To", unit: span, className: "col-num", cell: (i) => ({ path: at(i, "to"), name: "to", control: numberControl(ctx, at(i, "to"), "to") }) },
      { header: "Spacing", unit: length, className: "col-num", cell: (i) => ({ path: at(i, "spacing"), name: "spacing", control: numberControl(ctx, at(i, "spacing"), "spacing") }) },
    ],
    actions: (i) => [rowButton("×", `Remove ${name(i)}`, () => (state.remove(listPath, i), ctx.rerender()), "remove")],
  });
  return el("div", { className: "zones-editor" }, [
    table,
    issues,
    addButton("Add zone", () => {
      const last = state.list(listPath)[count - 1] as Item | undefined;
      const i = state.insert(listPath, { from: last?.to ?? 0, to: last?.to ?? 0, spacing: last?.spacing ?? "" });
      ctx.rerender(at(i, "to"));
    }),
  ]);
}

/** Positions as a list a person types: numbers separated by spaces, commas or new lines. Text that is not a number is kept and reported at the field. */
function positionsField(ctx: FormContext, path: string, title: string): HTMLElement {
  const { state } = ctx;
  const listPath = `${path}.positions`;
  const span = unitLabel("span", state.units);
  const area = el("textarea", { className: "positions", attrs: { rows: 3, "aria-label": `${title}: positions of the rows (${span})`, "data-path": listPath, spellcheck: "false" } });
  area.value = state.list(listPath).map(String).join(" ");
  area.addEventListener("input", () => {
    const tokens = area.value.split(/[\s,;]+/).filter(Boolean);
    state.set(listPath, tokens.map((t) => numberFromText(t) ?? t));
  });
  const issues = el("div", { className: "row-issues" });
  const box = el("div", { className: "field wide" }, [el("label", { text: `Positions along the member from the left end (${span})`, attrs: { for: "" } }), area, issues]);
  const id = `positions-${path.replace(/[^a-z0-9]/gi, "-")}`;
  area.id = id;
  box.querySelector("label")!.setAttribute("for", id);
  ctx.registry.register({ path: listPath, label: `${title}: positions`, control: area, marker: box, host: issues });
  return box;
}
