import { el } from "../dom.js";
import { field, numberControl, selectControl, type FormContext } from "./controls.js";
import { fieldGrid, step } from "./step.js";

type Item = Record<string, unknown>;

const headSides = [
  { value: "auto", label: "the thinner part (automatic)" },
  { value: "held", label: "the held part" },
  { value: "other", label: "the part on the other side" },
];

export function fasteningStep(ctx: FormContext, number: number): HTMLElement {
  const { state } = ctx;
  const connectorChoices = () =>
    state.list("connectors").map((c) => {
      const { id, label } = c as Item;
      return { value: String(id ?? ""), label: label ? `${String(id)} · ${String(label)}` : String(id ?? "") };
    });
  const overrides = state.list("fastening.joints") as Item[];
  const issues = el("div", { className: "row-issues" });
  const overrideList = overrides.length
    ? el("div", { className: "overrides" }, [
        el("p", { text: "This job fastens some joints its own way (edit these in the job file for now):" }),
        el(
          "ul",
          {},
          overrides.map((joint, k) => {
            const held = Array.isArray(joint.held) ? joint.held.join(" + ") : "?";
            const item = el("li", { text: `parts held: ${held} → ${String(joint.connector ?? "?")}, ${String(joint.rows ?? 1)} per row` });
            ctx.registry.register({ path: `fastening.joints[${k}]`, label: `Joint fastening ${k + 1}`, marker: item, host: issues, prefix: `Joint fastening ${k + 1}` });
            return item;
          }),
        ),
      ])
    : null;
  const box = step(number, "Fastening", "The connector used at every joint plane, and how many sit side by side in each row on each contact line.", [
    fieldGrid([
      field(ctx, "fastening.default.connector", "Connector at every joint", selectControl(ctx, "fastening.default.connector", "connector", connectorChoices), { wide: true }),
      field(ctx, "fastening.default.rows", "Connectors per row", numberControl(ctx, "fastening.default.rows", "rows", { integer: true, placeholder: "1" }), { unit: "per row" }),
      field(
        ctx,
        "fastening.default.headSide",
        "Driven from",
        selectControl(ctx, "fastening.default.headSide", "driven from", headSides, { whenAbsent: "auto" }),
        { wide: true, hint: "The part the connector head sits in, for resistance models that need it." },
      ),
    ]),
    overrideList,
    issues,
  ]);
  ctx.registry.register({ path: "fastening", label: "Fastening", marker: box, host: issues });
  return box;
}
