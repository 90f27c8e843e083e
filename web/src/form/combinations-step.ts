import { el } from "../dom.js";
import { addButton, field, numberControl, recordTable, rowButton, selectControl, textControl, type FormContext } from "./controls.js";
import { categoryIds } from "./categories-block.js";
import { uniqueId } from "./references.js";
import { fieldGrid, step } from "./step.js";

const setNames: Record<string, string> = {
  unfactored: "loads as entered (unfactored)",
  "asce7-22-strength": "ASCE/SEI 7-22 §2.3.1, strength (factored)",
  "asce7-22-allowable": "ASCE/SEI 7-22 §2.4.1, allowable stress",
  "en1990-6.10": "EN 1990 expression 6.10",
  custom: "own combinations with factor tables",
};

const durations = ["permanent", "long", "medium", "short", "instantaneous"];

/** The design basis and the load combinations: a published set, or the job's own factor tables. */
export function combinationsStep(ctx: FormContext, number: number): HTMLElement {
  const { state, schema } = ctx;
  const sets = schema.choices("combinations.set") ?? Object.keys(setNames);
  const set = String(state.read("combinations.set") ?? "unfactored");
  const setSelect = selectControl(ctx, "combinations.set", "load combinations", sets.map((s) => ({ value: s, label: setNames[s] ?? s })), {
    whenAbsent: "unfactored",
    onChosen: (value) => {
      state.set("combinations.set", value);
      if (value === "custom" && state.list("combinations.custom").length === 0) state.set("combinations.custom", startingCombinations(ctx));
      ctx.rerender("combinations.set");
    },
  });
  const issues = el("div", { className: "row-issues" });
  const box = step(number, "Load combinations", "Every combination carries its load-duration class, and live-load patterns on continuous spans become combinations of their own.", [
    fieldGrid([
      field(ctx, "combinations.set", "Load combinations", setSelect, { wide: true, hint: basisHint(set, String(state.read("basis") ?? "")) }),
    ]),
    set === "custom" ? customTable(ctx) : null,
    set === "en1990-6.10" ? psiFields(ctx) : null,
    issues,
  ]);
  ctx.registry.register({ path: "combinations", label: "Load combinations", marker: box, host: issues });
  return box;
}

function basisHint(set: string, basis: string): string {
  if (set === "asce7-22-strength" && basis !== "factored") return "Strength combinations give factored loads: set the design basis (step 1) to factored.";
  if (set === "asce7-22-allowable" && basis !== "allowable") return "Allowable stress combinations give service loads: set the design basis (step 1) to allowable.";
  if (set === "en1990-6.10" && basis !== "factored") return "EN 1990 6.10 gives factored loads: set the design basis (step 1) to factored.";
  return `On the ${basis || "job's"} basis set in step 1.`;
}

function customTable(ctx: FormContext): HTMLElement {
  const { state } = ctx;
  const count = state.list("combinations.custom").length;
  const at = (i: number, key: string) => `combinations.custom[${i}].${key}`;
  const name = (i: number) => `Combination ${i + 1}`;
  const categories = categoryIds(ctx);
  const { table, issues } = recordTable(ctx, {
    caption: "Own load combinations",
    listPath: "combinations.custom",
    itemName: name,
    count,
    columns: [
      { header: "Id", className: "col-id", cell: (i) => ({ path: at(i, "id"), name: "id", control: textControl(ctx, at(i, "id"), "id", { maxLength: 40 }) }) },
      { header: "Name", className: "col-name", cell: (i) => ({ path: at(i, "name"), name: "name", control: textControl(ctx, at(i, "name"), "name", { maxLength: 80 }) }) },
      {
        header: "Duration",
        className: "col-choice",
        cell: (i) => ({
          path: at(i, "duration"),
          name: "duration",
          control: selectControl(ctx, at(i, "duration"), "duration", [{ value: "", label: "shortest load" }, ...durations.map((d) => ({ value: d, label: d }))], {
            whenAbsent: "",
            onChosen: (v) => state.set(at(i, "duration"), v || undefined),
          }),
        }),
      },
      ...categories.map((c) => ({
        header: `× ${c.replace("-", " ")}`,
        className: "col-factor",
        cell: (i: number) => ({ path: at(i, `factors.${c}`), name: `factor on ${c}`, control: numberControl(ctx, at(i, `factors.${c}`), `factor on ${c}`, { placeholder: "0" }) }),
      })),
    ],
    actions: (i) => [rowButton("×", `Remove ${name(i)}`, () => (state.remove("combinations.custom", i), ctx.rerender()), "remove")],
  });
  const box = el("div", { className: "custom-combinations" }, [
    table,
    issues,
    addButton("Add combination", () => {
      const i = state.insert("combinations.custom", { id: uniqueId(state.list("combinations.custom"), `C${count + 1}`), name: "", factors: {} });
      ctx.rerender(at(i, "id"));
    }),
  ]);
  ctx.registry.register({ path: "combinations.custom", label: "Own combinations", marker: box, host: issues });
  return box;
}

function psiFields(ctx: FormContext): HTMLElement {
  const variable = categoryIds(ctx).filter((c) => c !== "dead");
  return el("div", {}, [
    el("h3", { text: "ψ0 by category (empty: the defaults stated with the results)" }),
    fieldGrid(variable.map((c) => field(ctx, `combinations.psi0.${c}`, `ψ0, ${c.replace("-", " ")}`, numberControl(ctx, `combinations.psi0.${c}`, `psi0 ${c}`, { placeholder: "default" })))),
  ]);
}

/** The combinations of the set the job had (from its last result), as own factor tables to edit; else dead + live. */
function startingCombinations(ctx: FormContext): Record<string, unknown>[] {
  // A live-load pattern is its combination placed span by span: one table for the combination.
  const byBase = new Map<string, NonNullable<ReturnType<FormContext["result"]>>["beam"]["combinations"][number]>();
  for (const c of ctx.result()?.beam.combinations ?? []) if (!byBase.has(c.base ?? c.id)) byBase.set(c.base ?? c.id, c);
  if (byBase.size === 0) return [{ id: "C1", name: "", factors: { dead: 1, live: 1 } }];
  return [...byBase].map(([id, c]) => ({
    id: id.replace(/[^A-Za-z0-9_.-]/g, "-"),
    name: c.name,
    factors: Object.fromEntries(Object.entries(c.factors).filter(([, f]) => f !== 0)),
    ...(durations.includes(c.duration) ? { duration: c.duration } : {}),
  }));
}
