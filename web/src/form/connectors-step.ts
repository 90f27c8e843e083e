import { el, nextId } from "../dom.js";
import { addButton, field, rowButton, selectControl, textControl, type FormContext } from "./controls.js";
import { asConnectorKind, connectorKindNames } from "./connector-presets.js";
import { connectorFieldApplies, controllingFields, seldomFields } from "./field-names.js";
import { fold } from "./fold.js";
import { renameReferences, uniqueId } from "./references.js";
import { schemaFields } from "./schema-fields.js";
import { fieldGrid, step } from "./step.js";

type Item = Record<string, unknown>;

const fallbackKinds = ["rated", "glue"];
const shownFirst = new Set(["id", "kind", "label", "source"]);
const basisOf = (ctx: FormContext) => (ctx.state.read("basis") === "factored" ? "factored" : "allowable");

export function connectorsStep(ctx: FormContext, number: number): HTMLElement {
  const { state } = ctx;
  const connectors = state.list("connectors") as Item[];
  const kinds = ctx.schema.kinds("connectors[]", "kind");
  const offered = kinds.length ? kinds : fallbackKinds;
  const cards = connectors.map((connector, i) => connectorCard(ctx, connector, i, offered));
  const issues = el("div", { className: "row-issues" });
  const kindChoice = el(
    "select",
    { attrs: { "aria-label": "Kind of connector to add", id: "new-connector-kind" } },
    offered.map((k) => el("option", { text: connectorKindNames[k] ?? k, attrs: { value: k } })),
  );
  kindChoice.value = state.units === "us" ? "nail" : offered.includes("nail") ? "nail" : offered[0]!;
  const add = () => {
    const kind = kindChoice.value;
    const prefix = kind === "glue" ? "G1" : kind === "fillet-weld" ? "W1" : "C1";
    const item = asConnectorKind({ id: uniqueId(state.list("connectors"), prefix) }, kind, state.units, basisOf(ctx));
    const i = state.insert("connectors", item);
    // The first connector of a job is the one its joints use until told otherwise.
    const current = state.read("fastening.default.connector");
    if (typeof current !== "string" || !state.list("connectors").some((c) => (c as Item).id === current)) state.set("fastening.default.connector", item.id);
    ctx.rerender(`connectors[${i}].kind`);
  };
  const box = step(number, "Connectors", "Each connector as a builder would order it: nails, screws, bolts, welds, a rated product or a glue line. The joints in step 5 say where each one goes.", [
    ...cards,
    issues,
    el("div", { className: "add-with-choice" }, [el("label", { text: "New connector:", attrs: { for: "new-connector-kind" } }), kindChoice, addButton("Add connector", add)]),
  ]);
  ctx.registry.register({ path: "connectors", label: "Connectors", marker: box, host: issues });
  return box;
}

function connectorCard(ctx: FormContext, connector: Item, i: number, offered: string[]): HTMLElement {
  const { state } = ctx;
  const base = `connectors[${i}]`;
  const at = (key: string) => `${base}.${key}`;
  const name = `Connector ${i + 1}`;
  const kind = String(connector.kind ?? "");
  const fields = ctx.schema.fieldsOf("connectors[]", "kind", kind);

  const idInput = textControl(ctx, at("id"), "id", { maxLength: 40 });
  renameReferences(ctx, idInput, "connectors", (oldId, newId) => {
    if (state.read("fastening.default.connector") === oldId) state.set("fastening.default.connector", newId);
    state.list("fastening.joints").forEach((joint, k) => {
      if ((joint as Item).connector === oldId) state.set(`fastening.joints[${k}].connector`, newId);
    });
  });
  const choices = offered.map((k) => ({ value: k, label: connectorKindNames[k] ?? k }));
  if (!offered.includes(kind)) choices.unshift({ value: kind, label: `${kind || "no kind"} (values kept as in the job file)` });
  const kindSelect = selectControl(ctx, at("kind"), "kind", choices, {
    onChosen: (next) => {
      state.replaceItem(base, asConnectorKind(connector, next, state.units, basisOf(ctx)));
      ctx.rerender(at("kind"));
    },
  });

  const owner = name;
  const redraw = (key: string) => {
    if (!controllingFields.includes(key)) return;
    // Fields of the other standard (or of an intermittent weld) no longer apply: leave them out.
    const now = state.read(base) as Item;
    for (const f of fields ?? []) if (now[f.key] !== undefined && !connectorFieldApplies(kind, f.key, { ...now, [f.key]: undefined })) state.set(at(f.key), undefined);
    ctx.rerender(at(key));
  };
  // Flags and groups take a whole line: after the fields that sit side by side.
  const wholeLine = (f: { kind: string }) => f.kind === "boolean" || f.kind === "group";
  const rest = (fields ?? [])
    .filter((f) => !shownFirst.has(f.key) && connectorFieldApplies(kind, f.key, connector))
    .sort((a, b) => Number(wholeLine(a)) - Number(wholeLine(b)));
  const main = schemaFields(ctx, base, rest.filter((f) => !seldomFields.has(f.key)), { owner, scope: kind, onChanged: redraw });
  const seldom = schemaFields(ctx, base, rest.filter((f) => seldomFields.has(f.key)), { owner, scope: kind, onChanged: redraw });
  const given = rest.filter((f) => seldomFields.has(f.key) && connector[f.key] !== undefined).length;

  const issues = el("div", { className: "row-issues" });
  const legendId = nextId("connector");
  const card = el("fieldset", { className: `card connector-card kind-${kind}`, attrs: { "aria-labelledby": legendId, "data-path": base } }, [
    el("div", { className: "card-head" }, [
      el("h3", { attrs: { id: legendId } }, [name, el("span", { className: "card-kind", text: ` · ${connectorKindNames[kind] ?? kind}` })]),
      el("span", { className: "card-actions" }, [
        rowButton("Copy", `Copy ${name}`, () => {
          const copy = structuredClone(state.read(base)) as Item;
          copy.id = uniqueId(state.list("connectors"), String(copy.id ?? "C"));
          state.insert("connectors", copy, i + 1);
          ctx.rerender(`connectors[${i + 1}].id`);
        }),
        rowButton("×", `Remove ${name}`, () => {
          state.remove("connectors", i);
          ctx.rerender(state.list("connectors").length ? `connectors[${Math.max(0, i - 1)}].kind` : undefined);
        }, "remove"),
      ]),
    ]),
    fieldGrid([
      field(ctx, at("kind"), "Kind", kindSelect, { wide: true, owner }),
      field(ctx, at("id"), "Id", idInput, { owner, hint: "Joints refer to it by this." }),
      ...(fields ? [] : [otherKindValues(connector)]),
      ...main,
      field(ctx, at("label"), "Label", textControl(ctx, at("label"), "label", { maxLength: 80, removeWhenEmpty: kind !== "rated" && kind !== "glue" }), { wide: true, owner }),
      field(ctx, at("source"), "Source", textControl(ctx, at("source"), "source", { maxLength: 160 }), { wide: true, owner, hint: "Product standard, evaluation report or supplier." }),
    ]),
    seldom.length ? fold(`${base}.seldom`, `Service conditions and adjustments${given ? ` (${given} given)` : ""}`, [fieldGrid(seldom)]) : null,
    issues,
  ]);
  ctx.registry.register({ path: base, label: name, marker: card, host: issues, prefix: name });
  return card;
}

/** A kind this version of the service does not describe: its values shown as they stand, untouched, so nothing is lost. */
function otherKindValues(connector: Item): HTMLElement {
  const shown = Object.entries(connector).filter(([key]) => !shownFirst.has(key));
  return el("div", { className: "field wide other-kind" }, [
    el("span", { className: "label", text: "Values kept from the job file" }),
    el("ul", {}, shown.map(([key, value]) => el("li", { text: `${key}: ${typeof value === "object" ? JSON.stringify(value) : String(value)}` }))),
  ]);
}
