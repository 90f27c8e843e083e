import type { DesignResult } from "../../../core/schema/result.js";
import { formatNumber, formatRatio } from "../../../core/units/format.js";
import { el } from "../dom.js";
import { header, shown, table } from "./quantities.js";

type Composite = NonNullable<DesignResult["composite"]>;
type Cells = { cells: (string | Node)[]; className?: string };

const withNote = (main: string, note: string | null) => el("span", {}, [main, note ? el("span", { className: "sub", text: note }) : null]);

/**
 * Composite action, rigid and slip-aware side by side (EN 1995-1-1 Annex B, the γ-method): what the
 * member's stiffness, its deflection and its connectors come to under each assumption, so the reviewer
 * sees what the simpler one leaves out. When the γ-method does not apply the reason is given, in red
 * when slip-aware was asked for.
 */
export function compositePanel(result: DesignResult): HTMLElement | null {
  const k = result.composite;
  if (!k) return null;
  const slipAware = k.model === "slip-aware";
  const body: (HTMLElement | null)[] = [
    el("h2", { text: "Composite action: rigid and with slip", attrs: { id: "composite-title" } }),
    !k.applies ? null : el("p", {
      className: "hint",
      text: slipAware
        ? "The design uses the slip-aware model: the connectors slip, so the flanges act only partly with the web (EN 1995-1-1 Annex B, γ per flange joint). Rigid connection is shown beside it."
        : "The design uses rigid connection, q = V·Q/I. The slip-aware model is shown beside it: the stiffness and deflection with the connectors' slip, and the connectors it would need.",
    }),
  ];
  if (!k.applies) {
    body.push(
      el("p", { className: slipAware ? "fails-text composite-refused" : "hint", text: `The slip-aware model does not apply to this member: ${k.reason ?? "no reason given"}` }),
      slipAware ? el("p", { className: "fails-text", text: "The schedules and checks below rest on rigid connection, not on the slip-aware model asked for." }) : null,
    );
    return el("section", { className: `panel composite${slipAware ? " fails" : ""}`, attrs: { id: "composite", "aria-labelledby": "composite-title" } }, body);
  }
  body.push(comparison(result, k), stiffnessBars(result, k), flangeJoints(result, k), settlement(result, k));
  return el("section", { className: "panel composite", attrs: { id: "composite", "aria-labelledby": "composite-title" } }, body);
}

/** The two models in two columns: stiffness, deflection, and per flange joint γ, q/V and the connectors each needs. */
function comparison(result: DesignResult, k: Composite): HTMLElement {
  const slipAware = k.model === "slip-aware";
  const used = (text: string, isUsed: boolean) => el("span", { className: isUsed ? "model-used" : "" }, [text, el("span", { className: "unit", text: isUsed ? "the design uses this" : "for comparison" })]);
  const s = k.stiffness;
  const rows: Cells[] = [];
  if (s) {
    rows.push(
      { cells: ["Bending stiffness E·I (serviceability)", shown(result, s.rigid, "flexuralRigidity"), withNote(shown(result, s.serviceability, "flexuralRigidity"), "(EI)_ef with K_ser")] },
      { cells: ["Bending stiffness E·I (ultimate)", shown(result, s.rigid, "flexuralRigidity"), withNote(shown(result, s.ultimate, "flexuralRigidity"), "(EI)_ef with K_u")] },
    );
    if (s.final !== null) rows.push({ cells: ["Bending stiffness E·I, final (long term)", "—", withNote(shown(result, s.final, "flexuralRigidity"), "with k_def and ψ2")] });
  }
  if (k.deflectionFactor !== null) rows.push({ cells: ["Deflection ÷ rigid deflection", "1", el("strong", { text: `× ${formatNumber(k.deflectionFactor, 3)}` })] });
  if (k.finalDeflectionFactor !== null) rows.push({ cells: ["Final deflection ÷ rigid deflection", "—", el("strong", { text: `× ${formatNumber(k.finalDeflectionFactor, 3)}` })] });
  for (const j of k.joints) {
    rows.push(
      { className: "joint-first", cells: [withNote(`Joint ${j.joint}: γ`, `${j.flange} flange, serviceability / ultimate`), "1", `${formatRatio(j.gammaServiceability)} / ${formatRatio(j.gammaUltimate)}`] },
      { cells: [withNote(`Joint ${j.joint}: q per unit V`, "connector force = q/V × spacing × V"), shown(result, j.flowFactorRigid, "perLength"), shown(result, j.flowFactorSlip, "perLength")] },
      {
        cells: [
          `Joint ${j.joint}: connectors`,
          j.rigidCount === null ? "—" : String(j.rigidCount),
          j.slipAwareCount === null ? withNote("—", "not designed") : el("strong", { text: String(j.slipAwareCount) }),
        ],
      },
    );
  }
  const total = (pick: (j: Composite["joints"][number]) => number | null) => {
    const counts = k.joints.map(pick);
    return counts.some((c) => c === null) ? null : counts.reduce<number>((a, c) => a + (c ?? 0), 0);
  };
  const rigidTotal = total((j) => j.rigidCount);
  const slipTotal = total((j) => j.slipAwareCount);
  if (k.joints.length > 1) rows.push({ className: "total", cells: ["Connectors, flange joints together", rigidTotal === null ? "—" : String(rigidTotal), slipTotal === null ? "—" : String(slipTotal)] });
  return table("Rigid and slip-aware composite action side by side", ["", used("Rigid connection", !slipAware), used("With slip (γ-method)", slipAware)], rows, {
    className: `composite-comparison ${slipAware ? "uses-slip" : "uses-rigid"}`,
    numeric: [1, 2],
  });
}

/** Stiffness from none to rigid connection, as bars against the rigid value: what the connectors' slip costs. */
function stiffnessBars(result: DesignResult, k: Composite): HTMLElement | null {
  const s = k.stiffness;
  if (!s || !(s.rigid > 0)) return null;
  const bars: [string, number | null, string][] = [
    ["rigid connection", s.rigid, "rigid"],
    ["with slip, K_ser", s.serviceability, "slip"],
    ["with slip, K_u", s.ultimate, "slip"],
    ["with slip, final", s.final, "slip final"],
    ["no connection", s.noConnection, "none"],
  ];
  return el(
    "div",
    { className: "stiffness-bars", attrs: { role: "group", "aria-label": "Bending stiffness against rigid connection" } },
    bars
      .filter(([, v]) => v !== null)
      .map(([label, value, kind]) => {
        const fill = el("span", { className: `bar-fill ${kind}` });
        fill.style.width = `${Math.max(0, Math.min(1, value! / s.rigid)) * 100}%`;
        return el("div", { className: "stiffness-bar" }, [
          el("span", { className: "bar-label", text: label }),
          el("span", { className: "bar-track", attrs: { "aria-hidden": "true" } }, [fill]),
          el("span", { className: "bar-value", text: `${formatNumber((value! / s.rigid) * 100, 3)} %` }),
        ]);
      })
      .concat(el("p", { className: "hint", text: `E·I as a share of rigid connection (${shown(result, s.rigid, "flexuralRigidity")}).` })),
  );
}

/** A glued flange joint: no slip modulus and no spacing; γ = 1. */
const glued = (j: Composite["joints"][number]) => j.serviceabilitySlip === null || j.ultimateSlip === null;

/** Per flange joint: the slip moduli and the spacing γ rests on, red where s_max exceeds 4·s_min. */
function flangeJoints(result: DesignResult, k: Composite): HTMLElement | null {
  if (k.joints.length === 0) return null;
  const u = result.unitLabels;
  return table(
    "Flange joints in the γ-method",
    ["Joint", header("K_ser / K_u per connector", u.slipModulus), header("s in γ", u.length), header("s_min – s_max", u.length), "γ_ser / γ_u"],
    k.joints.map((j) => ({
      className: j.withinFourTimes ? "" : "fails",
      cells: [
        el("span", {}, [el("strong", { text: j.joint }), el("span", { className: "sub", text: `${j.flange} flange, ${j.shearPlanesPerRow} shear plane${j.shearPlanesPerRow === 1 ? "" : "s"} per row` })]),
        glued(j) ? withNote("glue line", "no slip, γ = 1") : `${formatNumber(j.serviceabilitySlip!)} / ${formatNumber(j.ultimateSlip!)}`,
        glued(j) ? "—" : formatNumber(j.spacing),
        glued(j) ? "—" : el("span", {}, [`${formatNumber(j.minSpacing)} – ${formatNumber(j.maxSpacing)}`, j.withinFourTimes ? null : el("span", { className: "sub", text: "s_max > 4·s_min: outside EN 1995-1-1 (B.5); γ does not hold" })]),
        `${formatRatio(j.gammaServiceability)} / ${formatRatio(j.gammaUltimate)}`,
      ],
    })),
    { className: "composite-joints", numeric: [1, 2, 3, 4] },
  );
}

/** The effective length, whether the spacing and γ settled, and the reference. */
function settlement(result: DesignResult, k: Composite): HTMLElement {
  return el("dl", { className: "figures" }, [
    el("dt", { text: "Effective length l in γ" }),
    el("dd", { text: k.effectiveLength === null ? "—" : `${shown(result, k.effectiveLength, "span")}${k.effectiveLengthRule ? ` (${k.effectiveLengthRule})` : ""}` }),
    el("dt", { text: "Spacing and γ" }),
    el("dd", {
      className: k.converged ? "" : "fails-text",
      text: k.converged ? (k.iterations ? `settled after ${k.iterations} round${k.iterations === 1 ? "" : "s"} of design` : "from the rigid schedule (not redesigned)") : `not settled after ${k.iterations} rounds: the schedule is the last one tried; do not rely on it`,
    }),
    el("dt", { text: "Reference" }),
    el("dd", { text: k.reference }),
  ]);
}
