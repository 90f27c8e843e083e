import { el } from "../dom.js";
import { field, numberControl, type FormContext } from "./controls.js";
import { fieldGrid, step } from "./step.js";

const models = [
  { value: "rigid", text: "Rigid: q = V·Q/I", hint: "The connectors do not slip; the usual assumption." },
  { value: "slip-aware", text: "Slip-aware: γ-method (EN 1995-1-1 Annex B)", hint: "Timber flanges nailed or screwed to a web; the design uses the connectors' slip." },
] as const;

/**
 * How the parts act together: rigidly (q = V·Q/I) or with the connectors' slip (EN 1995-1-1 Annex B),
 * and the long-term factors for the final deflection. The results show both models side by side.
 */
export function compositeStep(ctx: FormContext, number: number): HTMLElement {
  const { state, schema } = ctx;
  // A service that does not know the setting is not offered it.
  if (schema.known && !schema.has("compositeAction")) return el("div", { attrs: { hidden: true } });
  const model = state.read("compositeAction.model") === "slip-aware" ? "slip-aware" : "rigid";
  const issues = el("div", { className: "row-issues" });
  const radios = models.map((m) => {
    const input = el("input", { attrs: { type: "radio", name: "composite-model", value: m.value, "data-path": "compositeAction.model", "aria-describedby": `composite-hint-${m.value}` } });
    input.checked = model === m.value;
    input.addEventListener("change", () => {
      if (!input.checked) return;
      state.set("compositeAction.model", m.value);
    });
    return el("label", { className: "mode-choice composite-choice" }, [input, el("span", {}, [el("span", { text: m.text }), el("span", { className: "hint", text: m.hint, attrs: { id: `composite-hint-${m.value}` } })])]);
  });
  const modelBox = el("fieldset", { className: "mode-choices" }, [el("legend", { className: "visually-hidden", text: "Composite action model" }), ...radios]);
  ctx.registry.register({ path: "compositeAction.model", label: "Composite action model", control: radios[0]!.querySelector("input")!, marker: modelBox, host: issues });

  const box = step(
    number,
    "Composite action",
    "Whether the connectors are taken as rigid or as slipping under load. The results show both models side by side wherever the section and the connectors allow: the stiffness, the deflection and the connectors each one needs.",
    [
      modelBox,
      el("p", {
        className: "hint",
        text: "Slip-aware needs each flange connector's slip modulus: EN 1995-1-1 nails, screws and bolts give K_ser and K_u from their standard; a rated connector takes them in its less-used fields (slip modulus K_ser and K_u).",
      }),
      longTermBlock(ctx),
      issues,
    ],
  );
  ctx.registry.register({ path: "compositeAction", label: "Composite action", marker: box, host: issues });
  return box;
}

/** ψ2 and k_def for the final deflection with slip: given together or not at all. */
function longTermBlock(ctx: FormContext): HTMLElement {
  const { state } = ctx;
  const path = "compositeAction.longTerm";
  const present = typeof state.read(path) === "object" && state.read(path) !== null;
  const toggle = el("input", { attrs: { type: "checkbox", "data-path": path, "aria-label": "Work out the final (long-term) deflection" } });
  toggle.checked = present;
  toggle.addEventListener("change", () => {
    state.replaceItem(path, toggle.checked ? {} : undefined);
    ctx.rerender(toggle.checked ? `${path}.psi2` : path);
  });
  const inner = present
    ? fieldGrid(
        [
          field(ctx, `${path}.psi2`, "ψ2 of the variable actions", numberControl(ctx, `${path}.psi2`, "ψ2", { placeholder: "e.g. 0.3" }), { hint: "Quasi-permanent factor, EN 1990 Table A1.1." }),
          field(ctx, `${path}.kdef`, "k_def of the timber", numberControl(ctx, `${path}.kdef`, "k_def", { placeholder: "e.g. 0.6" }), { hint: "EN 1995-1-1 Table 3.2, by material and service class." }),
        ],
        "nested",
      )
    : null;
  const box = el("div", { className: "field wide group-field" }, [el("label", { className: "group-toggle" }, [toggle, el("span", { text: "Work out the final (long-term) deflection with slip" })]), inner]);
  ctx.registry.register({ path, label: "Composite action · long term", control: toggle, marker: box, host: box });
  return box;
}
