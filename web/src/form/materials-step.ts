import { unitLabel } from "../../../core/units/quantity.js";
import { el } from "../dom.js";
import { addButton, numberControl, recordTable, rowButton, selectControl, textControl, type FormContext } from "./controls.js";
import { fold } from "./fold.js";
import { gradeChooser } from "./material-grades.js";
import { renameReferences, uniqueId } from "./references.js";
import { schemaFields } from "./schema-fields.js";
import { fieldGrid, step } from "./step.js";

/** Shown in the row itself; every other property of a material goes in the row's fold. */
const inRow = new Set(["id", "name", "family", "source", "E", "density", "strength"]);

const families = [
  { value: "sawn-timber", label: "sawn timber" },
  { value: "glulam", label: "glulam" },
  { value: "engineered-wood", label: "engineered wood" },
  { value: "panel", label: "panel" },
  { value: "steel", label: "steel" },
  { value: "other", label: "other" },
];

export function materialsStep(ctx: FormContext, number: number): HTMLElement {
  const { state } = ctx;
  const u = state.units;
  const count = state.list("materials").length;
  const at = (i: number, key: string) => `materials[${i}].${key}`;
  const name = (i: number) => `Material ${i + 1}`;
  const { table, issues } = recordTable(ctx, {
    caption: "Materials",
    listPath: "materials",
    itemName: name,
    count,
    columns: [
      { header: "Id", className: "col-id", cell: (i) => ({ path: at(i, "id"), name: "id", control: idControl(ctx, i) }) },
      {
        header: "Name, family",
        className: "col-name",
        cell: (i, notes) => {
          const nameInput = textControl(ctx, at(i, "name"), "name", { maxLength: 80, placeholder: "name" });
          const family = selectControl(ctx, at(i, "family"), `${name(i)} family`, families, { whenAbsent: "other" });
          const stack = el("div", { className: "stack" }, [nameInput, family]);
          ctx.registry.register({ path: at(i, "family"), label: `${name(i)} · family`, control: family, marker: family, host: notes, prefix: "family" });
          return { path: at(i, "name"), name: "name", control: nameInput, content: stack };
        },
      },
      { header: "E", unit: unitLabel("modulus", u), className: "col-num col-modulus", cell: (i) => ({ path: at(i, "E"), name: "E", control: numberControl(ctx, at(i, "E"), "E") }) },
      { header: "Density", unit: unitLabel("density", u), className: "col-num", cell: (i) => ({ path: at(i, "density"), name: "density", control: numberControl(ctx, at(i, "density"), "density") }) },
      {
        header: "Bending",
        unit: unitLabel("stress", u),
        className: "col-num",
        cell: (i) => ({ path: at(i, "strength.bending"), name: "bending strength", control: numberControl(ctx, at(i, "strength.bending"), "bending strength", { placeholder: "none" }) }),
      },
      {
        header: "Shear",
        unit: unitLabel("stress", u),
        className: "col-num",
        cell: (i) => ({ path: at(i, "strength.shear"), name: "shear strength", control: numberControl(ctx, at(i, "strength.shear"), "shear strength", { placeholder: "none" }) }),
      },
    ],
    extra: (i, notes) => {
      const source = textControl(ctx, at(i, "source"), `${name(i)} source of values`, { maxLength: 400, placeholder: "where these values come from" });
      source.classList.add("source");
      ctx.registry.register({ path: at(i, "source"), label: `${name(i)} · source`, control: source, marker: source, host: notes, prefix: "source" });
      const extras = [
        ...ctx.schema.fieldsAt("materials[].strength").filter((f) => f.key !== "bending" && f.key !== "shear").map((f) => ({ f, path: at(i, "strength") })),
        ...ctx.schema.fieldsAt("materials[]").filter((f) => !inRow.has(f.key)).map((f) => ({ f, path: `materials[${i}]` })),
      ];
      const given = extras.filter(({ f, path }) => state.read(`${path}.${f.key}`) !== undefined).length;
      const fields = extras.flatMap(({ f, path }) => schemaFields(ctx, path, [f], { owner: name(i), scope: "material" }));
      return el("div", { className: "row-helpers" }, [
        gradeChooser(ctx, i, name(i)),
        el("label", { className: "source-field" }, [el("span", { text: "Source" }), source]),
        fields.length ? fold(`materials[${i}].more`, `More properties for connectors${given ? ` (${given} given)` : ""}: G, ρ_k, ρ_mean, F_y, F_u, rolling shear`, [fieldGrid(fields)]) : null,
      ]);
    },
    actions: (i) => [
      rowButton("Copy", `Copy ${name(i)}`, () => {
        const copy = structuredClone(state.list("materials")[i]) as Record<string, unknown>;
        copy.id = uniqueId(state.list("materials"), String(copy.id ?? "M"));
        state.insert("materials", copy, i + 1);
        ctx.rerender(at(i + 1, "id"));
      }),
      rowButton("×", `Remove ${name(i)}`, () => {
        state.remove("materials", i);
        ctx.rerender(count > 1 ? at(Math.max(0, i - 1), "id") : undefined);
      }, "remove"),
    ],
  });
  const box = step(number, "Materials", "E, density and the bending and shear strengths, on the job's basis. A strength left empty is listed under “not checked”. Fill a row from a common grade, then check every value against your own source.", [
    table,
    issues,
    addButton("Add material", () => {
      const id = uniqueId(state.list("materials"), "M1");
      const i = state.insert("materials", { id, name: "", family: "other", strength: {}, source: "" });
      ctx.rerender(at(i, "name"));
    }),
  ]);
  ctx.registry.register({ path: "materials", label: "Materials", marker: box, host: issues });
  return box;
}

function idControl(ctx: FormContext, i: number): HTMLInputElement {
  const input = textControl(ctx, `materials[${i}].id`, "id", { maxLength: 40 });
  renameReferences(ctx, input, "materials", (oldId, newId) => {
    ctx.state.list("parts").forEach((part, k) => {
      if ((part as Record<string, unknown>).material === oldId) ctx.state.set(`parts[${k}].material`, newId);
    });
  });
  return input;
}
