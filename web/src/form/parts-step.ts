import { el } from "../dom.js";
import { unitLabel } from "../../../core/units/quantity.js";
import { formatNumber } from "../../../core/units/format.js";
import { addButton, numberControl, recordTable, rowButton, selectControl, textControl, type FormContext } from "./controls.js";
import { fold } from "./fold.js";
import { placementCell, shapeCell } from "./part-shape.js";
import { renameReferences, uniqueId } from "./references.js";
import { shapeNames, shapePreset } from "./shape-presets.js";
import { step } from "./step.js";

type Item = Record<string, unknown>;

const sides = [
  { value: "top", label: "on top of" },
  { value: "bottom", label: "under" },
  { value: "right", label: "right of" },
  { value: "left", label: "left of" },
];

export function partsStep(ctx: FormContext, number: number): HTMLElement {
  const { state } = ctx;
  const count = state.list("parts").length;
  const at = (i: number, key: string) => `parts[${i}].${key}`;
  const name = (i: number) => `Part ${i + 1}`;
  const materialChoices = () =>
    state.list("materials").map((m) => {
      const id = String((m as Item).id ?? "");
      return { value: id, label: id };
    });
  const partId = (i: number) => String((state.list("parts")[i] as Item | undefined)?.id ?? "");
  /** A new part against part i (stacked on it, or beside it), of the same material. */
  const placeAgainst = (i: number, side: string, shape: Item) => {
    const source = (state.list("parts")[i] ?? {}) as Item;
    const item: Item = { id: uniqueId(state.list("parts"), `P${count + 1}`), name: "", material: source.material ?? "", shape, place: { on: partId(i), side, align: "centre" } };
    // Added at the end, so no other part is renumbered.
    const k = state.insert("parts", item);
    ctx.rerender(at(k, "shape.type"));
  };
  const { table, issues } = recordTable(ctx, {
    caption: "Section parts",
    listPath: "parts",
    itemName: name,
    count,
    columns: [
      { header: "Id", className: "col-id", cell: (i) => ({ path: at(i, "id"), name: "id", control: idControl(ctx, i) }) },
      {
        header: "Name, material",
        className: "col-name",
        cell: (i, notes) => {
          const nameInput = textControl(ctx, at(i, "name"), "name", { maxLength: 80, placeholder: "name" });
          const material = selectControl(ctx, at(i, "material"), `${name(i)} material`, materialChoices);
          ctx.registry.register({ path: at(i, "material"), label: `${name(i)} · material`, control: material, marker: material, host: notes, prefix: "material" });
          return { path: at(i, "name"), name: "name", control: nameInput, content: el("div", { className: "stack" }, [nameInput, material]) };
        },
      },
      {
        header: "Shape",
        className: "col-shape",
        cell: (i, notes) => {
          const { control, content } = shapeCell(ctx, i, name(i), notes);
          return { path: at(i, "shape.type"), name: "shape", control, content };
        },
      },
      {
        header: "Placed",
        className: "col-place",
        cell: (i, notes) => {
          const { control, content } = placementCell(ctx, i, name(i), notes);
          return { path: at(i, "place.side"), name: "placed", control, content };
        },
      },
    ],
    extra: (i, notes) => (ctx.schema.has("parts[].extent") ? extentFold(ctx, i, name(i), notes) : null),
    actions: (i) => [
      rowButton("Copy", `Copy ${name(i)} (the copy sits on top of it)`, () => {
        const copy = structuredClone(state.list("parts")[i]) as Item;
        placeAgainst(i, "top", (copy.shape as Item | undefined) ?? shapePreset("rectangle", state.units));
      }),
      rowButton("×", `Remove ${name(i)}`, () => {
        // Parts placed against the removed one keep its id, and the service reports them until they are moved.
        state.remove("parts", i);
        ctx.rerender(count > 1 ? at(Math.max(0, i - 1), "id") : undefined);
      }, "remove"),
    ],
  });

  const shapeChoice = el(
    "select",
    { attrs: { id: "new-part-shape", "aria-label": "Shape of the new part" } },
    Object.entries(shapeNames)
      .filter(([type]) => ctx.schema.kinds("parts[].shape", "type").includes(type) || !ctx.schema.known)
      .map(([type, label]) => el("option", { text: label, attrs: { value: type } })),
  );
  const lastType = ((state.list("parts").at(-1) as Item | undefined)?.shape as Item | undefined)?.type;
  if (typeof lastType === "string" && [...shapeChoice.options].some((o) => o.value === lastType)) shapeChoice.value = lastType;
  const sideChoice = el("select", { attrs: { id: "new-part-side", "aria-label": "Where the new part goes" } }, [
    ...(count ? sides.map((s) => el("option", { text: s.label, attrs: { value: s.value } })) : []),
    el("option", { text: "at x, y", attrs: { value: "xy" } }),
  ]);
  const againstChoice = el(
    "select",
    { attrs: { id: "new-part-against", "aria-label": "Part the new one goes against" } },
    state.list("parts").map((p, i) => el("option", { text: String((p as Item).id ?? `part ${i + 1}`), attrs: { value: String(i) } })),
  );
  againstChoice.value = String(count - 1);
  // Ids may have been renamed since the step was drawn: the list is read again when it is opened.
  const refreshAgainstNames = () => {
    const chosen = againstChoice.value;
    againstChoice.replaceChildren(...state.list("parts").map((p, i) => el("option", { text: String((p as Item).id ?? `part ${i + 1}`), attrs: { value: String(i) } })));
    againstChoice.value = chosen;
  };
  againstChoice.addEventListener("focus", refreshAgainstNames);
  againstChoice.addEventListener("mousedown", refreshAgainstNames);
  const refreshAgainst = () => (againstChoice.hidden = sideChoice.value === "xy");
  sideChoice.addEventListener("change", refreshAgainst);
  refreshAgainst();
  const addPart = () => {
    // A new part of the same type takes the size and orientation of the part it goes against (or the last one).
    const parts = state.list("parts") as Item[];
    const model = parts[sideChoice.value !== "xy" ? Number(againstChoice.value) : parts.length - 1]?.shape as Item | undefined;
    const shape = model?.type === shapeChoice.value ? (JSON.parse(JSON.stringify(model)) as Item) : shapePreset(shapeChoice.value, state.units);
    if (sideChoice.value !== "xy" && count > 0) return placeAgainst(Number(againstChoice.value), sideChoice.value, shape);
    const material = (state.list("materials")[0] as Item | undefined)?.id ?? "";
    const i = state.insert("parts", { id: uniqueId(state.list("parts"), "P1"), name: "", material, shape, x: 0, y: 0 });
    ctx.rerender(at(i, "shape.type"));
  };

  const box = step(
    number,
    "Section parts",
    "Each part with its shape and where it sits: stacked on, under or beside another part, or by the lower-left corner of its box (x, y). Parts may touch but not overlap; every face where two parts touch is a joint plane.",
    [
      table,
      issues,
      el("div", { className: "add-with-choice" }, [
        el("label", { text: "New part:", attrs: { for: "new-part-shape" } }),
        shapeChoice,
        sideChoice,
        againstChoice,
        addButton("Add part", addPart),
      ]),
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
    ctx.state.list("parts").forEach((part, k) => {
      if (((part as Item).place as Item | undefined)?.on === oldId) ctx.state.set(`parts[${k}].place.on`, newId);
    });
  });
  return input;
}

/** Where a part runs along the member (a cover plate over the middle): the whole member unless from or to is given. */
function extentFold(ctx: FormContext, i: number, partName: string, notes: HTMLElement): HTMLElement {
  const span = unitLabel("span", ctx.state.units);
  const at = (key: string) => `parts[${i}].extent.${key}`;
  const summary = () => {
    const from = ctx.state.read(at("from"));
    const to = ctx.state.read(at("to"));
    const given = typeof from === "number" || typeof to === "number";
    return given ? `Runs from ${typeof from === "number" ? formatNumber(from) : "the left end"} to ${typeof to === "number" ? formatNumber(to) : "the right end"} ${span}` : "Runs the whole length of the member";
  };
  const input = (key: "from" | "to", label: string, placeholder: string) => {
    const control = numberControl(ctx, at(key), `${partName} runs ${key} (${span})`, { placeholder });
    control.setAttribute("aria-label", `${partName} runs ${key} (${span})`);
    ctx.registry.register({ path: at(key), label: `${partName} · runs ${key}`, control, marker: control, host: notes, prefix: `runs ${key}`, numeric: true });
    return el("label", { className: "inline-field" }, [el("span", { text: `${label} (${span})` }), control]);
  };
  const body = el("div", { className: "inline-fields" }, [input("from", "from", "left end"), input("to", "to", "right end")]);
  ctx.registry.register({ path: `parts[${i}].extent`, label: `${partName} · along the member`, marker: body, host: notes, prefix: "along the member" });
  const folded = fold(`parts[${i}].extent`, summary(), [body]);
  body.addEventListener("input", () => (folded.querySelector("summary")!.textContent = summary()));
  return el("div", { className: "row-helpers" }, [folded]);
}
