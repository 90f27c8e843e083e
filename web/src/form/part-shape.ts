import { el } from "../dom.js";
import { numberControl, selectControl, textControl, type FormContext } from "./controls.js";

/** The shape of a part that is not a plain rectangle: the fields the service's schema gives that shape, in one cell. Every number in a shape is a length. */
export function shapeCell(ctx: FormContext, partPath: string, partName: string, lengthUnit: string): HTMLElement {
  const type = String(ctx.state.read(`${partPath}.shape.type`) ?? "");
  const fields = ctx.schema.fieldsOf("parts[].shape", "type", type);
  const title = type.replace(/-/g, " ");
  if (!fields) {
    return el("div", { className: "inline-fields" }, [el("span", { className: "inline-title", text: `${title || "unknown"} shape: kept as in the job file` })]);
  }
  return el("div", { className: "inline-fields" }, [
    el("span", { className: "inline-title", text: title }),
    ...fields.map((f) => {
      const path = `${partPath}.shape.${f.key}`;
      const name = `${partName} ${f.key}`;
      const control =
        f.kind === "choice"
          ? selectControl(ctx, path, name, f.choices.map((c) => ({ value: c, label: c })), { whenAbsent: f.choices[0]! })
          : f.kind === "text"
            ? textControl(ctx, path, name, { maxLength: 40, removeWhenEmpty: !f.required })
            : numberControl(ctx, path, `${name} (${lengthUnit})`, f.required ? {} : { placeholder: "—" });
      const label = el("label", { className: "inline-field" }, [el("span", { text: f.kind === "number" ? `${f.key} (${lengthUnit})` : f.key }), control]);
      ctx.registry.register({ path, label: `${partName} · ${f.key}`, control, marker: label, host: label, numeric: f.kind === "number" });
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
