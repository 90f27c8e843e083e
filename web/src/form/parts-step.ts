import { unitLabel } from "../../../core/units/quantity.js";
import { addButton, numberControl, recordTable, rowButton, selectControl, textControl, type FormContext } from "./controls.js";
import { placementCell, shapeCell } from "./part-shape.js";
import { renameReferences, uniqueId } from "./references.js";
import { step } from "./step.js";

type Item = Record<string, unknown>;

export function partsStep(ctx: FormContext, number: number): HTMLElement {
  const { state } = ctx;
  const length = unitLabel("length", state.units);
  const count = state.list("parts").length;
  const at = (i: number, key: string) => `parts[${i}].${key}`;
  const name = (i: number) => `Part ${i + 1}`;
  const materialChoices = () =>
    state.list("materials").map((m) => {
      const id = String((m as Item).id ?? "");
      return { value: id, label: id };
    });
  const parts = state.list("parts") as Item[];
  const isRectangle = (i: number) => (parts[i]?.shape as Item | undefined)?.type === "rectangle";
  const isPlaced = (i: number) => parts[i]?.place !== undefined;
  const num = (key: string, label: string, cover?: (i: number) => HTMLElement | null) => ({
    header: label,
    unit: length,
    className: "col-num",
    cell: (i: number) => {
      const spanning = cover?.(i);
      return spanning ? { spanning, columns: 2 } : { path: at(i, key), name: label, control: numberControl(ctx, at(i, key), label) };
    },
  });
  const shape = (i: number) => (isRectangle(i) ? null : shapeCell(ctx, `parts[${i}]`, name(i), length));
  const placement = (i: number) => (isPlaced(i) ? placementCell(ctx, `parts[${i}]`, name(i)) : null);
  const { table, issues } = recordTable(ctx, {
    caption: "Section parts",
    listPath: "parts",
    itemName: name,
    count,
    columns: [
      { header: "Id", className: "col-id", cell: (i) => ({ path: at(i, "id"), name: "id", control: idControl(ctx, i) }) },
      { header: "Name", className: "col-name", cell: (i) => ({ path: at(i, "name"), name: "name", control: textControl(ctx, at(i, "name"), "name", { maxLength: 80 }) }) },
      { header: "Material", className: "col-choice", cell: (i) => ({ path: at(i, "material"), name: "material", control: selectControl(ctx, at(i, "material"), "material", materialChoices) }) },
      num("shape.b", "b", shape),
      num("shape.h", "h"),
      num("x", "x", placement),
      num("y", "y"),
    ],
    actions: (i) => [
      rowButton("Copy", `Copy ${name(i)} (the copy sits on top of it)`, () => {
        const copy = structuredClone(state.list("parts")[i]) as Item;
        copy.id = uniqueId(state.list("parts"), String(copy.id ?? "P"));
        const shape = copy.shape as Item | undefined;
        if (typeof copy.y === "number" && typeof shape?.h === "number") copy.y = copy.y + shape.h;
        state.insert("parts", copy, i + 1);
        ctx.rerender(at(i + 1, "id"));
      }),
      rowButton("×", `Remove ${name(i)}`, () => {
        state.remove("parts", i);
        ctx.rerender(count > 1 ? at(Math.max(0, i - 1), "id") : undefined);
      }, "remove"),
    ],
  });
  const box = step(
    number,
    "Section parts",
    `Rectangles b wide and h deep, with x and y at each part's lower left corner (${length}). Parts may touch but not overlap; every face where two parts touch is a joint plane.`,
    [
      table,
      issues,
      addButton("Add part", () => {
        const material = (state.list("materials")[0] as Item | undefined)?.id ?? "";
        const i = state.insert("parts", { id: uniqueId(state.list("parts"), "P1"), name: "", material, shape: { type: "rectangle" }, x: 0, y: 0 });
        ctx.rerender(at(i, "shape.b"));
      }),
    ],
  );
  ctx.registry.register({ path: "parts", label: "Section parts", marker: box, host: issues });
  return box;
}

function idControl(ctx: FormContext, i: number): HTMLInputElement {
  const input = textControl(ctx, `parts[${i}].id`, "id", { maxLength: 40 });
  renameReferences(ctx, input, "parts", (oldId, newId) => {
    ctx.state.list("fastening.joints").forEach((joint, k) => {
      const held = (joint as Item).held;
      if (Array.isArray(held) && held.includes(oldId)) ctx.state.set(`fastening.joints[${k}].held`, held.map((id) => (id === oldId ? newId : id)));
    });
  });
  return input;
}
