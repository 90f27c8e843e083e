import { unitLabel, type Quantity } from "../../../core/units/quantity.js";
import { el } from "../dom.js";
import { addButton, checkboxControl, field, numberControl, recordTable, rowButton, selectControl, textControl, type FormContext } from "./controls.js";
import { categoriesBlock, categoryChecks, categoryIds } from "./categories-block.js";
import { fold } from "./fold.js";
import { fieldGrid, step } from "./step.js";

type Item = Record<string, unknown>;


/** The load kinds this form can edit: their magnitudes with the quantity of each, and whether they act at a point. */
const loadKinds: Record<string, { label: string; magnitudes: [key: string, label: string, quantity: Quantity][]; atPoint: boolean }> = {
  uniform: { label: "uniform", magnitudes: [["w", "w", "lineLoad"]], atPoint: false },
  linear: { label: "linear", magnitudes: [["wStart", "w start", "lineLoad"], ["wEnd", "w end", "lineLoad"]], atPoint: false },
  point: { label: "point", magnitudes: [["P", "P", "force"]], atPoint: true },
  moment: { label: "moment", magnitudes: [["M", "M", "moment"]], atPoint: true },
};

const endDefault = (k: number) => (k === 0 ? "pinned" : "roller");

/** The same load as another kind: category, label and position kept; the magnitude is a different quantity, so it is asked for again. */
function asKind(load: Item, kind: string): Item {
  const kept: Item = { type: kind, category: load.category ?? "dead", label: load.label ?? "" };
  const start = load.from ?? load.at;
  if (loadKinds[kind]?.atPoint) return { ...kept, ...(start !== undefined ? { at: start } : {}) };
  return { ...kept, ...(start !== undefined ? { from: start } : {}), ...(load.to !== undefined ? { to: load.to } : {}) };
}

export function loadsStep(ctx: FormContext, number: number): HTMLElement {
  const { state, schema } = ctx;
  const u = state.units;
  const span = unitLabel("span", u);
  const loads = state.list("beam.loads") as Item[];
  const at = (i: number, key: string) => `beam.loads[${i}].${key}`;
  const name = (i: number) => `Load ${i + 1}`;
  const kindOf = (i: number) => loadKinds[String(loads[i]?.type ?? "")];
  const offered = (schema.choices("beam.loads[].type") ?? ["uniform", "point"]).filter((k) => k in loadKinds);
  const kindChoices = offered.map((k) => ({ value: k, label: loadKinds[k]!.label }));
  const own = new Set(state.list("beam.categories").map((c) => String((c as Item)?.id ?? "")));
  // The face a load arrives on is offered where the last result found side-by-side plies, or where a load already names one.
  const faces = schema.known && !schema.has("beam.loads[].face") ? false : Boolean(ctx.result()?.multiPly) || loads.some((l) => l?.face !== undefined && l.face !== "top");
  const categoryChoices = () => categoryIds(ctx).map((c) => ({ value: c, label: own.has(c) ? `${c} (own)` : c.replace("-", " ") }));

  const magnitude = (i: number, notes: HTMLElement) => {
    const kind = kindOf(i);
    if (!kind) return { spanning: el("span", { className: "hint", text: `${String(loads[i]?.type ?? "?")} load: kept as in the job file` }), columns: 3 };
    const inputs = kind.magnitudes.map(([key, label, quantity]) => {
      const unit = unitLabel(quantity, u);
      const input = numberControl(ctx, at(i, key), label);
      input.setAttribute("aria-label", `${name(i)} ${label} (${unit})`);
      ctx.registry.register({ path: at(i, key), label: `${name(i)} · ${label}`, control: input, marker: input, host: notes, prefix: label, numeric: true });
      return el("span", { className: "with-unit" }, [kind.magnitudes.length > 1 ? el("span", { className: "unit", text: label.replace("w ", "") }) : null, input, el("span", { className: "unit", text: unit })]);
    });
    const [firstKey, firstLabel, firstQuantity] = kind.magnitudes[0]!;
    return { path: at(i, firstKey), name: `${firstLabel} (${unitLabel(firstQuantity, u)})`, control: inputs[0]!.querySelector("input")!, content: el("div", { className: "stack" }, inputs) };
  };

  const { table, issues } = recordTable(ctx, {
    caption: "Loads",
    listPath: "beam.loads",
    itemName: name,
    count: loads.length,
    columns: [
      {
        header: faces ? "Kind, face" : "Kind",
        className: "col-kind",
        cell: (i, notes) => {
          const control = selectControl(ctx, at(i, "type"), "kind", kindOf(i) ? kindChoices : [{ value: String(loads[i]?.type ?? ""), label: String(loads[i]?.type ?? "?") }, ...kindChoices], {
            onChosen: (kind) => {
              state.replaceItem(`beam.loads[${i}]`, asKind(loads[i] ?? {}, kind));
              ctx.rerender(at(i, "type"));
            },
          });
          const face = faceControl(ctx, i, name(i), notes, faces);
          return { path: at(i, "type"), name: "kind", control, ...(face ? { content: el("div", { className: "stack" }, [control, face]) } : {}) };
        },
      },
      { header: "Category", className: "col-choice", cell: (i) => ({ path: at(i, "category"), name: "category", control: selectControl(ctx, at(i, "category"), "category", categoryChoices, { whenAbsent: "dead" }) }) },
      { header: "Label", className: "col-name", cell: (i) => ({ path: at(i, "label"), name: "label", control: textControl(ctx, at(i, "label"), "label", { maxLength: 60 }) }) },
      { header: "Magnitude", className: "col-magnitude", cell: magnitude },
      {
        header: "From / at",
        unit: span,
        className: "col-num",
        cell: (i) =>
          kindOf(i)?.atPoint
            ? { path: at(i, "at"), name: "at", control: numberControl(ctx, at(i, "at"), "at") }
            : { path: at(i, "from"), name: "from", control: numberControl(ctx, at(i, "from"), "from", { placeholder: "start" }) },
      },
      {
        header: "To",
        unit: span,
        className: "col-num",
        cell: (i) => (kindOf(i)?.atPoint ? null : { path: at(i, "to"), name: "to", control: numberControl(ctx, at(i, "to"), "to", { placeholder: "end" }) }),
      },
    ],
    actions: (i) => [
      rowButton("×", `Remove ${name(i)}`, () => {
        state.remove("beam.loads", i);
        ctx.rerender(loads.length > 1 ? at(Math.max(0, i - 1), "type") : undefined);
      }, "remove"),
    ],
  });

  const addLoad = (kind: string) => {
    const i = state.insert("beam.loads", { type: kind, category: loadKinds[kind]!.atPoint ? "live" : "dead", label: "" });
    ctx.rerender(at(i, loadKinds[kind]!.magnitudes[0]![0]));
  };
  const spans = state.list("beam.spans").length;
  const box = step(number, "Spans, supports and loads", "Loads act downward, each in a load category; a line load without from/to covers the whole member. Positions are measured from the left end.", [
    spansBlock(ctx),
    el("h3", { text: "Loads" }),
    table,
    faces ? el("p", { className: "hint", text: "Side-by-side plies: a load on top is shared by the plies' E·I; a load hung on the left or right face (joists on hangers) is passed across the interfaces to the plies beyond, and their connectors are scheduled for it." }) : null,
    issues,
    el("div", { className: "button-row" }, offered.map((kind) => addButton(`Add ${loadKinds[kind]!.label} load`, () => addLoad(kind)))),
    fieldGrid([field(ctx, "beam.selfWeight", "Add the parts' self-weight as dead load", checkboxControl(ctx, "beam.selfWeight", "self-weight", true), { wide: true })]),
    fold("beam.categories", `Load categories of your own${state.list("beam.categories").length ? ` (${state.list("beam.categories").length})` : ""}`, [categoriesBlock(ctx)]),
    fold("beam.serviceability", "Deflection limits and live-load patterns", [
      fieldGrid([
        field(ctx, "beam.deflectionLimits.total", "Total-load deflection: span ÷", numberControl(ctx, "beam.deflectionLimits.total", "total", { placeholder: "240" })),
        field(ctx, "beam.deflectionLimits.live", "Live-load deflection: span ÷", numberControl(ctx, "beam.deflectionLimits.live", "live", { placeholder: "360" })),
        categoryChecks(ctx, "beam.deflectionLimits.liveCategories", "Categories the live-load limit applies to", ["live"]),
        ...(spans > 1 ? [categoryChecks(ctx, "beam.patternedCategories", "Categories placed span by span (patterns)", ["live"])] : []),
      ]),
    ]),
  ]);
  ctx.registry.register({ path: "beam.loads", label: "Loads", marker: box, host: issues });
  ctx.registry.register({ path: "beam", label: "Spans and loads", marker: box, host: issues });
  return box;
}

const faceChoices = [
  { value: "top", label: "on top" },
  { value: "left", label: "left face" },
  { value: "right", label: "right face" },
];

/**
 * Where a load arrives on side-by-side plies: on top, or hung on the left or right face (joists on
 * hangers). Top is the default and is left out of the document. A moment has no face.
 */
function faceControl(ctx: FormContext, i: number, loadName: string, notes: HTMLElement, offered: boolean): HTMLSelectElement | null {
  const path = `beam.loads[${i}].face`;
  const load = ctx.state.read(`beam.loads[${i}]`) as Item | undefined;
  const kind = String(load?.type ?? "");
  const named = load?.face !== undefined && load.face !== "top";
  if (!named && (!offered || kind === "moment")) return null;
  const select = selectControl(ctx, path, `${loadName} face`, faceChoices, {
    whenAbsent: "top",
    onChosen: (value) => ctx.state.set(path, value === "top" ? undefined : value),
  });
  select.setAttribute("aria-label", `${loadName} arrives on`);
  ctx.registry.register({ path, label: `${loadName} · face`, control: select, marker: select, host: notes, prefix: "face" });
  return select;
}

/** The spans left to right and, where the service takes them, what holds each end. */
function spansBlock(ctx: FormContext): HTMLElement {
  const { state, schema } = ctx;
  const span = unitLabel("span", state.units);
  const count = state.list("beam.spans").length;
  const maxSpans = schema.maxItems("beam.spans") ?? 1;
  const supportChoices = schema.choices("beam.supports[]");
  const issues = el("div", { className: "row-issues" });

  const spanFields = Array.from({ length: Math.max(1, count) }, (_, k) => {
    const label = count > 1 ? `Span ${k + 1}` : "Span";
    const box = field(ctx, `beam.spans[${k}]`, label, numberControl(ctx, `beam.spans[${k}]`, label), { unit: span, ...(maxSpans === 1 ? { hint: "One simply supported span" } : {}) });
    if (count > 1) {
      box.querySelector(".with-unit")!.append(
        rowButton("×", `Remove span ${k + 1}`, () => {
          state.remove("beam.spans", k);
          const supports = state.read("beam.supports");
          if (Array.isArray(supports)) state.set("beam.supports", supports.filter((_, e) => e !== k + 1));
          ctx.rerender(`beam.spans[${Math.max(0, k - 1)}]`);
        }, "remove"),
      );
    }
    return box;
  });

  const ends = supportChoices
    ? Array.from({ length: Math.max(1, count) + 1 }, (_, k) => {
        const label = k === 0 ? "Left end" : k === Math.max(1, count) ? "Right end" : `Support ${k + 1}`;
        const select = selectControl(ctx, `beam.supports[${k}]`, label, supportChoices.map((c) => ({ value: c, label: c })), {
          whenAbsent: endDefault(k),
          // The service takes the supports as one list, so a change writes every end.
          onChosen: (value) => {
            const all = Array.from({ length: Math.max(1, count) + 1 }, (_, e) => String(state.read(`beam.supports[${e}]`) ?? endDefault(e)));
            all[k] = value;
            state.set("beam.supports", all);
          },
        });
        return field(ctx, `beam.supports[${k}]`, label, select);
      })
    : [];

  const block = el("div", { className: "spans" }, [
    fieldGrid(spanFields),
    count < maxSpans
      ? addButton("Add span", () => {
          state.insert("beam.spans", undefined);
          const supports = state.read("beam.supports");
          if (Array.isArray(supports)) state.set("beam.supports", [...supports, "roller"]);
          ctx.rerender(`beam.spans[${count}]`);
        })
      : null,
    ends.length ? el("h3", { text: "Supports" }) : null,
    ends.length ? fieldGrid(ends) : null,
    issues,
  ]);
  const spanInput = block.querySelector<HTMLElement>('[data-path="beam.spans[0]"]') ?? undefined;
  ctx.registry.register({ path: "beam.spans", label: "Spans", ...(spanInput ? { control: spanInput } : {}), marker: block, host: issues });
  ctx.registry.register({ path: "beam.supports", label: "Supports", marker: block, host: issues });
  return block;
}
