import { formatRatio } from "../../core/index.js";
import { numberText } from "./quantity-text.js";
import { ink } from "./sheet.js";
import { keyValueTable, table, type Cell } from "./table.js";
import type { WorksheetContext } from "./worksheet-context.js";

/**
 * Rigid and slip-aware composite action side by side: the stiffness of the member with rigid
 * connectors, with the connectors' slip and with none, and per flange joint the γ factors, the
 * spacing they rest on and the connectors each model needs. Printed when the result carries it.
 */
export function compositeSection(c: WorksheetContext): void {
  const { sheet, result, text } = c;
  const k = result.composite;
  if (!k) return;
  const slipAware = k.model === "slip-aware";
  sheet.heading(`Composite action — ${slipAware ? "slip-aware (γ-method)" : "rigid, with the slip-aware model beside it"}`, 1, 200);
  sheet.paragraph(
    slipAware
      ? "The schedules and the member checks of this worksheet rest on the slip-aware model: the connectors slip, so the flanges act only partly with the web (effective bending stiffness (EI)_ef with γ per flange)."
      : "The schedules of this worksheet rest on rigid connection, q = V·Q/I. The slip-aware model is shown beside it for the reviewer: it gives the deflection with slip and the connector forces if the connection is treated as flexible.",
    { size: 8.5, colour: ink.faint },
  );
  if (!k.applies) {
    sheet.paragraph(`The slip-aware model does not apply to this member: ${k.reason ?? "no reason given"}.`, { font: "bold", size: 9, colour: slipAware ? ink.fail : ink.text });
    return;
  }
  const rows: [string, string | Cell][] = [
    ["Model the design uses", slipAware ? "slip-aware (γ-method)" : "rigid"],
    ["Effective length l in γ", k.effectiveLength === null ? "—" : `${text.of(k.effectiveLength, "span")}${k.effectiveLengthRule ? ` (${k.effectiveLengthRule})` : ""}`],
  ];
  if (k.stiffness) {
    rows.push(
      ["(EI) rigid connection", text.of(k.stiffness.rigid, "flexuralRigidity")],
      ["(EI)_ef with K_ser (serviceability)", text.of(k.stiffness.serviceability, "flexuralRigidity")],
      ["(EI)_ef with K_u (ultimate)", text.of(k.stiffness.ultimate, "flexuralRigidity")],
      ["(EI)_ef final (long term)", k.stiffness.final === null ? "—" : text.of(k.stiffness.final, "flexuralRigidity")],
      ["(EI) with no connection", text.of(k.stiffness.noConnection, "flexuralRigidity")],
    );
  }
  if (k.deflectionFactor !== null) rows.push(["Deflection with slip ÷ rigid deflection", numberText(k.deflectionFactor, 3)]);
  if (k.finalDeflectionFactor !== null) rows.push(["Final deflection with slip ÷ rigid deflection", numberText(k.finalDeflectionFactor, 3)]);
  rows.push([
    "Spacing and γ settled",
    k.converged ? `after ${k.iterations} round${k.iterations === 1 ? "" : "s"}` : { text: `not settled after ${k.iterations} rounds: the schedule is the last one tried`, colour: ink.fail, bold: true },
  ]);
  rows.push(["Reference", k.reference]);
  keyValueTable(sheet, rows, { keyWeight: 1.3 });

  if (k.joints.length === 0) return;
  sheet.heading("Flange joints in the γ-method", 2, 50);
  table(
    sheet,
    [
      { header: "Joint", weight: 0.9 },
      { header: "Slip modulus per row, K_ser and K_u", weight: 1.3, align: "right" },
      { header: "s in γ (s_min – s_max)", weight: 1.4, align: "right" },
      { header: "γ_ser / γ_u", weight: 0.9, align: "right" },
      { header: "q/V rigid and with slip", weight: 1.3, align: "right" },
      { header: "Connectors rigid / slip-aware", weight: 1.1, align: "right" },
    ],
    k.joints.map((j) => [
      { text: j.joint, bold: true, note: `${j.flange} flange` },
      j.serviceabilitySlip === null || j.ultimateSlip === null
        ? { text: "glue line", note: "no slip, γ = 1" }
        : { text: `K_ser ${text.of(j.serviceabilitySlip, "slipModulus")}`, note: `K_u ${text.of(j.ultimateSlip, "slipModulus")}` },
      j.serviceabilitySlip === null
        ? "—"
        : {
            text: text.of(j.spacing, "length"),
            note: `${text.of(j.minSpacing, "length")} – ${text.of(j.maxSpacing, "length")}${j.withinFourTimes ? "" : "; s_max > 4·s_min, outside (B.5)"}`,
            colour: j.withinFourTimes ? undefined : ink.fail,
          },
      `${formatRatio(j.gammaServiceability)} / ${formatRatio(j.gammaUltimate)}`,
      { text: `rigid ${text.of(j.flowFactorRigid, "perLength")}`, note: `with slip ${text.of(j.flowFactorSlip, "perLength")}` },
      `${j.rigidCount ?? "—"} / ${j.slipAwareCount ?? "—"}`,
    ]),
  );
}
