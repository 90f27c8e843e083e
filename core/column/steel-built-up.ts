import type { WorkingStep } from "../connector/connector-kind.js";
import { MM_PER_IN } from "../connector/quantity-text.js";
import { exceeds } from "../units/limits.js";
import { aiscFlexuralBuckling, requirePositive, type AiscFlexuralBuckling, type DesignBasis } from "./steel-compression.js";

/**
 * Built-up steel compression members, AISC 360-16 §E6: the modified slenderness for the shear the
 * intermediate connectors take (§E6.1), the spacing of those connectors and the end connections
 * (§E6.2). Core units: N, mm, MPa.
 *
 * The text of §E6 was seen in the AISC 360-22 edition [V]; 360-16 is recalled to read the same
 * except for clause numbers (J3.5 for J3.6) and SI round-offs [M].
 */

export type IntermediateConnection = "snug-tight bolts" | "pretensioned bolts" | "welds";
export type BuiltUpComponents = "angles back to back" | "channels back to back" | "other";

/** K_i of eq. E6-2b. */
export const AISC_KI: Record<BuiltUpComponents, number> = { "angles back to back": 0.5, "channels back to back": 0.75, other: 0.86 };

export interface ModifiedSlendernessInput {
  /** (L_c/r)_o: the built-up member acting as a unit, in the buckling direction addressed. */
  overallSlenderness: number;
  /** a: distance between connectors, mm. */
  connectorSpacing: number;
  /** r_i: least radius of gyration of one component, mm. */
  componentRadius: number;
  connection: IntermediateConnection;
  components: BuiltUpComponents;
}

export interface ModifiedSlenderness {
  /** (L_c/r)_m. */
  value: number;
  overallSlenderness: number;
  /** a/r_i. */
  componentSlenderness: number;
  /** K_i where eq. E6-2b applies, else null. */
  ki: number | null;
  equation: "E6-1" | "E6-2a" | "E6-2b";
  steps: WorkingStep[];
}

/** AISC 360-16 §E6.1 eq. E6-1, E6-2a, E6-2b. */
export function aiscModifiedSlenderness(p: ModifiedSlendernessInput): ModifiedSlenderness {
  requirePositive({ overallSlenderness: p.overallSlenderness, connectorSpacing: p.connectorSpacing, componentRadius: p.componentRadius });
  const o = p.overallSlenderness;
  const ai = p.connectorSpacing / p.componentRadius;
  const steps: WorkingStep[] = [
    { symbol: "(L_c/r)_o", description: "slenderness of the built-up member acting as a unit", value: o, quantity: "ratio", reference: "AISC 360-16 §E6.1" },
    { symbol: "a/r_i", description: "slenderness of one component between connectors (r_i its least radius of gyration)", value: ai, quantity: "ratio", reference: "AISC 360-16 §E6.1" },
  ];
  if (p.connection === "snug-tight bolts") {
    const value = Math.hypot(o, ai);
    steps.push({ symbol: "(L_c/r)_m", description: "modified slenderness, snug-tight bolted connectors: √((L_c/r)_o² + (a/r_i)²)", value, quantity: "ratio", reference: "AISC 360-16 eq. E6-1" });
    return { value, overallSlenderness: o, componentSlenderness: ai, ki: null, equation: "E6-1", steps };
  }
  const how = p.connection === "welds" ? "welded" : "pretensioned bolted";
  if (!exceeds(ai, 40)) {
    steps.push({ symbol: "(L_c/r)_m", description: `modified slenderness, ${how} connectors with a/r_i ≤ 40: (L_c/r)_o`, value: o, quantity: "ratio", reference: "AISC 360-16 eq. E6-2a" });
    return { value: o, overallSlenderness: o, componentSlenderness: ai, ki: null, equation: "E6-2a", steps };
  }
  const ki = AISC_KI[p.components];
  const value = Math.hypot(o, ki * ai);
  steps.push({ symbol: "K_i", description: `${p.components === "other" ? "components other than angles or channels back to back" : p.components}`, value: ki, quantity: "ratio", reference: "AISC 360-16 §E6.1" });
  steps.push({ symbol: "(L_c/r)_m", description: `modified slenderness, ${how} connectors with a/r_i > 40: √((L_c/r)_o² + (K_i a/r_i)²)`, value, quantity: "ratio", reference: "AISC 360-16 eq. E6-2b" });
  return { value, overallSlenderness: o, componentSlenderness: ai, ki, equation: "E6-2b", steps };
}

export type CorrosionExposure = "painted or not subject to corrosion" | "unpainted weathering steel subject to corrosion";

export interface ConnectorSpacingInput {
  /** Governing slenderness of the built-up member: the largest (L_c/r)_o over the axes (acting as a unit). */
  governingSlenderness: number;
  /** r_i, mm. */
  componentRadius: number;
  /** A plate and a shape, or two plates, in continuous contact (§J3.5): the thinner part's thickness. Not for two shapes in contact. */
  platesInContact?: { thinnerThickness: number; exposure: CorrosionExposure };
  /** An outside plate of the member (§E6.2): the thinner outside plate. */
  outsidePlate?: { thickness: number; yieldStrength: number; elasticModulus: number; staggered: boolean };
}

export interface SpacingRule {
  rule: string;
  /** Largest spacing the rule allows, mm. */
  value: number;
  reference: string;
}

export interface ConnectorSpacing {
  /** a_max, mm: the least of the rules. */
  largest: number;
  governing: SpacingRule;
  rules: SpacingRule[];
  steps: WorkingStep[];
}

const inches = (n: number) => n * MM_PER_IN;

/**
 * Largest spacing of intermediate connectors, AISC 360-16 §E6.2(a) and (b), §J3.5.
 * The ¾ rule takes the governing slenderness unmodified (as AISC Design Example E.5 does [V]): the
 * modified one grows with the spacing itself and would loosen the limit it sets.
 */
export function aiscIntermediateConnectorSpacing(p: ConnectorSpacingInput): ConnectorSpacing {
  requirePositive({ governingSlenderness: p.governingSlenderness, componentRadius: p.componentRadius });
  const rules: SpacingRule[] = [
    {
      rule: `a/r_i ≤ ¾ of the governing slenderness ${p.governingSlenderness.toFixed(1)}: a ≤ 0.75 r_i (L_c/r)_max`,
      value: 0.75 * p.componentRadius * p.governingSlenderness,
      reference: "AISC 360-16 §E6.2(a)",
    },
  ];
  if (p.platesInContact) {
    const t = p.platesInContact.thinnerThickness;
    requirePositive({ thinnerThickness: t });
    rules.push(
      p.platesInContact.exposure === "painted or not subject to corrosion"
        ? { rule: "plates (or a plate and a shape) in continuous contact, painted or not subject to corrosion: 24 t, ≤ 12 in (305 mm)", value: Math.min(24 * t, inches(12)), reference: "AISC 360-16 §J3.5(a)" }
        : { rule: "plates (or a plate and a shape) in continuous contact, unpainted weathering steel subject to corrosion: 14 t, ≤ 7 in (180 mm)", value: Math.min(14 * t, inches(7)), reference: "AISC 360-16 §J3.5(b)" },
    );
  }
  if (p.outsidePlate) {
    const { thickness: t, yieldStrength: Fy, elasticModulus: E, staggered } = p.outsidePlate;
    requirePositive({ thickness: t, yieldStrength: Fy, elasticModulus: E });
    const root = Math.sqrt(E / Fy);
    rules.push(
      staggered
        ? { rule: "outside plate, fasteners staggered: 1.12 t √(E/F_y) on each gage line, ≤ 18 in", value: Math.min(1.12 * t * root, inches(18)), reference: "AISC 360-16 §E6.2(b)" }
        : { rule: "outside plate, intermittent welds along the edges or fasteners on all gage lines: 0.75 t √(E/F_y), ≤ 12 in", value: Math.min(0.75 * t * root, inches(12)), reference: "AISC 360-16 §E6.2(b)" },
    );
  }
  const governing = rules.reduce((a, b) => (b.value < a.value ? b : a));
  const steps: WorkingStep[] = rules.map((r) => ({ symbol: "a_max", description: r.rule, value: r.value, quantity: "length", reference: r.reference }));
  steps.push({ symbol: "a_max", description: `largest spacing of intermediate connectors (governed by ${governing.reference})`, value: governing.value, quantity: "length", reference: governing.reference });
  return { largest: governing.value, governing, rules, steps };
}

export interface EndConnection {
  /** Weld length at each end, not less than the member's largest width, mm. */
  weldLength: number;
  /** Length from each end over which bolts are closely spaced: 1.5 × the largest width, mm. */
  boltedLength: number;
  /** Largest bolt pitch over that length: 4 d, mm; null without a bolt diameter. */
  boltPitch: number | null;
  /** Bolts in one line over the bolted length at that pitch (first at the end), or null. */
  boltsPerLine: number | null;
  steps: WorkingStep[];
}

/** AISC 360-16 §E6.2(b): ends bearing on base plates or milled surfaces. */
export function aiscEndConnection(p: { memberMaxWidth: number; boltDiameter?: number }): EndConnection {
  requirePositive({ memberMaxWidth: p.memberMaxWidth });
  const W = p.memberMaxWidth;
  const boltedLength = 1.5 * W;
  const steps: WorkingStep[] = [
    { symbol: "l_w", description: "weld length at each end, at least the largest width of the member", value: W, quantity: "length", reference: "AISC 360-16 §E6.2(b)" },
    { symbol: "1.5 W", description: "length from each end over which bolts are spaced at most 4 d", value: boltedLength, quantity: "length", reference: "AISC 360-16 §E6.2(b)" },
  ];
  if (p.boltDiameter === undefined) return { weldLength: W, boltedLength, boltPitch: null, boltsPerLine: null, steps };
  requirePositive({ boltDiameter: p.boltDiameter });
  const pitch = 4 * p.boltDiameter;
  // Bolts from the end row over 1.5 W at a pitch ≤ 4d: the spaces cover the length.
  const boltsPerLine = Math.ceil(boltedLength / pitch - 1e-9) + 1;
  steps.push({ symbol: "4 d", description: "largest bolt pitch over that length", value: pitch, quantity: "length", reference: "AISC 360-16 §E6.2(b)" });
  steps.push({ symbol: "n_end", description: "bolts in one line at each end, at that pitch over 1.5 W", value: boltsPerLine, quantity: "ratio", reference: "AISC 360-16 §E6.2(b) [D]" });
  return { weldLength: W, boltedLength, boltPitch: pitch, boltsPerLine, steps };
}

export interface BuiltUpAxis {
  /** "x-x", "y-y". */
  name: string;
  /** L_c = K L about this axis, mm. */
  effectiveLength: number;
  /** r of the built-up section about this axis, mm. */
  radiusOfGyration: number;
  /** Buckling about this axis makes the components slide on each other and shears the connectors (§E6.1). */
  shearsConnectors: boolean;
}

export interface AiscBuiltUpColumnInput {
  /** A_g of the built-up member, mm². */
  grossArea: number;
  elasticModulus: number;
  yieldStrength: number;
  basis: DesignBasis;
  axes: BuiltUpAxis[];
  /** r_i, mm. */
  componentRadius: number;
  connection: IntermediateConnection;
  components: BuiltUpComponents;
  /** a: distance between intermediate connectors, mm. */
  connectorSpacing: number;
  platesInContact?: ConnectorSpacingInput["platesInContact"];
  outsidePlate?: ConnectorSpacingInput["outsidePlate"];
  /** Largest width of the member, for the end connections, mm. */
  memberMaxWidth: number;
  boltDiameter?: number;
}

export interface BuiltUpAxisStrength {
  axis: string;
  overallSlenderness: number;
  /** Null when buckling about this axis does not shear the connectors. */
  modified: ModifiedSlenderness | null;
  strength: AiscFlexuralBuckling;
}

export interface AiscBuiltUpColumn {
  axes: BuiltUpAxisStrength[];
  governingAxis: string;
  /** P_n, N: the least over the axes. */
  nominal: number;
  /** φ_c P_n or P_n/Ω_c, N. */
  available: number;
  spacing: ConnectorSpacing;
  /** a ≤ a_max. */
  spacingPasses: boolean;
  endConnection: EndConnection;
  steps: WorkingStep[];
  warnings: string[];
  /** The rule's conditions, each met or not, with its clause (the shape of a column result's conditions). */
  conditions: RuleCondition[];
  /** Limit states this function does not check; the worksheet lists them. */
  notChecked: string[];
}

export interface RuleCondition {
  condition: string;
  met: boolean;
  clause: string;
}

/** AISC 360-16 §E6 with §E3: flexural buckling of a built-up member at a given connector spacing. */
export function aiscBuiltUpColumn(p: AiscBuiltUpColumnInput): AiscBuiltUpColumn {
  if (p.axes.length === 0) throw new RangeError("axes: at least one axis is needed");
  const axes = p.axes.map((ax): BuiltUpAxisStrength => {
    requirePositive({ effectiveLength: ax.effectiveLength, radiusOfGyration: ax.radiusOfGyration });
    const overall = ax.effectiveLength / ax.radiusOfGyration;
    const modified = ax.shearsConnectors
      ? aiscModifiedSlenderness({ overallSlenderness: overall, connectorSpacing: p.connectorSpacing, componentRadius: p.componentRadius, connection: p.connection, components: p.components })
      : null;
    const strength = aiscFlexuralBuckling({
      grossArea: p.grossArea,
      slenderness: modified ? modified.value : overall,
      elasticModulus: p.elasticModulus,
      yieldStrength: p.yieldStrength,
      basis: p.basis,
      slendernessSymbol: modified ? `(L_c/r)_m,${ax.name}` : `L_c/r_${ax.name}`,
    });
    return { axis: ax.name, overallSlenderness: overall, modified, strength };
  });
  const governing = axes.reduce((a, b) => (b.strength.nominal < a.strength.nominal ? b : a));
  const spacing = aiscIntermediateConnectorSpacing({
    governingSlenderness: Math.max(...axes.map((a) => a.overallSlenderness)),
    componentRadius: p.componentRadius,
    ...(p.platesInContact ? { platesInContact: p.platesInContact } : {}),
    ...(p.outsidePlate ? { outsidePlate: p.outsidePlate } : {}),
  });
  const spacingPasses = !exceeds(p.connectorSpacing, spacing.largest);
  const endConnection = aiscEndConnection({ memberMaxWidth: p.memberMaxWidth, ...(p.boltDiameter !== undefined ? { boltDiameter: p.boltDiameter } : {}) });
  const steps: WorkingStep[] = [];
  for (const a of axes) {
    steps.push({ symbol: `L_c/r_${a.axis}`, description: `slenderness about ${a.axis}, acting as a unit`, value: a.overallSlenderness, quantity: "ratio", reference: "AISC 360-16 §E2" });
    if (a.modified) steps.push(...a.modified.steps.slice(1));
    steps.push(...a.strength.steps.slice(1).map((s) => ({ ...s, symbol: `${s.symbol} (${a.axis})` })));
  }
  steps.push(...spacing.steps);
  steps.push({ symbol: "a", description: `spacing of intermediate connectors ${spacingPasses ? "≤" : ">"} a_max`, value: p.connectorSpacing, quantity: "length", reference: spacing.governing.reference });
  steps.push(...endConnection.steps);
  const warnings = axes.flatMap((a) => a.strength.warnings);
  if (!spacingPasses) warnings.push(`the connector spacing exceeds the largest spacing allowed (${spacing.governing.rule}; ${spacing.governing.reference})`);
  if (p.connection === "pretensioned bolts") warnings.push("pretensioned bolts: eq. E6-2 needs Class A or B faying surfaces (AISC 360-16 §E6.1(b)); confirm the surface preparation");
  if (p.connection === "snug-tight bolts") warnings.push("snug-tight end connections may slip: AISC 360-16 Commentary E6 advises designing the end connections of built-up members to resist slip");
  return {
    axes,
    governingAxis: governing.axis,
    nominal: governing.strength.nominal,
    available: governing.strength.available,
    spacing,
    spacingPasses,
    endConnection,
    steps,
    warnings,
    conditions: [
      { condition: `intermediate connectors no further apart than a_max (${spacing.governing.rule})`, met: spacingPasses, clause: spacing.governing.reference },
      ...(p.connection === "pretensioned bolts" ? [{ condition: "pretensioned bolts with Class A or B faying surfaces (to be confirmed)", met: true, clause: "AISC 360-16 §E6.1(b)" }] : []),
    ],
    notChecked: [
      "torsional and flexural-torsional buckling (AISC 360-16 §E4)",
      "local buckling of slender elements (AISC 360-16 §E7, Table B4.1a)",
      "strength of the intermediate and end connectors themselves",
    ],
  };
}

/**
 * Intermediate connectors needed along a member between its end connections so that no space
 * exceeds a_max: n = ⌈L/a_max⌉ − 1, equal spaces a = L/(n + 1).
 */
export function intermediateConnectorsFor(memberLength: number, largestSpacing: number): { count: number; spacing: number } {
  requirePositive({ memberLength, largestSpacing });
  const spaces = Math.max(1, Math.ceil(memberLength / largestSpacing - 1e-9));
  return { count: spaces - 1, spacing: memberLength / spaces };
}
