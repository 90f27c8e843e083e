import { formatNumber } from "../../../core/units/format.js";
import { unitLabel } from "../../../core/units/quantity.js";
import { el } from "../dom.js";
import type { SchemaField } from "../job-schema.js";
import { checkboxControl, field, numberControl, selectControl, textControl, type FormContext } from "./controls.js";
import { fieldName, valueName } from "./field-names.js";
import { fieldGrid } from "./step.js";

export interface SchemaFieldOptions {
  /** Who the field belongs to, for its accessible name and messages: "Connector 2". */
  owner: string;
  /** Kind or family the names are looked up under first: "nail", "material". */
  scope?: string;
  /** Called after a choice or a flag changed, with its key (some decide which other fields apply). */
  onChanged?: (key: string) => void;
  wide?: boolean;
}

const placeholderOf = (f: SchemaField) => (typeof f.default === "number" ? formatNumber(f.default) : f.required ? "" : "—");

/**
 * One field of the job from its schema: a number with the unit of its quantity kind in the job's
 * system, a choice in words, a flag, text, or a small group of its own fields.
 */
export function schemaField(ctx: FormContext, path: string, f: SchemaField, options: SchemaFieldOptions): HTMLElement | null {
  const name = fieldName(f.key, options.scope);
  const common = { owner: options.owner, ...(name.hint ? { hint: name.hint } : {}), ...(options.wide ? { wide: true } : {}) };
  switch (f.kind) {
    case "number":
    case "integer": {
      const unit = f.quantity ? unitLabel(f.quantity, ctx.state.units) : name.unit;
      const control = numberControl(ctx, path, name.label, { placeholder: placeholderOf(f), integer: f.kind === "integer" });
      return field(ctx, path, name.label, control, { ...common, ...(unit ? { unit } : {}) });
    }
    case "choice": {
      const optional = !f.required && f.default === undefined;
      const choices = [...(optional ? [{ value: "", label: "— not given —" }] : []), ...f.choices.map((v) => ({ value: v, label: valueName(f.key, v, options.scope) }))];
      const control = selectControl(ctx, path, name.label, choices, {
        whenAbsent: f.default !== undefined ? String(f.default) : "",
        onChosen: (value) => {
          ctx.state.set(path, value === "" ? undefined : f.numericChoices ? Number(value) : value);
          options.onChanged?.(f.key);
        },
      });
      return field(ctx, path, name.label, control, common);
    }
    case "boolean": {
      const control = checkboxControl(ctx, path, name.label, f.default === true, { removeWhenOff: f.default === undefined });
      control.addEventListener("change", () => options.onChanged?.(f.key));
      return field(ctx, path, name.label, control, { ...common, wide: true });
    }
    case "text":
      return field(ctx, path, name.label, textControl(ctx, path, name.label, { maxLength: 80, removeWhenEmpty: !f.required }), common);
    case "group":
      return groupField(ctx, path, f, options);
    default:
      return null;
  }
}

/** An optional group of fields (a fastener's group action): a switch to give it, then its own fields. */
function groupField(ctx: FormContext, path: string, f: SchemaField, options: SchemaFieldOptions): HTMLElement {
  const name = fieldName(f.key, options.scope);
  const present = typeof ctx.state.read(path) === "object";
  const toggle = el("input", { attrs: { type: "checkbox", "data-path": path, "aria-label": `${options.owner} ${name.label}` } });
  toggle.checked = present;
  toggle.addEventListener("change", () => {
    ctx.state.replaceItem(path, toggle.checked ? {} : undefined);
    ctx.rerender(toggle.checked ? `${path}.${f.fields[0]?.key ?? ""}` : path);
  });
  const inner = present
    ? fieldGrid(
        f.fields
          .map((sub) => schemaField(ctx, `${path}.${sub.key}`, sub, { ...options, scope: f.key }))
          .filter((x): x is HTMLElement => x !== null),
        "nested",
      )
    : null;
  const box = el("div", { className: "field wide group-field" }, [el("label", { className: "group-toggle" }, [toggle, el("span", { text: name.label })]), inner]);
  ctx.registry.register({ path, label: `${options.owner} · ${name.label}`, control: toggle, marker: box, host: box });
  return box;
}

/** Fields for every schema field that `applies` lets through, in schema order. */
export function schemaFields(ctx: FormContext, basePath: string, fields: SchemaField[], options: SchemaFieldOptions, applies: (f: SchemaField) => boolean = () => true): HTMLElement[] {
  return fields.filter(applies).flatMap((f) => schemaField(ctx, `${basePath}.${f.key}`, f, options) ?? []);
}
