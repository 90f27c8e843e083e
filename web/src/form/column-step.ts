import type { ColumnEnds } from "../../../core/schema/column.js";
import { unitLabel } from "../../../core/units/quantity.js";
import { el, nextId } from "../dom.js";
import { categoryIds } from "./categories-block.js";
import { addButton, field, numberControl, recordTable, rowButton, selectControl, textControl, type FormContext } from "./controls.js";
import { numberFromText } from "./field-registry.js";
import { fieldGrid, step } from "./step.js";

type Item = Record<string, unknown>;

/**
 * K_e of each end condition, for the words of the choice only (the design takes its own from
 * core/schema/column.ts; test/web/column-step.test.ts keeps the two equal). Listed here so the page
 * bundle does not carry zod.
 */
export const endsK: Record<ColumnEnds, number> = {
  "pinned-pinned": 1.0,
  "fixed-fixed": 0.65,
  "fixed-pinned": 0.8,
  "fixed-guided": 1.2,
  "fixed-free": 2.1,
  "pinned-guided": 2.4,
};

const endWords: Record<string, string> = {
  "pinned-pinned": "pinned, pinned",
  "fixed-fixed": "fixed, fixed",
  "fixed-pinned": "fixed, pinned",
  "fixed-guided": "fixed, guided",
  "fixed-free": "fixed, free",
  "pinned-guided": "pinned, guided",
};

export const ruleWords: Record<string, string> = {
  auto: "chosen from the materials and connectors",
  "nds-15.3": "NDS 2018 §15.3, nailed or bolted laminations",
  "en1995-annex-c": "EN 1995-1-1 Annex C, mechanically jointed",
  "en1995-c3-spaced": "EN 1995-1-1 Annex C.3, spaced column",
  "aisc-e6": "AISC 360-16 §E6, built-up steel",
  "en1993-6.4": "EN 1993-1-1 §6.4, built-up steel",
};

const serviceClasses = [
  { value: "1", label: "1 (heated indoors)" },
  { value: "2", label: "2 (covered)" },
  { value: "3", label: "3 (exposed)" },
];

/** Rules whose section leaves packing parts out of A, I and r, or holds its shafts apart with them. */
const packingRules = new Set(["en1995-c3-spaced", "aisc-e6", "en1993-6.4"]);

/**
 * The member as a column: axial loads by category at the top, how it is held against buckling about
 * each axis, the built-up rule and, where they apply, packing, packs of a spaced column and the
 * EN 1995 service class. The member's span is the column's height, its left end the base.
 */
export function columnStep(ctx: FormContext, number: number): HTMLElement {
  const { state, schema } = ctx;
  // A service that does not know columns is not offered one.
  if (schema.known && !schema.has("compression")) return el("div", { attrs: { hidden: true } });
  const present = typeof state.read("compression") === "object" && state.read("compression") !== null;
  const issues = el("div", { className: "row-issues" });
  const toggle = el("input", { attrs: { type: "checkbox", "data-path": "compression", "aria-label": "This member is a column (axial compression)" } });
  toggle.checked = present;
  toggle.addEventListener("change", () => {
    state.replaceItem("compression", toggle.checked ? { loads: [{ category: "dead", label: "" }] } : undefined);
    ctx.rerender(toggle.checked ? "compression.loads[0].P" : "compression");
  });
  const switchBox = el("div", { className: "field wide check" }, [el("label", {}, [toggle, el("span", { text: "This member is a column (axial compression)" })])]);
  const box = step(
    number,
    "Column (axial compression)",
    "The member's span is the column's height, its left end the base; axial loads act at the top. The loads of the spans step stay lateral loads (wind on a face) and join the same combinations by category.",
    [switchBox, ...(present ? columnBody(ctx) : []), issues],
  );
  ctx.registry.register({ path: "compression", label: "Column (axial compression)", control: toggle, marker: box, host: issues });
  return box;
}

function columnBody(ctx: FormContext): HTMLElement[] {
  const { state } = ctx;
  const u = state.units;
  const rule = String(state.read("compression.rule") ?? "auto");
  const connectors = state.list("connectors") as Item[];
  const materials = state.list("materials") as Item[];
  const ec5Connectors = connectors.some((c) => c?.standard === "EN1995-1-1");
  const steel = materials.some((m) => m?.family === "steel");
  const spacedGiven = typeof state.read("compression.spaced") === "object" && state.read("compression.spaced") !== null;
  const packingGiven = state.list("compression.packing").length > 0;
  // Shown where the rule (or, under auto, the connectors and materials) can use them, or where the job already gives them.
  const ec5 = rule.startsWith("en1995") || (rule === "auto" && ec5Connectors) || state.read("compression.serviceClass") !== undefined || state.read("compression.gammaM") !== undefined;
  const spacedShown = spacedGiven || rule === "en1995-c3-spaced" || (rule === "auto" && ec5Connectors);
  const packingShown = packingGiven || spacedGiven || packingRules.has(rule) || (rule === "auto" && steel);

  const rules = (ctx.schema.choices("compression.rule") ?? Object.keys(ruleWords)).map((r) => ({ value: r, label: ruleWords[r] ?? r.replace(/-/g, " ") }));
  const ruleField = field(
    ctx,
    "compression.rule",
    "Built-up column rule",
    selectControl(ctx, "compression.rule", "rule", rules, {
      whenAbsent: "auto",
      onChosen: (value) => {
        state.set("compression.rule", value);
        ctx.rerender("compression.rule");
      },
    }),
    { wide: true, hint: "The rule sets the column's capacity and the connectors' spacing limits and buckling shear." },
  );

  return [
    el("h3", { text: "Axial loads" }),
    ...axialLoads(ctx),
    el("p", { className: "hint", text: "A timber column needs each material's compression strength parallel to the grain (Materials, More properties)." }),
    el("h3", { text: "Buckling" }),
    el("p", { className: "hint", text: "About each axis: the end conditions give K_e, or give K_e itself. Brace points are measured from the base; each stretch between them is taken at K_e of at least 1." }),
    axisBlock(ctx, "x", "About x (the axis the lateral loads bend about)"),
    axisBlock(ctx, "y", "About y (the other axis)"),
    fieldGrid([ruleField]),
    packingShown ? packingBlock(ctx) : null,
    spacedShown ? spacedBlock(ctx, u) : null,
    ec5
      ? fieldGrid([
          field(
            ctx,
            "compression.serviceClass",
            "Service class (EN 1995)",
            selectControl(ctx, "compression.serviceClass", "service class", serviceClasses, {
              whenAbsent: "1",
              onChosen: (v) => state.set("compression.serviceClass", Number(v)),
            }),
            { owner: "Column", hint: "EN 1995-1-1 §2.3.1.3, for k_mod of the column." },
          ),
          field(ctx, "compression.gammaM", "Timber γ_M", numberControl(ctx, "compression.gammaM", "γ_M", { placeholder: "by material" }), {
            owner: "Column",
            hint: "EN 1995-1-1 Table 2.3; that of the material when empty.",
          }),
        ])
      : null,
  ].filter((x): x is HTMLElement => x !== null);
}

function axialLoads(ctx: FormContext): HTMLElement[] {
  const { state } = ctx;
  const u = state.units;
  const loads = state.list("compression.loads");
  const at = (i: number, key: string) => `compression.loads[${i}].${key}`;
  const name = (i: number) => `Axial load ${i + 1}`;
  const own = new Set(state.list("beam.categories").map((c) => String((c as Item)?.id ?? "")));
  const categoryChoices = () => categoryIds(ctx).map((c) => ({ value: c, label: own.has(c) ? `${c} (own)` : c.replace("-", " ") }));
  const { table, issues } = recordTable(ctx, {
    caption: "Axial loads",
    listPath: "compression.loads",
    itemName: name,
    count: loads.length,
    columns: [
      { header: "Category", className: "col-choice", cell: (i) => ({ path: at(i, "category"), name: "category", control: selectControl(ctx, at(i, "category"), "category", categoryChoices, { whenAbsent: "dead" }) }) },
      { header: "Label", className: "col-name", cell: (i) => ({ path: at(i, "label"), name: "label", control: textControl(ctx, at(i, "label"), "label", { maxLength: 60 }) }) },
      { header: "P", unit: unitLabel("force", u), className: "col-num", cell: (i) => ({ path: at(i, "P"), name: "P", control: numberControl(ctx, at(i, "P"), "P") }) },
      { header: "e", unit: unitLabel("length", u), className: "col-num", cell: (i) => ({ path: at(i, "eccentricity"), name: "eccentricity", control: numberControl(ctx, at(i, "eccentricity"), "eccentricity", { placeholder: "none" }) }) },
    ],
    actions: (i) => [
      rowButton("×", `Remove ${name(i)}`, () => {
        state.remove("compression.loads", i);
        ctx.rerender(loads.length > 1 ? at(Math.max(0, i - 1), "P") : "compression");
      }, "remove"),
    ],
  });
  ctx.registry.register({ path: "compression.loads", label: "Axial loads", marker: table, host: issues });
  return [
    el("div", { className: "axial-loads" }, [table]),
    el("p", { className: "hint", text: "P is compression, at the top of the column. e is measured from the section's centroid in the plane of the lateral loads (up positive) and adds P·e at the top, falling to nothing at the base." }),
    issues,
    el("div", { className: "button-row" }, [
      addButton("Add axial load", () => {
        const i = state.insert("compression.loads", { category: "dead", label: "" });
        ctx.rerender(at(i, "P"));
      }),
    ]),
  ];
}

function axisBlock(ctx: FormContext, axis: "x" | "y", title: string): HTMLElement {
  const { state } = ctx;
  const base = `compression.${axis}`;
  const owner = `Buckling about ${axis}`;
  const span = unitLabel("span", state.units);
  const offered = ctx.schema.choices(`${base}.ends`) ?? Object.keys(endsK);
  const ends = selectControl(
    ctx,
    `${base}.ends`,
    "ends",
    [{ value: "", label: "not given (pinned, pinned)" }, ...offered.map((e) => ({ value: e, label: `${endWords[e] ?? e.replace(/-/g, " ")}${e in endsK ? ` (${endsK[e as ColumnEnds]})` : ""}` }))],
    { whenAbsent: "", onChosen: (v) => state.set(`${base}.ends`, v || undefined) },
  );
  const chosen = state.read(`${base}.ends`);
  const fromEnds = typeof chosen === "string" && chosen in endsK ? String(endsK[chosen as ColumnEnds]) : "1";
  return el("div", { className: "field wide group-field" }, [
    el("span", { className: "label", text: title }),
    fieldGrid(
      [
        field(ctx, `${base}.ends`, "End conditions", ends, { owner, hint: "K_e in brackets. Guided: the end moves sideways but does not turn." }),
        field(ctx, `${base}.K`, "K_e", numberControl(ctx, `${base}.K`, "K_e", { placeholder: `from the ends (${fromEnds})` }), { owner, hint: "Replaces the ends' value when given." }),
        bracePoints(ctx, `${base}.bracedAt`, owner, span),
      ],
      "nested",
    ),
  ]);
}

/** Brace points as a list typed in one field, as the preferred spacings are. */
function bracePoints(ctx: FormContext, path: string, owner: string, span: string): HTMLElement {
  const { state } = ctx;
  const id = nextId("field");
  const input = el("input", { attrs: { type: "text", id, "data-path": path, autocomplete: "off", spellcheck: "false", placeholder: "none", "aria-label": `${owner} brace points (${span})` } });
  const value = state.read(path);
  input.value = Array.isArray(value) ? value.map(String).join(", ") : "";
  input.addEventListener("input", () => {
    const tokens = input.value.split(/[\s,;]+/).filter(Boolean);
    state.set(path, tokens.length ? tokens.map((t) => numberFromText(t) ?? t) : undefined);
  });
  const issues = el("div", { className: "row-issues" });
  const box = el("div", { className: "field" }, [
    el("label", { text: "Braced at", attrs: { for: id } }),
    el("span", { className: "with-unit" }, [input, el("span", { className: "unit", text: span, attrs: { "aria-hidden": "true" } })]),
    el("span", { className: "hint", text: `From the base, e.g. ${state.units === "us" ? "4" : "1.2"} or ${state.units === "us" ? "3, 6" : "1, 2"}.` }),
    issues,
  ]);
  ctx.registry.register({ path, label: `${owner} · braced at`, control: input, marker: box, host: issues });
  return box;
}

/** Parts that only fill the gap (packing plates, a spaced column's packs): picked from the parts. */
function packingBlock(ctx: FormContext): HTMLElement {
  const { state } = ctx;
  const path = "compression.packing";
  const chosen = () => state.list(path).map(String);
  const issues = el("div", { className: "row-issues" });
  const ids = (state.list("parts") as Item[]).map((p) => String(p?.id ?? "")).filter(Boolean);
  const missing = chosen().filter((id) => !ids.includes(id));
  const boxes = [...ids, ...missing].map((id) => {
    const box = el("input", { attrs: { type: "checkbox", "aria-label": `Packing: ${id}` } });
    box.checked = chosen().includes(id);
    box.addEventListener("change", () => {
      const now = chosen().filter((c) => c !== id);
      state.set(path, box.checked ? [...now, id] : now);
    });
    return el("label", { className: "held-choice" }, [box, el("span", { text: ids.includes(id) ? id : `${id} (not a part)` })]);
  });
  const box = el("div", { className: "field wide category-checks" }, [
    el("span", { className: "label", text: "Packing parts" }),
    el("span", { className: "hint", text: "Parts that only fill the gap between the components (packing plates, a spaced column's packs or gussets): left out of the column's area, I and r." }),
    el("div", { className: "held-choices" }, boxes),
    issues,
  ]);
  ctx.registry.register({ path, label: "Packing parts", marker: box, host: issues });
  return box;
}

/** EN 1995-1-1 Annex C.3: the shafts held apart by packs or gussets at a spacing. */
function spacedBlock(ctx: FormContext, u: "si" | "us"): HTMLElement {
  const { state } = ctx;
  const path = "compression.spaced";
  const present = typeof state.read(path) === "object" && state.read(path) !== null;
  const toggle = el("input", { attrs: { type: "checkbox", "data-path": path, "aria-label": "The shafts are held apart by packs or gussets (a spaced column)" } });
  toggle.checked = present;
  toggle.addEventListener("change", () => {
    state.replaceItem(path, toggle.checked ? { kind: "packs" } : undefined);
    ctx.rerender(toggle.checked ? `${path}.packSpacing` : path);
  });
  const owner = "Spaced column";
  const inner = present
    ? fieldGrid(
        [
          field(
            ctx,
            `${path}.kind`,
            "Held apart by",
            selectControl(ctx, `${path}.kind`, "held apart by", [{ value: "packs", label: "packs" }, { value: "gussets", label: "gussets" }], { whenAbsent: "packs" }),
            { owner },
          ),
          field(ctx, `${path}.packSpacing`, "Pack spacing l_1", numberControl(ctx, `${path}.packSpacing`, "l_1"), { owner, unit: unitLabel("span", u), hint: "Centre to centre along the column; end packs at the ends." }),
          field(ctx, `${path}.packLength`, "Pack length l_2", numberControl(ctx, `${path}.packLength`, "l_2"), { owner, unit: unitLabel("length", u) }),
        ],
        "nested",
      )
    : null;
  const box = el("div", { className: "field wide group-field" }, [
    el("label", { className: "group-toggle" }, [toggle, el("span", { text: "The shafts are held apart by packs or gussets (spaced column, EN 1995-1-1 Annex C.3)" })]),
    inner,
  ]);
  ctx.registry.register({ path, label: owner, control: toggle, marker: box, host: box });
  return box;
}
