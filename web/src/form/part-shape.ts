import { unitLabel } from "../../../core/units/quantity.js";
import { el } from "../dom.js";
import { numberControl, selectControl, textControl, type FormContext } from "./controls.js";
import { fieldName, valueName } from "./field-names.js";
import { asShapeType, shapeNames } from "./shape-presets.js";

type Item = Record<string, unknown>;

/** A small labelled field inside a table cell; its messages go on the row's message line (`notes`), prefixed with its name. */
const inline = (ctx: FormContext, notes: HTMLElement, path: string, label: string, registryLabel: string, control: HTMLElement, numeric: boolean) => {
  const box = el("label", { className: "inline-field" }, [el("span", { text: label }), control]);
  ctx.registry.register({ path, label: registryLabel, control, marker: box, host: notes, prefix: label, numeric });
  return box;
};

/** The part's shape: its type (changeable) and the fields the service's schema gives that type, each with its unit. */
export function shapeCell(ctx: FormContext, i: number, partName: string, notes: HTMLElement): { control: HTMLSelectElement; content: HTMLElement } {
  const { state } = ctx;
  const partPath = `parts[${i}]`;
  const type = String(state.read(`${partPath}.shape.type`) ?? "");
  const offered = ctx.schema.kinds("parts[].shape", "type");
  const types = offered.length ? offered : ["rectangle"];
  const choices = types.map((t) => ({ value: t, label: shapeNames[t] ?? t }));
  const typeSelect = selectControl(ctx, `${partPath}.shape.type`, `${partName} shape`, choices, {
    onChosen: (next) => {
      const shape = (state.read(`${partPath}.shape`) ?? {}) as Item;
      state.replaceItem(`${partPath}.shape`, asShapeType(shape, next, state.units));
      ctx.rerender(`${partPath}.shape.type`);
    },
  });
  typeSelect.classList.add("shape-type");
  const fields = ctx.schema.fieldsOf("parts[].shape", "type", type);
  const length = unitLabel("length", state.units);
  const inputs = !fields
    ? [el("span", { className: "hint", text: `${type || "unknown"} shape: kept as in the job file` })]
    : fields.map((f) => {
        const path = `${partPath}.shape.${f.key}`;
        const name = fieldName(f.key);
        const accessible = `${partName} ${f.key}`;
        if (f.kind === "choice") {
          const control = selectControl(ctx, path, accessible, f.choices.map((c) => ({ value: c, label: valueName(f.key, c) })), { whenAbsent: String(f.default ?? f.choices[0] ?? "") });
          return inline(ctx, notes, path, name.label, `${partName} · ${name.label}`, control, false);
        }
        if (f.kind === "text") {
          const control = textControl(ctx, path, accessible, { maxLength: 40, removeWhenEmpty: !f.required, ...(name.hint ? { placeholder: name.hint.replace(/^e\.g\. /, "") } : {}) });
          control.classList.add(f.key === "designation" ? "designation" : "short-text");
          return inline(ctx, notes, path, name.label, `${partName} · ${name.label}`, control, false);
        }
        const control = numberControl(ctx, path, `${accessible} (${length})`, f.required ? {} : { placeholder: "—" });
        control.setAttribute("aria-label", `${accessible} (${length})`);
        return inline(ctx, notes, path, name.label, `${partName} · ${f.key}`, control, true);
      });
  return { control: typeSelect, content: el("div", { className: "stack shape-stack" }, [typeSelect, el("div", { className: "inline-fields" }, inputs)]) };
}

const modes = [
  { value: "xy", label: "at x, y" },
  { value: "top", label: "on top of" },
  { value: "bottom", label: "under" },
  { value: "left", label: "left of" },
  { value: "right", label: "right of" },
];

/** Where the part sits: by the lower-left corner of its box, or against another part (stacked or beside it). */
export function placementCell(ctx: FormContext, i: number, partName: string, notes: HTMLElement): { control: HTMLSelectElement; content: HTMLElement } {
  const { state } = ctx;
  const partPath = `parts[${i}]`;
  const part = (state.read(partPath) ?? {}) as Item;
  const place = part.place as Item | undefined;
  const mode = place ? String(place.side ?? "top") : "xy";
  const otherIds = () =>
    state
      .list("parts")
      .map((p) => String((p as Item)?.id ?? ""))
      .filter((id) => id && id !== state.read(`${partPath}.id`));
  const modeSelect = el("select", { className: "place-mode", attrs: { "aria-label": `${partName} placed`, "data-path": `${partPath}.place.side` } }, modes.map((m) => el("option", { text: m.label, attrs: { value: m.value } })));
  modeSelect.value = mode;
  modeSelect.addEventListener("change", () => {
    const next = modeSelect.value;
    const now = structuredClone((state.read(partPath) ?? {}) as Item);
    if (next === "xy") {
      const corner = cornerFromResult(ctx, String(now.id ?? ""));
      delete now.place;
      now.x = corner?.x ?? 0;
      now.y = corner?.y ?? 0;
    } else {
      const on = (now.place as Item | undefined)?.on ?? otherIds()[Math.max(0, i - 1)] ?? otherIds()[0] ?? "";
      delete now.x;
      delete now.y;
      now.place = { on, side: next, align: (now.place as Item | undefined)?.align ?? "centre" };
    }
    state.replaceItem(partPath, now);
    ctx.rerender(`${partPath}.place.side`);
  });
  const length = unitLabel("length", state.units);
  const fields =
    mode === "xy"
      ? (["x", "y"] as const).map((key) => {
          const control = numberControl(ctx, `${partPath}.${key}`, `${partName} ${key} (${length})`);
          control.setAttribute("aria-label", `${partName} ${key} (${length})`);
          return inline(ctx, notes, `${partPath}.${key}`, key, `${partName} · ${key}`, control, true);
        })
      : [
          inline(ctx, notes, `${partPath}.place.on`, "part", `${partName} · placed against`, selectControl(ctx, `${partPath}.place.on`, `${partName} placed against`, () => otherIds().map((id) => ({ value: id, label: id }))), false),
          inline(
            ctx,
            notes,
            `${partPath}.place.align`,
            "aligned",
            `${partName} · aligned`,
            selectControl(ctx, `${partPath}.place.align`, `${partName} alignment`, alignChoices(mode), { whenAbsent: "centre" }),
            false,
          ),
        ];
  const content = el("div", { className: "stack place-stack" }, [modeSelect, el("div", { className: "inline-fields" }, fields)]);
  return { control: modeSelect, content };
}

/** Align words that read right for the side: flush left/right when stacked, flush bottom/top when beside. */
const alignChoices = (side: string) => [
  { value: "centre", label: "centred" },
  { value: "start", label: side === "top" || side === "bottom" ? "flush left" : "flush bottom" },
  { value: "end", label: side === "top" || side === "bottom" ? "flush right" : "flush top" },
];

/** The part's lower-left corner as the last result placed it, so switching to x, y keeps it where it was. */
function cornerFromResult(ctx: FormContext, id: string): { x: number; y: number } | null {
  const result = ctx.result();
  if (!result || result.units !== ctx.state.units) return null;
  const part = result.section.parts.find((p) => p.id === id);
  if (!part || part.rects.length === 0) return null;
  const round = (v: number) => Number(v.toPrecision(9));
  return { x: round(Math.min(...part.rects.map((r) => r.x0))), y: round(Math.min(...part.rects.map((r) => r.y0))) };
}
