import fc from "fast-check";
import { describe, expect, test } from "vitest";
import {
  aiscBuiltUpColumn,
  aiscEndConnection,
  aiscIntermediateConnectorSpacing,
  aiscModifiedSlenderness,
  intermediateConnectorsFor,
  type AiscBuiltUpColumnInput,
  type BuiltUpComponents,
  type IntermediateConnection,
} from "../../../core/column/steel-built-up.js";
import { MM_PER_IN, MPA_PER_KSI, N_PER_KIP } from "../../../core/connector/quantity-text.js";
import { expectClose } from "../../expect-close.js";

const E = 29_000 * MPA_PER_KSI;
const inch = (n: number) => n * MM_PER_IN;

// AISC Design Examples v16.0, Example E.5 [V]: 2L4×3½×⅜ LLBB, ¾ in separation, F_y = 50 ksi, L = 8 ft
// pinned; Manual properties A_g = 5.36 in², r_x = 1.25 in, r_y = 1.69 in, r_z = 0.719 in (single angle).
const exampleE5 = (spacingIn: number, connection: IntermediateConnection = "welds"): AiscBuiltUpColumnInput => ({
  grossArea: 5.36 * MM_PER_IN ** 2,
  elasticModulus: E,
  yieldStrength: 50 * MPA_PER_KSI,
  basis: "factored",
  axes: [
    { name: "x-x", effectiveLength: inch(96), radiusOfGyration: inch(1.25), shearsConnectors: false },
    { name: "y-y", effectiveLength: inch(96), radiusOfGyration: inch(1.69), shearsConnectors: true },
  ],
  componentRadius: inch(0.719),
  connection,
  components: "angles back to back",
  connectorSpacing: inch(spacingIn),
  memberMaxWidth: inch(4),
});

describe("aiscModifiedSlenderness (AISC 360-16 §E6.1)", () => {
  test("Example E.5: a = 32 in, a/r_i = 44.5 > 40, welded or pretensioned, K_i = 0.50 → (L_c/r)_m = 61.0 by E6-2b [V]", () => {
    const m = aiscModifiedSlenderness({ overallSlenderness: 96 / 1.69, connectorSpacing: 32, componentRadius: 0.719, connection: "pretensioned bolts", components: "angles back to back" });
    expect(m.equation).toBe("E6-2b");
    expect(m.ki).toBe(0.5);
    expectClose(m.overallSlenderness, 56.8, { abs: 0.05 }, "(L_c/r)_o [V]");
    expectClose(m.componentSlenderness, 44.5, { abs: 0.05 }, "a/r_i [V]");
    expectClose(m.value, 61.0, { abs: 0.05 }, "(L_c/r)_m [V]");
    expectClose(m.value, Math.sqrt((96 / 1.69) ** 2 + ((0.5 * 32) / 0.719) ** 2), { rel: 1e-12 }, "E6-2b closed form [D]");
  });

  test("snug-tight bolts at the same spacing: √(56.8² + 44.5²) = 72.2 by E6-1 [D]", () => {
    const m = aiscModifiedSlenderness({ overallSlenderness: 96 / 1.69, connectorSpacing: 32, componentRadius: 0.719, connection: "snug-tight bolts", components: "angles back to back" });
    expect(m.equation).toBe("E6-1");
    expectClose(m.value, Math.sqrt((96 / 1.69) ** 2 + (32 / 0.719) ** 2), { rel: 1e-12 });
    expectClose(m.value, 72.2, { abs: 0.05 }, "[D]");
  });

  test("welds with a/r_i ≤ 40 keep (L_c/r)_o (E6-2a), also at a/r_i = 40 exactly [M]", () => {
    for (const a of [24, 40 * 0.719]) {
      const m = aiscModifiedSlenderness({ overallSlenderness: 56.8, connectorSpacing: a, componentRadius: 0.719, connection: "welds", components: "angles back to back" });
      expect(m.equation).toBe("E6-2a");
      expect(m.value).toBe(56.8);
    }
  });

  test("K_i = 0.75 for channels back to back, 0.86 for other cases, at a/r_i = 60 [M]", () => {
    const at = (components: BuiltUpComponents) => aiscModifiedSlenderness({ overallSlenderness: 80, connectorSpacing: 60, componentRadius: 1, connection: "welds", components });
    expectClose(at("channels back to back").value, Math.sqrt(80 ** 2 + (0.75 * 60) ** 2), { rel: 1e-12 });
    expectClose(at("other").value, Math.sqrt(80 ** 2 + (0.86 * 60) ** 2), { rel: 1e-12 });
    expect(at("other").ki).toBe(0.86);
  });
});

describe("aiscIntermediateConnectorSpacing (AISC 360-16 §E6.2, §J3.5)", () => {
  test("Example E.5: a ≤ 3 r_i (L_c/r)_max / 4 = 0.75 × 0.719 × 76.8 = 41.4 in, with (L_c/r)_max the x-x value [V]", () => {
    const s = aiscIntermediateConnectorSpacing({ governingSlenderness: 96 / 1.25, componentRadius: inch(0.719) });
    expectClose(s.largest / MM_PER_IN, 41.4, { abs: 0.05 }, "a_max in [V]");
    expect(s.governing.reference).toBe("AISC 360-16 §E6.2(a)");
  });

  test("plates in continuous contact: 24 t ≤ 12 in painted, 14 t ≤ 7 in weathering (REFERENCES §7.1 table [V])", () => {
    const painted = (tIn: number) => aiscIntermediateConnectorSpacing({ governingSlenderness: 200, componentRadius: inch(10), platesInContact: { thinnerThickness: inch(tIn), exposure: "painted or not subject to corrosion" } });
    const weathering = (tIn: number) => aiscIntermediateConnectorSpacing({ governingSlenderness: 200, componentRadius: inch(10), platesInContact: { thinnerThickness: inch(tIn), exposure: "unpainted weathering steel subject to corrosion" } });
    expectClose(painted(0.375).largest, inch(9), { rel: 1e-12 }, "24 × 3/8 = 9.0 in");
    expectClose(painted(0.625).largest, inch(12), { rel: 1e-12 }, "capped at 12 in");
    expectClose(weathering(0.25).largest, inch(3.5), { rel: 1e-12 }, "14 × 1/4 = 3.5 in");
    expectClose(weathering(0.625).largest, inch(7), { rel: 1e-12 }, "capped at 7 in");
    expect(painted(0.375).governing.reference).toBe("AISC 360-16 §J3.5(a)");
  });

  test("outside plate: 0.75 √(E/F_y) t = 18.06 t at F_y = 50 ksi, 21.29 t at 36 ksi; 1.12 √(E/F_y) t = 26.97 t staggered, ≤ 18 in (REFERENCES §7.1 [D])", () => {
    const plate = (tIn: number, FyKsi: number, staggered: boolean) =>
      aiscIntermediateConnectorSpacing({ governingSlenderness: 200, componentRadius: inch(10), outsidePlate: { thickness: inch(tIn), yieldStrength: FyKsi * MPA_PER_KSI, elasticModulus: E, staggered } }).largest / MM_PER_IN;
    expectClose(plate(0.5, 50, false), 0.5 * 18.06, { abs: 0.005 });
    expectClose(plate(0.5, 36, false), 0.5 * 21.29, { abs: 0.005 });
    expectClose(plate(0.5, 50, true), 0.5 * 26.97, { abs: 0.005 });
    expectClose(plate(1, 36, false), 12, { rel: 1e-12 }, "capped at 12 in");
    expectClose(plate(1, 36, true), 18, { rel: 1e-12 }, "capped at 18 in");
  });
});

describe("aiscEndConnection (AISC 360-16 §E6.2(b))", () => {
  test("an 8 in wide member with 3/4 in bolts: weld ≥ 8 in, or bolts at ≤ 3 in over 12 in, five in a line [D]", () => {
    const e = aiscEndConnection({ memberMaxWidth: inch(8), boltDiameter: inch(0.75) });
    expectClose(e.weldLength, inch(8), { rel: 1e-12 });
    expectClose(e.boltedLength, inch(12), { rel: 1e-12 });
    expectClose(e.boltPitch!, inch(3), { rel: 1e-12 });
    expect(e.boltsPerLine).toBe(5);
  });
});

describe("aiscBuiltUpColumn (AISC 360-16 §E6 with §E3)", () => {
  test("Example E.5 with two connectors (a = 32 in): x-x flexural buckling governs, F_e = 48.5 ksi, F_n = 32.5 ksi, P_n = 174 kips, φ_c P_n = 157, P_n/Ω_c = 104 [V]", () => {
    const r = aiscBuiltUpColumn(exampleE5(32));
    expect(r.governingAxis).toBe("x-x");
    const x = r.axes.find((a) => a.axis === "x-x")!;
    expectClose(x.strength.elasticBucklingStress / MPA_PER_KSI, 48.5, { abs: 0.05 }, "F_ex [V]");
    expectClose(x.strength.criticalStress / MPA_PER_KSI, 32.5, { abs: 0.05 }, "F_n [V]");
    expectClose(r.nominal / N_PER_KIP, 174, { abs: 0.5 }, "P_n [V]");
    expectClose(r.available / N_PER_KIP, 157, { abs: 0.5 }, "φ_c P_n [V]");
    expectClose(aiscBuiltUpColumn({ ...exampleE5(32), basis: "allowable" }).available / N_PER_KIP, 104, { abs: 0.5 }, "P_n/Ω_c [V]");
    const y = r.axes.find((a) => a.axis === "y-y")!;
    expectClose(y.modified!.value, 61.0, { abs: 0.05 }, "(L_c/r)_m,y [V]");
    expectClose(y.strength.elasticBucklingStress / MPA_PER_KSI, 76.9, { abs: 0.05 }, "F_ey [V]");
    expect(r.spacingPasses).toBe(true);
    expect(r.notChecked.join(" ")).toContain("§E4");
  });

  test("Example E.5: one connector (a = 48 in > 41.4 in) fails the spacing rule; two are needed [V]", () => {
    expect(aiscBuiltUpColumn(exampleE5(48)).spacingPasses).toBe(false);
    expect(aiscBuiltUpColumn(exampleE5(48)).warnings.join(" ")).toContain("§E6.2(a)");
    const n = intermediateConnectorsFor(inch(96), aiscBuiltUpColumn(exampleE5(32)).spacing.largest);
    expect(n.count).toBe(2);
    expectClose(n.spacing, inch(32), { rel: 1e-12 });
  });

  test("intermediateConnectorsFor: a space equal to a_max needs no extra connector; none when the member is shorter than a_max [D]", () => {
    expect(intermediateConnectorsFor(300, 100).count).toBe(2);
    expect(intermediateConnectorsFor(300, 99.9).count).toBe(3);
    expect(intermediateConnectorsFor(50, 100)).toEqual({ count: 0, spacing: 50 });
  });

  const column = fc.record({
    lengthIn: fc.double({ min: 24, max: 480, noNaN: true }),
    rx: fc.double({ min: 0.5, max: 4, noNaN: true }),
    ry: fc.double({ min: 0.5, max: 4, noNaN: true }),
    ri: fc.double({ min: 0.3, max: 1.5, noNaN: true }),
    FyKsi: fc.constantFrom(36, 50, 65),
    connection: fc.constantFrom<IntermediateConnection>("snug-tight bolts", "pretensioned bolts", "welds"),
    components: fc.constantFrom<BuiltUpComponents>("angles back to back", "channels back to back", "other"),
    spacing: fc.double({ min: 0.02, max: 1, noNaN: true }), // a as a fraction of the length
  });
  interface ColumnCase { lengthIn: number; rx: number; ry: number; ri: number; FyKsi: number; connection: IntermediateConnection; components: BuiltUpComponents; spacing: number }
  const inputOf = (c: ColumnCase, scale = 1, spacingScale = 1): AiscBuiltUpColumnInput => ({
    grossArea: 5000,
    elasticModulus: E,
    yieldStrength: c.FyKsi * MPA_PER_KSI,
    basis: "factored",
    axes: [
      { name: "x-x", effectiveLength: inch(c.lengthIn * scale), radiusOfGyration: inch(c.rx), shearsConnectors: false },
      { name: "y-y", effectiveLength: inch(c.lengthIn * scale), radiusOfGyration: inch(c.ry), shearsConnectors: true },
    ],
    componentRadius: inch(c.ri),
    connection: c.connection,
    components: c.components,
    connectorSpacing: inch(c.lengthIn * c.spacing * spacingScale),
    memberMaxWidth: inch(8),
  });

  test("property (fast-check, fixed seed): P_n never above A_g F_y; a longer column never a higher capacity; closer connectors never a lower one", () => {
    fc.assert(
      fc.property(column, fc.double({ min: 1, max: 3, noNaN: true }), fc.double({ min: 0.05, max: 1, noNaN: true }), (c, longer, closer) => {
        const base = aiscBuiltUpColumn(inputOf(c));
        expect(base.nominal).toBeLessThanOrEqual(5000 * c.FyKsi * MPA_PER_KSI * (1 + 1e-12));
        expect(aiscBuiltUpColumn(inputOf(c, longer)).nominal).toBeLessThanOrEqual(base.nominal * (1 + 1e-12));
        expect(aiscBuiltUpColumn(inputOf(c, 1, closer)).nominal).toBeGreaterThanOrEqual(base.nominal * (1 - 1e-12));
        // the connectors' shear never helps: the built-up member never beats the same section acting fully as a unit
        const unit = aiscBuiltUpColumn({ ...inputOf(c), axes: inputOf(c).axes.map((a) => ({ ...a, shearsConnectors: false })) });
        expect(base.nominal).toBeLessThanOrEqual(unit.nominal * (1 + 1e-12));
      }),
      { numRuns: 300 },
    );
  });
});
