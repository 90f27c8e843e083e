import { el } from "../dom.js";
import { numberControl, selectControl, textControl, type FormContext } from "./controls.js";

type FieldSpec = { key: string; label: string; choices?: string[]; text?: boolean; optional?: boolean };

/**
 * Dimension fields of the shapes other than a plain rectangle, which has its own b and h columns.
 * Every number here is a length. A shape type not listed is shown as it stands and left untouched.
 */
const shapeFields: Record<string, { title: string; fields: FieldSpec[] }> = {
  lumber: { title: "Sawn lumber", fields: [{ key: "nominal", label: "nominal", text: true }, { key: "orientation", label: "on", choices: ["edge", "flat"] }] },
  "i-section": {
    title: "I-section",
    fields: [
      { key: "designation", label: "designation", text: true },
      { key: "d", label: "d" },
      { key: "tw", label: "tw" },
      { key: "bf", label: "bf" },
      { key: "tf", label: "tf" },
      { key: "bfBottom", label: "bf bottom", optional: true },
      { key: "tfBottom", label: "tf bottom", optional: true },
    ],
  },
  channel: {
    title: "Channel",
    fields: [{ key: "designation", label: "designation", text: true }, { key: "d", label: "d" }, { key: "bf", label: "bf" }, { key: "tf", label: "tf" }, { key: "tw", label: "tw" }, { key: "toes", label: "toes", choices: ["right", "left"] }],
  },
  tee: {
    title: "Tee",
    fields: [{ key: "designation", label: "designation", text: true }, { key: "d", label: "d" }, { key: "bf", label: "bf" }, { key: "tf", label: "tf" }, { key: "tw", label: "tw" }, { key: "flange", label: "flange", choices: ["top", "bottom"] }],
  },
  "hollow-rectangle": { title: "Hollow rectangle", fields: [{ key: "designation", label: "designation", text: true }, { key: "b", label: "b" }, { key: "h", label: "h" }, { key: "t", label: "t" }] },
};

/** The shape of a part that is not a rectangle: its own small labelled fields, in one cell. */
export function shapeCell(ctx: FormContext, partPath: string, partName: string, lengthUnit: string): HTMLElement {
  const type = String(ctx.state.read(`${partPath}.shape.type`) ?? "");
  const known = shapeFields[type];
  if (!known) {
    return el("div", { className: "inline-fields" }, [el("span", { className: "inline-title", text: `${type || "unknown"} shape: edit it in the job file` })]);
  }
  return el("div", { className: "inline-fields" }, [
    el("span", { className: "inline-title", text: known.title }),
    ...known.fields.map((f) => {
      const path = `${partPath}.shape.${f.key}`;
      const name = `${partName} ${f.label}`;
      const control = f.choices
        ? selectControl(ctx, path, name, f.choices.map((c) => ({ value: c, label: c })), { whenAbsent: f.choices[0]! })
        : f.text
          ? textControl(ctx, path, name, { maxLength: 40 })
          : numberControl(ctx, path, `${name} (${lengthUnit})`, f.optional ? { placeholder: "same" } : {});
      const label = el("label", { className: "inline-field" }, [el("span", { text: f.label }), control]);
      ctx.registry.register({ path, label: `${partName} · ${f.label}`, control, marker: label, host: label, numeric: control.classList.contains("number") });
      return label;
    }),
  ]);
}

/** A part stacked against another instead of placed by x and y. */
export function placementCell(ctx: FormContext, partPath: string, partName: string): HTMLElement {
  const partChoices = () =>
    ctx.state
      .list("parts")
      .map((p) => String((p as Record<string, unknown>).id ?? ""))
      .filter((id) => id && id !== ctx.state.read(`${partPath}.id`))
      .map((id) => ({ value: id, label: id }));
  const fields: [string, string, HTMLSelectElement][] = [
    ["on", "against", selectControl(ctx, `${partPath}.place.on`, `${partName} placed against`, partChoices)],
    ["side", "side", selectControl(ctx, `${partPath}.place.side`, `${partName} side`, ["top", "bottom", "left", "right"].map((v) => ({ value: v, label: v })))],
    ["align", "align", selectControl(ctx, `${partPath}.place.align`, `${partName} alignment`, ["centre", "start", "end"].map((v) => ({ value: v, label: v })), { whenAbsent: "centre" })],
  ];
  return el(
    "div",
    { className: "inline-fields" },
    fields.map(([key, label, control]) => {
      const box = el("label", { className: "inline-field" }, [el("span", { text: label }), control]);
      ctx.registry.register({ path: `${partPath}.place.${key}`, label: `${partName} · ${label}`, control, marker: box, host: box });
      return box;
    }),
  );
}
