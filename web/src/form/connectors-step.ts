import { unitLabel } from "../../../core/units/quantity.js";
import { el, nextId } from "../dom.js";
import { addButton, field, numberControl, rowButton, selectControl, textControl, type FormContext } from "./controls.js";
import { renameReferences, uniqueId } from "./references.js";
import { fieldGrid, step } from "./step.js";

type Item = Record<string, unknown>;

const kindChoices = [
  { value: "rated", label: "rated connector (nail, screw, bolt)" },
  { value: "glue", label: "glue line" },
];

/** The same connector as the other kind: id, label and source kept; the kind's own values are asked for again. */
function asKind(connector: Item, kind: string): Item {
  return { id: connector.id ?? "", kind, label: connector.label ?? "", source: connector.source ?? "" };
}

export function connectorsStep(ctx: FormContext, number: number): HTMLElement {
  const { state } = ctx;
  const u = state.units;
  const connectors = state.list("connectors") as Item[];
  const cards = connectors.map((connector, i) => connectorCard(ctx, connector, i, connectors.length));
  const issues = el("div", { className: "row-issues" });
  const add = (item: Item) => {
    const i = state.insert("connectors", item);
    ctx.rerender(`connectors[${i}].label`);
  };
  const box = step(number, "Connectors and bond lines", `Resistances and strengths on the job's basis, as rated by their source (${unitLabel("connectorForce", u)} per connector).`, [
    ...cards,
    issues,
    el("div", { className: "button-row" }, [
      addButton("Add rated connector", () => add({ id: uniqueId(state.list("connectors"), "C1"), kind: "rated", label: "", source: "" })),
      addButton("Add glue line", () => add({ id: uniqueId(state.list("connectors"), "G1"), kind: "glue", label: "", source: "" })),
    ]),
  ]);
  ctx.registry.register({ path: "connectors", label: "Connectors", marker: box, host: issues });
  return box;
}

function connectorCard(ctx: FormContext, connector: Item, i: number, count: number): HTMLElement {
  const { state } = ctx;
  const u = state.units;
  const at = (key: string) => `connectors[${i}].${key}`;
  const length = unitLabel("length", u);
  const name = `Connector ${i + 1}`;
  const number = (key: string, label: string, unit: string, placeholder?: string) =>
    field(ctx, at(key), label, numberControl(ctx, at(key), label, placeholder ? { placeholder } : {}), { unit, owner: name });
  const idInput = textControl(ctx, at("id"), "id", { maxLength: 40 });
  renameReferences(ctx, idInput, "connectors", (oldId, newId) => {
    if (state.read("fastening.default.connector") === oldId) state.set("fastening.default.connector", newId);
    state.list("fastening.joints").forEach((joint, k) => {
      if ((joint as Item).connector === oldId) state.set(`fastening.joints[${k}].connector`, newId);
    });
  });
  const kind = String(connector.kind ?? "");
  const isKnown = kindChoices.some((c) => c.value === kind);
  const choices = isKnown ? kindChoices : [{ value: kind, label: `${kind || "no kind"} (values kept as in the job file)` }, ...kindChoices];
  const kindSelect = selectControl(ctx, at("kind"), "kind", choices, {
    onChosen: (kind) => {
      state.replaceItem(`connectors[${i}]`, asKind(connector, kind));
      ctx.rerender(at("kind"));
    },
  });
  const kindFields = !isKnown
    ? [otherKindValues(connector)]
    : kind === "glue"
      ? [number("shearStrength", "Bond-line shear strength", unitLabel("stress", u))]
      : [
          number("resistance", "Resistance per connector", unitLabel("connectorForce", u)),
          number("minSpacing", "Minimum spacing", length),
          number("maxSpacing", "Maximum spacing", length, "none"),
          number("endDistance", "End distance", length, "0"),
        ];
  const issues = el("div", { className: "row-issues" });
  const legendId = nextId("connector");
  const card = el("fieldset", { className: "card", attrs: { "aria-labelledby": legendId, "data-path": `connectors[${i}]` } }, [
    el("div", { className: "card-head" }, [
      el("h3", { text: name, attrs: { id: legendId } }),
      rowButton("×", `Remove ${name}`, () => {
        state.remove("connectors", i);
        ctx.rerender(count > 1 ? `connectors[${Math.max(0, i - 1)}].label` : undefined);
      }, "remove"),
    ]),
    fieldGrid([
      field(ctx, at("kind"), "Kind", kindSelect, { wide: true, owner: name }),
      field(ctx, at("id"), "Id", idInput, { owner: name }),
      field(ctx, at("label"), "Label", textControl(ctx, at("label"), "label", { maxLength: 80 }), { wide: true, owner: name }),
      ...kindFields,
      field(ctx, at("source"), "Source of the rating", textControl(ctx, at("source"), "source", { maxLength: 160 }), { wide: true, owner: name }),
    ]),
    issues,
  ]);
  ctx.registry.register({ path: `connectors[${i}]`, label: name, marker: card, host: issues, prefix: name });
  return card;
}

/** A kind this page has no fields for yet: its values shown as they stand, untouched, so nothing is lost. */
function otherKindValues(connector: Item): HTMLElement {
  const shown = Object.entries(connector).filter(([key]) => !["id", "kind", "label", "source"].includes(key));
  return el("div", { className: "field wide other-kind" }, [
    el("span", { className: "label", text: "Values (edit these in the job file for now)" }),
    el("ul", {}, shown.map(([key, value]) => el("li", { text: `${key}: ${typeof value === "object" ? JSON.stringify(value) : String(value)}` }))),
  ]);
}
