import type { DesignResult } from "../../../core/schema/result.js";
import { el, nextId } from "../dom.js";
import type { JobSchema } from "../job-schema.js";
import type { JobState } from "../job-state.js";
import { numberFromText, type FieldRegistry } from "./field-registry.js";

/** What every control needs: the job it edits and the registry that places messages. */
export interface FormContext {
  state: JobState;
  registry: FieldRegistry;
  /** What the service accepts: which load kinds, supports, shapes and settings to offer. */
  schema: JobSchema;
  /** Re-reads the lists that selects refer to (material and connector ids). */
  references: (() => void)[];
  /** Re-renders the form after a change of structure, then focuses `focusPath` if given. */
  rerender: (focusPath?: string) => void;
  /** The last result the service gave for this job (its joints, schedules), or null. */
  result: () => DesignResult | null;
}

const display = (value: unknown) => (value === undefined || value === null ? "" : String(value));

/** A number typed as text (so nothing typed is ever thrown away); empty removes the key. */
export function numberControl(ctx: FormContext, path: string, name: string, options: { placeholder?: string; integer?: boolean } = {}): HTMLInputElement {
  const input = el("input", {
    className: "number",
    attrs: { type: "text", inputmode: options.integer ? "numeric" : "decimal", autocomplete: "off", spellcheck: "false", "aria-label": name, placeholder: options.placeholder, "data-path": path },
  });
  input.value = display(ctx.state.read(path));
  input.addEventListener("input", () => ctx.state.set(path, numberFromText(input.value)));
  return input;
}

export function textControl(ctx: FormContext, path: string, name: string, options: { maxLength?: number; removeWhenEmpty?: boolean; type?: "text" | "date"; placeholder?: string } = {}): HTMLInputElement {
  const input = el("input", {
    attrs: { type: options.type ?? "text", "aria-label": name, maxlength: options.maxLength, placeholder: options.placeholder, "data-path": path, autocomplete: "off" },
  });
  input.value = display(ctx.state.read(path));
  input.addEventListener("input", () => ctx.state.set(path, options.removeWhenEmpty && input.value === "" ? undefined : input.value));
  return input;
}

export interface Choice {
  value: string;
  label: string;
}

/** A select; a value the document holds that is not among the choices stays selectable, marked, so it is not lost. */
export function selectControl(
  ctx: FormContext,
  path: string,
  name: string,
  choices: Choice[] | (() => Choice[]),
  options: { onChosen?: (value: string) => void; whenAbsent?: string } = {},
): HTMLSelectElement {
  const select = el("select", { attrs: { "aria-label": name, "data-path": path } });
  const { onChosen, whenAbsent } = options;
  const fill = () => {
    const value = ctx.state.read(path);
    const current = value === undefined && whenAbsent !== undefined ? whenAbsent : display(value);
    const list = typeof choices === "function" ? choices() : choices;
    const items = list.map((c) => el("option", { text: c.label, attrs: { value: c.value } }));
    if (!list.some((c) => c.value === current)) items.unshift(el("option", { text: current ? `${current} (not defined)` : "— choose —", attrs: { value: current } }));
    select.replaceChildren(...items);
    select.value = current;
  };
  fill();
  if (typeof choices === "function") ctx.references.push(fill);
  select.addEventListener("change", () => {
    if (onChosen) onChosen(select.value);
    else ctx.state.set(path, select.value);
  });
  return select;
}

/** A yes/no field; with `removeWhenOff` an optional flag is left out of the document rather than written false. */
export function checkboxControl(ctx: FormContext, path: string, name: string, whenAbsent: boolean, options: { removeWhenOff?: boolean } = {}): HTMLInputElement {
  const input = el("input", { attrs: { type: "checkbox", "aria-label": name, "data-path": path } });
  const value = ctx.state.read(path);
  input.checked = typeof value === "boolean" ? value : whenAbsent;
  input.addEventListener("change", () => ctx.state.set(path, options.removeWhenOff && !input.checked ? undefined : input.checked));
  return input;
}

/** A labelled field with its unit beside the input and room for messages below. */
export function field(
  ctx: FormContext,
  path: string,
  label: string,
  control: HTMLInputElement | HTMLSelectElement,
  options: { unit?: string; hint?: string; wide?: boolean; owner?: string } = {},
): HTMLElement {
  const id = nextId("field");
  control.id = id;
  const unitText = options.unit ? ` (${options.unit})` : "";
  const fullLabel = options.owner ? `${options.owner} ${label}` : label;
  control.setAttribute("aria-label", `${fullLabel}${unitText}`);
  const hint = options.hint ? el("span", { className: "hint", text: options.hint, attrs: { id: `${id}-hint` } }) : null;
  if (hint) control.setAttribute("aria-describedby", hint.id);
  const isCheckbox = control instanceof HTMLInputElement && control.type === "checkbox";
  const box = el("div", { className: `field${options.wide ? " wide" : ""}${isCheckbox ? " check" : ""}` }, [
    isCheckbox
      ? el("label", { attrs: { for: id } }, [control, el("span", { text: label })])
      : el("label", { text: label, attrs: { for: id } }),
    isCheckbox ? null : el("span", { className: "with-unit" }, [control, options.unit ? el("span", { className: "unit", text: options.unit, attrs: { "aria-hidden": "true" } }) : null]),
    hint,
  ]);
  ctx.registry.register({ path, label: options.owner ? `${options.owner} · ${label}` : label, control, marker: box, host: box, numeric: control.classList.contains("number") });
  return box;
}

export interface Column {
  header: string;
  unit?: string;
  className?: string;
  /** The cell's control for row i, with its path; null leaves the cell empty. `notes` is the row's message line, for extra fields in the cell. */
  cell: (i: number, notes: HTMLElement) => { path: string; control: HTMLElement; name: string; content?: HTMLElement } | { spanning: HTMLElement; columns: number } | null;
}

/** A table of records (materials, parts, loads): one row per item, units in the headers, messages under the table. */
export function recordTable(
  ctx: FormContext,
  options: {
    caption: string;
    listPath: string;
    itemName: (i: number) => string;
    columns: Column[];
    actions: (i: number) => HTMLElement[];
    count: number;
    /** More of the row's fields on a full-width line under it (folded extras, helpers). */
    extra?: (i: number, notes: HTMLElement) => HTMLElement | null;
  },
): { table: HTMLElement; issues: HTMLElement } {
  const issues = el("div", { className: "row-issues", attrs: { "aria-live": "polite" } });
  const head = el("tr", {}, [
    ...options.columns.map((c) => el("th", { className: c.className, attrs: { scope: "col" } }, [c.header, c.unit ? el("span", { className: "unit", text: c.unit }) : null])),
    el("th", { className: "actions", attrs: { scope: "col" } }, [el("span", { className: "visually-hidden", text: "Row actions" })]),
  ]);
  const rows: HTMLElement[] = [];
  for (let i = 0; i < options.count; i++) {
    const rowPath = `${options.listPath}[${i}]`;
    const row = el("tr", { attrs: { "data-path": rowPath } });
    // Messages for the row's cells go in a full-width line right under it, where they have room to be read.
    const notes = el("td", { attrs: { colspan: options.columns.length + 1 } });
    let covered = 0;
    for (const column of options.columns) {
      if (covered > 0) {
        covered--;
        continue;
      }
      const spec = column.cell(i, notes);
      const td = el("td", { className: column.className });
      if (spec && "spanning" in spec) {
        td.colSpan = spec.columns;
        td.className = "spanning";
        td.append(spec.spanning);
        covered = spec.columns - 1;
      } else if (spec) {
        spec.control.setAttribute("aria-label", `${options.itemName(i)} ${spec.name}${column.unit ? ` (${column.unit})` : ""}`);
        td.append(spec.content ?? spec.control);
        ctx.registry.register({
          path: spec.path,
          label: `${options.itemName(i)} · ${spec.name}`,
          control: spec.control,
          marker: td,
          host: notes,
          prefix: spec.name,
          numeric: spec.control.classList.contains("number"),
        });
      }
      row.append(td);
    }
    row.append(el("td", { className: "actions" }, options.actions(i)));
    ctx.registry.register({ path: rowPath, label: options.itemName(i), marker: row, host: notes, prefix: options.itemName(i) });
    const extra = options.extra?.(i, notes);
    rows.push(row);
    if (extra) rows.push(el("tr", { className: "row-extra" }, [el("td", { attrs: { colspan: options.columns.length + 1 } }, [extra])]));
    rows.push(el("tr", { className: "row-notes" }, [notes]));
  }
  const table = el("div", { className: "table-scroll" }, [
    el("table", { className: "records" }, [el("caption", { className: "visually-hidden", text: options.caption }), el("thead", {}, [head]), el("tbody", {}, rows)]),
  ]);
  return { table, issues };
}

export function rowButton(text: string, name: string, onClick: () => void, className = ""): HTMLButtonElement {
  return el("button", { className: `row-button ${className}`.trim(), text, attrs: { type: "button", "aria-label": name, title: name }, on: { click: onClick } });
}

export function addButton(text: string, onClick: () => void): HTMLButtonElement {
  return el("button", { className: "add-button", text, attrs: { type: "button" }, on: { click: onClick } });
}
