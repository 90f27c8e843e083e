import { jointName, type NamedPart } from "../results/joint-names.js";
import type { JointResult } from "../../../core/schema/result.js";
import { el } from "../dom.js";
import { addButton, field, numberControl, rowButton, selectControl, type FormContext } from "./controls.js";
import { fieldGrid, step } from "./step.js";

type Item = Record<string, unknown>;

const headSides = [
  { value: "auto", label: "the thinner part (automatic)" },
  { value: "held", label: "the held part" },
  { value: "other", label: "the part on the other side" },
];

const sameSet = (a: unknown, b: string[]) => Array.isArray(a) && a.length === b.length && b.every((id) => a.includes(id));

/** The fastening entry of the job for a held group, if the job gives that joint its own. */
export function ownFasteningIndex(ctx: FormContext, held: string[]): number {
  return ctx.state.list("fastening.joints").findIndex((j) => sameSet((j as Item).held, held));
}

export const connectorChoices = (ctx: FormContext) => () =>
  ctx.state.list("connectors").map((c) => {
    const { id, label, kind } = c as Item;
    const name = typeof label === "string" && label ? label : String(kind ?? "");
    return { value: String(id ?? ""), label: name ? `${String(id)} · ${name}` : String(id ?? "") };
  });

/**
 * Joints: the connector used at every joint plane, the joints the last result found (each may take
 * its own connector, rows and driving side), and the job's own fastening of held groups of parts.
 */
export function jointsStep(ctx: FormContext, number: number): HTMLElement {
  const { state } = ctx;
  followDefaultFastening(ctx);
  const issues = el("div", { className: "row-issues" });
  const found = ctx.result()?.joints ?? [];
  const overrides = state.list("fastening.joints") as Item[];
  const matched = new Set<number>();
  const jointRows = found.map((joint) => {
    const k = ownFasteningIndex(ctx, joint.held);
    if (k >= 0) matched.add(k);
    return jointRow(ctx, joint, k);
  });
  const unmatched = overrides.map((o, k) => (matched.has(k) ? null : heldGroupCard(ctx, o, k))).filter((x): x is HTMLElement => x !== null);

  const box = step(number, "Joints", "Every face where parts touch is a joint plane; each joint holds the smaller side. Give the connector used at every joint, then any joint its own.", [
    el("h3", { text: "At every joint" }),
    fieldGrid([
      field(ctx, "fastening.default.connector", "Connector used at every joint", selectControl(ctx, "fastening.default.connector", "connector", connectorChoices(ctx)), { wide: true }),
      field(ctx, "fastening.default.rows", "Side by side in a row", numberControl(ctx, "fastening.default.rows", "rows", { integer: true, placeholder: "1" }), { unit: "per row", hint: "A row is one position along the member; this many connectors sit side by side across each contact line there, and rows repeat at the zone's spacing. For a weld: fillets per line." }),
      field(ctx, "fastening.default.headSide", "Driven from", selectControl(ctx, "fastening.default.headSide", "driven from", headSides, { whenAbsent: "auto" }), {
        wide: true,
        hint: "The part the head sits in, for resistance models that need it.",
      }),
    ]),
    el("h3", { text: found.length ? `Joints found (${found.length})` : "Joints found" }),
    found.length
      ? el("ul", { className: "joint-list" }, jointRows)
      : el("p", { className: "hint", text: "The joints appear here once the section has been computed: enter materials, parts and a connector." }),
    unmatched.length ? el("h3", { text: "Fastened by held group (not among the joints found)" }) : null,
    ...unmatched,
    issues,
    el("div", { className: "button-row" }, [
      addButton("Fasten a group of parts its own way", () => {
        const k = state.insert("fastening.joints", { held: [], connector: state.read("fastening.default.connector") ?? "", rows: 1 });
        ctx.rerender(`fastening.joints[${k}].connector`);
      }),
    ]),
  ]);
  ctx.registry.register({ path: "fastening", label: "Joints", marker: box, host: issues });
  ctx.registry.register({ path: "fastening.joints", label: "Joints", marker: box, host: issues });
  return box;
}

function describeLines(joint: JointResult, lengthUnit: string): string {
  if (!joint.found && joint.lines.length === 0) return "no contact found";
  const first = joint.lines[0];
  const orientation = first?.orientation ?? "";
  return `${joint.lines.length} ${orientation} contact line${joint.lines.length === 1 ? "" : "s"}, t = ${Number(joint.contactWidth.toPrecision(4))} ${lengthUnit}`;
}

function jointRow(ctx: FormContext, joint: JointResult, k: number): HTMLElement {
  const { state } = ctx;
  const unit = ctx.result()?.unitLabels.length ?? "";
  const own = k >= 0;
  const name = `Joint ${joint.id}`;
  const toggle = el("input", { attrs: { type: "checkbox", "aria-label": `${name}: its own fastening` } });
  toggle.checked = own;
  toggle.addEventListener("change", () => {
    if (toggle.checked) {
      const fallback = state.read("fastening.default") as Item | undefined;
      const i = state.insert("fastening.joints", { held: [...joint.held], connector: fallback?.connector ?? "", rows: fallback?.rows ?? 1 });
      ctx.rerender(`fastening.joints[${i}].connector`);
    } else {
      state.remove("fastening.joints", k);
      ctx.rerender();
    }
  });
  const at = (key: string) => `fastening.joints[${k}].${key}`;
  const notes = el("div", { className: "row-issues" });
  const fields = own
    ? fieldGrid([
        field(ctx, at("connector"), "Connector", selectControl(ctx, at("connector"), "connector", connectorChoices(ctx)), { wide: true, owner: name }),
        field(ctx, at("rows"), "Side by side in a row", numberControl(ctx, at("rows"), "rows", { integer: true, placeholder: "1" }), { unit: "per row", owner: name }),
        field(ctx, at("headSide"), "Driven from", selectControl(ctx, at("headSide"), "driven from", headSides, { whenAbsent: "auto" }), { wide: true, owner: name }),
      ])
    : null;
  const item = el("li", { className: `joint-item${own ? " own" : ""}`, attrs: { "data-joint": joint.id } }, [
    el("div", { className: "joint-head" }, [
      el("span", { className: "joint-name" }, [
        el("strong", { text: name }),
        el("span", { className: "joint-words", text: `: ${jointName(joint, state.list("parts") as NamedPart[])}` }),
        el("span", { className: "sub", text: ` · holds ${joint.held.join(", ")} · ${describeLines(joint, unit)}` }),
        own ? null : el("span", { className: "joint-default", text: defaultFasteningText(ctx, joint), attrs: { "data-connector": joint.connector, "data-connector-label": joint.connectorLabel } }),
      ]),
      el("label", { className: "own-toggle" }, [toggle, el("span", { text: "its own connector and rows" })]),
    ]),
    fields,
    notes,
  ]);
  if (own) ctx.registry.register({ path: `fastening.joints[${k}]`, label: name, marker: item, host: notes, prefix: name });
  return item;
}

/** A held group the job fastens its own way that is not among the joints found: its parts, connector and rows. */
function heldGroupCard(ctx: FormContext, override: Item, k: number): HTMLElement {
  const { state } = ctx;
  const at = (key: string) => `fastening.joints[${k}].${key}`;
  const name = `Held group ${k + 1}`;
  const held = Array.isArray(override.held) ? (override.held as unknown[]).map(String) : [];
  const partIds = state.list("parts").map((p) => String((p as Item)?.id ?? "")).filter(Boolean);
  const notes = el("div", { className: "row-issues" });
  const boxes = [...new Set([...partIds, ...held])].map((id) => {
    const box = el("input", { attrs: { type: "checkbox", "aria-label": `${name} holds ${id}` } });
    box.checked = held.includes(id);
    box.addEventListener("change", () => {
      const now = (state.read(at("held")) as unknown[] | undefined)?.map(String) ?? [];
      state.set(at("held"), box.checked ? [...now, id] : now.filter((x) => x !== id));
    });
    return el("label", { className: "held-choice" }, [box, el("span", { text: id })]);
  });
  const heldBox = el("div", { className: "field wide" }, [el("span", { className: "label", text: "Parts held by these connectors" }), el("div", { className: "held-choices" }, boxes)]);
  ctx.registry.register({ path: at("held"), label: `${name} · parts held`, marker: heldBox, host: heldBox });
  const card = el("div", { className: "card held-group" }, [
    el("div", { className: "card-head" }, [el("h3", { text: name }), rowButton("×", `Remove ${name}`, () => (state.remove("fastening.joints", k), ctx.rerender()), "remove")]),
    fieldGrid([
      heldBox,
      field(ctx, at("connector"), "Connector", selectControl(ctx, at("connector"), "connector", connectorChoices(ctx)), { wide: true, owner: name }),
      field(ctx, at("rows"), "Side by side in a row", numberControl(ctx, at("rows"), "rows", { integer: true, placeholder: "1" }), { unit: "per row", owner: name }),
      field(ctx, at("headSide"), "Driven from", selectControl(ctx, at("headSide"), "driven from", headSides, { whenAbsent: "auto" }), { wide: true, owner: name }),
    ]),
    notes,
  ]);
  ctx.registry.register({ path: `fastening.joints[${k}]`, label: name, marker: card, host: notes, prefix: name });
  return card;
}

/** What a joint without its own fastening takes, from the form as it stands (not from the last result). */
function defaultFasteningText(ctx: FormContext, described?: { connector: string; connectorLabel: string }): string {
  const id = String(ctx.state.read("fastening.default.connector") ?? "");
  const connector = (ctx.state.list("connectors") as Item[]).find((c) => c.id === id);
  // The trade description comes from the last result while the connector is the same one.
  const label = typeof connector?.label === "string" && connector.label ? connector.label : described?.connector === id && described.connectorLabel ? described.connectorLabel : id || "no connector chosen";
  const rows = Number(ctx.state.read("fastening.default.rows") ?? 1);
  return `${label}, ${Number.isFinite(rows) && rows > 0 ? rows : 1} per row (the default)`;
}

const following = new WeakSet<object>();

/** The joints' "the default" texts follow each edit of the default connector, its rows or the connectors. */
function followDefaultFastening(ctx: FormContext): void {
  if (following.has(ctx.state)) return;
  following.add(ctx.state);
  ctx.state.onChange((_change, path) => {
    if (!path.startsWith("fastening") && !path.startsWith("connectors") && path !== "") return;
    for (const span of document.querySelectorAll<HTMLElement>(".joint-default")) span.textContent = defaultFasteningText(ctx, { connector: span.dataset.connector ?? "", connectorLabel: span.dataset.connectorLabel ?? "" });
  });
}
