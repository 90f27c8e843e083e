import type { LoadCategory } from "../../../core/schema/job.js";
import { unitLabel } from "../../../core/units/quantity.js";
import { el } from "../dom.js";
import { addButton, checkboxControl, field, numberControl, recordTable, rowButton, selectControl, textControl, type FormContext } from "./controls.js";
import { fieldGrid, step } from "./step.js";

type Item = Record<string, unknown>;

// Listed here rather than imported so the page bundle does not carry zod; the check below keeps the lists equal.
const loadCategories = ["dead", "live", "roof-live", "snow", "wind"] as const satisfies readonly LoadCategory[];
const everyCategoryListed: [Exclude<LoadCategory, (typeof loadCategories)[number]>] extends [never] ? true : never = true;
void everyCategoryListed;
const categoryChoices = loadCategories.map((c) => ({ value: c, label: c.replace("-", " ") }));
const kindChoices = [
  { value: "uniform", label: "uniform" },
  { value: "point", label: "point" },
];

/** The same load as the other kind: category and label kept; the magnitude is a different quantity, so it is asked for again. */
function asKind(load: Item, kind: string): Item {
  const kept = { category: load.category ?? "dead", label: load.label ?? "" };
  if (kind === "point") return { type: "point", ...kept, ...(load.from !== undefined ? { at: load.from } : {}) };
  return { type: "uniform", ...kept, ...(load.at !== undefined ? { from: load.at } : {}) };
}

export function loadsStep(ctx: FormContext, number: number): HTMLElement {
  const { state } = ctx;
  const u = state.units;
  const span = unitLabel("span", u);
  const loads = state.list("beam.loads") as Item[];
  const at = (i: number, key: string) => `beam.loads[${i}].${key}`;
  const name = (i: number) => `Load ${i + 1}`;
  const isPoint = (i: number) => loads[i]?.type === "point";

  const magnitude = (i: number) => {
    const key = isPoint(i) ? "P" : "w";
    const unit = unitLabel(isPoint(i) ? "force" : "lineLoad", u);
    const input = numberControl(ctx, at(i, key), key);
    return { path: at(i, key), name: `${key} (${unit})`, control: input, content: el("span", { className: "with-unit" }, [input, el("span", { className: "unit", text: unit, attrs: { "aria-hidden": "true" } })]) };
  };

  const { table, issues } = recordTable(ctx, {
    caption: "Loads",
    listPath: "beam.loads",
    itemName: name,
    count: loads.length,
    columns: [
      {
        header: "Kind",
        className: "col-kind",
        cell: (i) => ({
          path: at(i, "type"),
          name: "kind",
          control: selectControl(ctx, at(i, "type"), "kind", kindChoices, {
            onChosen: (kind) => {
              state.replaceItem(`beam.loads[${i}]`, asKind(loads[i] ?? {}, kind));
              ctx.rerender(at(i, "type"));
            },
          }),
        }),
      },
      { header: "Category", className: "col-choice", cell: (i) => ({ path: at(i, "category"), name: "category", control: selectControl(ctx, at(i, "category"), "category", categoryChoices, { whenAbsent: "dead" }) }) },
      { header: "Label", className: "col-name", cell: (i) => ({ path: at(i, "label"), name: "label", control: textControl(ctx, at(i, "label"), "label", { maxLength: 60 }) }) },
      { header: "w or P", className: "col-magnitude", cell: magnitude },
      {
        header: "From / at",
        unit: span,
        className: "col-num",
        cell: (i) =>
          isPoint(i)
            ? { path: at(i, "at"), name: "at", control: numberControl(ctx, at(i, "at"), "at") }
            : { path: at(i, "from"), name: "from", control: numberControl(ctx, at(i, "from"), "from", { placeholder: "start" }) },
      },
      {
        header: "To",
        unit: span,
        className: "col-num",
        cell: (i) => (isPoint(i) ? null : { path: at(i, "to"), name: "to", control: numberControl(ctx, at(i, "to"), "to", { placeholder: "end" }) }),
      },
    ],
    actions: (i) => [
      rowButton("×", `Remove ${name(i)}`, () => {
        state.remove("beam.loads", i);
        ctx.rerender(loads.length > 1 ? at(Math.max(0, i - 1), "type") : undefined);
      }, "remove"),
    ],
  });

  const spanInput = numberControl(ctx, "beam.spans[0]", "Span");
  const spanField = field(ctx, "beam.spans[0]", "Span", spanInput, { unit: span, hint: "One simply supported span" });
  ctx.registry.register({ path: "beam.spans", label: "Span", control: spanInput, marker: spanField, host: spanField });

  const addLoad = (load: Item, focusKey: string) => {
    const i = state.insert("beam.loads", load);
    ctx.rerender(at(i, focusKey));
  };
  const box = step(number, "Span and loads", "Loads act downward; a uniform load without from/to covers the whole member.", [
    fieldGrid([
      spanField,
      field(ctx, "beam.deflectionLimits.total", "Total-load deflection: span ÷", numberControl(ctx, "beam.deflectionLimits.total", "total", { placeholder: "240" })),
      field(ctx, "beam.deflectionLimits.live", "Live-load deflection: span ÷", numberControl(ctx, "beam.deflectionLimits.live", "live", { placeholder: "360" })),
      field(ctx, "beam.selfWeight", "Add the parts' self-weight as dead load", checkboxControl(ctx, "beam.selfWeight", "self-weight", true), { wide: true }),
    ]),
    el("h3", { text: "Loads" }),
    table,
    issues,
    el("div", { className: "button-row" }, [
      addButton("Add uniform load", () => addLoad({ type: "uniform", category: "dead", label: "" }, "w")),
      addButton("Add point load", () => addLoad({ type: "point", category: "live", label: "" }, "P")),
    ]),
  ]);
  ctx.registry.register({ path: "beam.loads", label: "Loads", marker: box, host: issues });
  ctx.registry.register({ path: "beam", label: "Span and loads", marker: box, host: issues });
  return box;
}
