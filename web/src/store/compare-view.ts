import { formatNumber, formatRatio } from "../../../core/units/format.js";
import { el } from "../dom.js";
import type { JobSchema } from "../job-schema.js";
import type { Comparison, InputChange } from "./store-api.js";

type Pair<T> = { from: T | null; to: T | null };

/** `parts[1].shape.h` → `parts[].shape.h`, the form the schema answers for. */
const schemaPath = (path: string) => path.replace(/\[\d+\]/g, "[]");

function valueText(value: unknown, unit: string | undefined): string {
  if (value === null || value === undefined) return "—";
  if (typeof value === "number") return unit ? `${formatNumber(value, 6)} ${unit}` : formatNumber(value, 6);
  if (typeof value === "string") return value === "" ? "(empty)" : value;
  if (typeof value === "boolean") return value ? "yes" : "no";
  const text = JSON.stringify(value);
  return text.length > 120 ? `${text.slice(0, 117)}…` : text;
}

const arrow = <T>(pair: Pair<T>, show: (v: T) => string) => `${pair.from === null ? "—" : show(pair.from)} → ${pair.to === null ? "—" : show(pair.to)}`;

/** What changed between two revisions: the inputs by field, then the verdict, the schedules zone by zone, bond lines and member checks. */
export function comparisonView(c: Comparison, schema: JobSchema): HTMLElement {
  const unitOf = (change: InputChange) => {
    const q = schema.quantityAt(schemaPath(change.path));
    return q ? c.unitLabels[q] : undefined;
  };
  const inputs = c.inputs.length
    ? el("table", { className: "results-table compare-inputs" }, [
        el("caption", { text: `Inputs changed (${c.inputs.length})` }),
        el("thead", {}, [el("tr", {}, ["Field", "Change", `Revision ${c.from.revision}`, `Revision ${c.to.revision}`].map((h) => el("th", { text: h, attrs: { scope: "col" } })))]),
        el(
          "tbody",
          {},
          c.inputs.map((change) =>
            el("tr", { className: `change-${change.change}` }, [
              el("td", { className: "path", text: change.path }),
              el("td", { text: change.change }),
              el("td", { text: valueText(change.from, unitOf(change)) }),
              el("td", { text: valueText(change.to, unitOf(change)) }),
            ]),
          ),
        ),
      ])
    : el("p", { className: "hint", text: "The inputs are the same." });

  const r = c.results;
  const verdict = (v: boolean) => (v ? "passes" : "fails");
  const span = c.unitLabels.span ?? "";
  const length = c.unitLabels.length ?? "";
  const schedules = r.schedules.map((s) => {
    const changedZones = s.zones.filter((z) => z.change !== "same");
    return el("div", { className: `compare-joint change-${s.change}` }, [
      el("h4", { text: `Joint ${s.joint}: ${s.change}` }),
      el("p", {
        text: `Connectors ${arrow(s.count, (v) => String(v))}; largest utilisation ${arrow(s.maxUtilisation, formatRatio)}; ${arrow(s.passes, verdict)}${s.connector.from !== s.connector.to ? `; connector ${arrow(s.connector, String)}` : ""}.`,
      }),
      changedZones.length
        ? el("table", { className: "results-table compare-zones" }, [
            el("caption", { className: "visually-hidden", text: `Zones of joint ${s.joint} that changed` }),
            el("thead", {}, [el("tr", {}, ["Zone", "Change", `From – to (${span})`, `Spacing (${length})`, "Count", "Utilisation"].map((h) => el("th", { text: h, attrs: { scope: "col" } })))]),
            el(
              "tbody",
              {},
              changedZones.map((z) =>
                el("tr", { className: `change-${z.change}` }, [
                  el("td", { text: String(z.zone) }),
                  el("td", { text: z.change === "changed" ? z.fields.join(", ") : z.change }),
                  el("td", { text: arrow({ from: z.from, to: z.to }, (v) => `${formatNumber(v.from)}–${formatNumber(v.to)}`) }),
                  el("td", { text: arrow({ from: z.from, to: z.to }, (v) => formatNumber(v.spacing)) }),
                  el("td", { text: arrow({ from: z.from, to: z.to }, (v) => String(v.count)) }),
                  el("td", { text: arrow({ from: z.from, to: z.to }, (v) => formatRatio(v.utilisation)) }),
                ]),
              ),
            ),
          ])
        : null,
    ]);
  });
  const others = [...r.bondLines.map((b) => ({ ...b, title: `Bond line, joint ${b.id}` })), ...r.checks].filter((x) => x.change !== "same");
  return el("section", { className: "comparison", attrs: { "aria-label": `Revision ${c.from.revision} against revision ${c.to.revision}` } }, [
    el("h3", { text: `Revision ${c.from.revision} → revision ${c.to.revision}` }),
    el("p", { className: "hint", text: `Compared in ${c.units === "us" ? "US customary" : "SI"} units. ${c.to.note ? `Note on revision ${c.to.revision}: “${c.to.note}”.` : ""}` }),
    inputs,
    el("h4", { text: "How the results changed" }),
    el("p", { className: r.passes.to === false ? "fails-text" : "", text: `Member ${arrow(r.passes, verdict)}; connectors in all ${arrow(r.connectors, String)}.` }),
    ...schedules,
    others.length
      ? el(
          "ul",
          { className: "compare-checks" },
          others.map((o) => el("li", { text: `${o.title}: ${o.change}, utilisation ${arrow(o.utilisation, formatRatio)} (${arrow(o.passes, verdict)})` })),
        )
      : el("p", { className: "hint", text: "Bond lines and member checks: no change in utilisation." }),
  ]);
}
