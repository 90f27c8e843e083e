import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { prepareJob } from "../../../core/check-job.js";
import { LagScrew, lagScrewKind } from "../../../core/connector/lag-screw.js";
import { Nail, nailKind } from "../../../core/connector/nail.js";
import { TimberBolt, timberBoltKind } from "../../../core/connector/timber-bolt.js";
import { ndsGroupSideStiffness } from "../../../core/connector/timber/nds-adjustment.js";
import { WoodScrew, woodScrewKind } from "../../../core/connector/wood-screw.js";
import { designMember } from "../../../core/design-member.js";
import type { ConnectorResistance } from "../../../core/connector/connector-kind.js";
import { expectClose } from "../../expect-close.js";
import { nailedTimberI } from "./connector-jobs.js";
import { context, IN, LBF, member, PSI, wood } from "./contexts.js";

// Threaded fasteners and the rules around the NDS-2018 yield limit equations. Every expected value is
// computed here from the standard's equations, written afresh (not core's functions):
//   Table 12.3.1A single shear [M], R_d of Table 12.3.1B and its footnote for threaded fasteners [M],
//   F_e of Table 12.3.3 and its footnotes [M], C_g eq. (11.3-1) [M], C_M of Table 11.3.3 [M],
//   lag screw root diameters and tip lengths of Appendix Table L2 [M].

type Rd = { I: number; II: number; III: number };

/** R_d of Table 12.3.1B [M]: K_D for D < 1/4 in, 4K_θ/3.6K_θ/3.2K_θ above; K_D K_θ for a threaded fastener of D ≥ 1/4 in with D_r < 1/4 in (footnote). */
function rdTerms(D: number, nominal: number, thetaDeg: number): Rd {
  const Kt = 1 + 0.25 * (thetaDeg / 90);
  if (D >= 0.25) return { I: 4 * Kt, II: 3.6 * Kt, III: 3.2 * Kt };
  const KD = D <= 0.17 ? 2.2 : 10 * D + 0.5;
  const rd = nominal >= 0.25 ? KD * Kt : KD;
  return { I: rd, II: rd, III: rd };
}

/** F_e of wood, psi (Table 12.3.3 [M]); F_e⊥ with the nominal diameter, Hankinson at θ. */
function bearingPsi(G: number, D: number, nominal: number, thetaDeg: number): number {
  if (D < 0.25) return 16_600 * G ** 1.84;
  const par = 11_200 * G;
  const perp = (6_100 * G ** 1.45) / Math.sqrt(nominal);
  const t = (thetaDeg * Math.PI) / 180;
  return (par * perp) / (par * Math.sin(t) ** 2 + perp * Math.cos(t) ** 2);
}

/** Z of Table 12.3.1A, single shear, lb: the least of modes Im, Is, II, IIIm, IIIs, IV. */
function zSingle(p: { D: number; Fyb: number; ls: number; lm: number; Fes: number; Fem: number; rd: Rd }): number {
  const { D, Fyb, ls, lm, Fes, Fem, rd } = p;
  const Re = Fem / Fes;
  const Rt = lm / ls;
  const k1 = (Math.sqrt(Re + 2 * Re ** 2 * (1 + Rt + Rt ** 2) + Rt ** 2 * Re ** 3) - Re * (1 + Rt)) / (1 + Re);
  const k2 = -1 + Math.sqrt(2 * (1 + Re) + (2 * Fyb * (1 + 2 * Re) * D ** 2) / (3 * Fem * lm ** 2));
  const k3 = -1 + Math.sqrt((2 * (1 + Re)) / Re + (2 * Fyb * (2 + Re) * D ** 2) / (3 * Fem * ls ** 2));
  return Math.min(
    (D * lm * Fem) / rd.I,
    (D * ls * Fes) / rd.I,
    (k1 * D * ls * Fes) / rd.II,
    (k2 * D * lm * Fem) / ((1 + 2 * Re) * rd.III),
    (k3 * D * ls * Fem) / ((2 + Re) * rd.III),
    (D ** 2 * Math.sqrt((2 * Fem * Fyb) / (3 * (1 + Re)))) / rd.III,
  );
}

/** C_g of NDS §11.3.6 eq. (11.3-1) [M], wood to wood: γ = 180 000 D^1.5; EA in lb, s in in. */
function groupAction(n: number, s: number, D: number, EAm: number, EAs: number): number {
  const gamma = 180_000 * D ** 1.5;
  const REA = Math.min(EAs / EAm, EAm / EAs);
  const u = 1 + gamma * (s / 2) * (1 / EAm + 1 / EAs);
  const m = u - Math.sqrt(u * u - 1);
  return ((m * (1 - m ** (2 * n))) / (n * ((1 + REA * m ** n) * (1 + m) - 1 + m ** (2 * n)))) * ((1 + REA) / (1 - m));
}

/** Lag screws by size (Appendix Table L2 [M]): D, D_r, tip E, in; F_yb by D, psi (NDS lag screw tables' footnote [M]). */
const LAG: Record<string, { D: number; Dr: number; E: number; Fyb: number }> = {
  "1/4": { D: 0.25, Dr: 0.173, E: 5 / 32, Fyb: 70_000 },
  "5/16": { D: 0.3125, Dr: 0.227, E: 3 / 16, Fyb: 60_000 },
  "3/8": { D: 0.375, Dr: 0.265, E: 7 / 32, Fyb: 45_000 },
  "7/16": { D: 0.4375, Dr: 0.328, E: 9 / 32, Fyb: 45_000 },
  "1/2": { D: 0.5, Dr: 0.371, E: 5 / 16, Fyb: 45_000 },
};

const G05 = wood(0.5);
/** Side member 1.5 in, main member `main` in, both G = 0.50, 5.5 in wide; live load (C_D = 1.0). */
const us = (side: number, main: number, options: Parameters<typeof context>[2] = {}) =>
  context(member("side", G05, side * IN, 5.5 * IN), member("main", G05, main * IN, 5.5 * IN), { categories: ["live"], units: "us", ...options });
const step = (r: ConnectorResistance, symbol: string) => r.steps.find((s) => s.symbol === symbol)!.value;
const lag = (fields: Record<string, unknown>) => LagScrew.parse({ id: "l", kind: "lag-screw", standard: "NDS-2018", ...fields });

describe("NDS-2018 §12.3.7 [M]: the shank diameter only where the threads bear over at most ¼ of the holding member's bearing length", () => {
  test("1/2 × 6 in lag screw (threads 3.5 in, Table L2 [M]), 1.5 in side member, G 0.50: D_r = 0.371 in and Z = 394 lb, not the shank's 615 lb", () => {
    const r = lagScrewKind.resistance(lag({ size: "1/2", length: 6 * IN, threadLength: 3.5 * IN }), us(1.5, 5.5));
    // Penetration 6 − 1.5 − 5/16 = 4.1875 in; threads (tip excluded) 3.5 − 5/16 = 3.1875 in, all in the main member: 76 % > 25 % → D_r.
    expectClose(step(r, "D") / IN, 0.371, { rel: 1e-9 });
    const Fe = bearingPsi(0.5, 0.371, 0.5, 0);
    const expected = zSingle({ D: 0.371, Fyb: 45_000, ls: 1.5, lm: 4.1875, Fes: Fe, Fem: Fe, rd: rdTerms(0.371, 0.5, 0) }); // [D]
    expectClose(expected, 394.2, { rel: 1e-3 }); // the issue's figure, about 394 lb [D]
    expectClose(r.value / LBF, expected, { rel: 1e-9 });
    const shank = zSingle({ D: 0.5, Fyb: 45_000, ls: 1.5, lm: 4.1875, Fes: 5_600, Fem: 5_600, rd: rdTerms(0.5, 0.5, 0) });
    expectClose(shank, 614.8, { rel: 1e-3 }); // what the shank would give [D]
    expect(r.steps.find((s) => s.symbol === "D")!.description).toContain("more than ¼");
  });

  test("the same lag screw with 1.25 in of thread: 0.9375 in bearing ≤ ¼ × 4.1875 in, so the shank D = 1/2 in is used (615 lb)", () => {
    const r = lagScrewKind.resistance(lag({ size: "1/2", length: 6 * IN, threadLength: 1.25 * IN }), us(1.5, 5.5));
    expectClose(step(r, "D") / IN, 0.5, { rel: 1e-9 });
    const expected = zSingle({ D: 0.5, Fyb: 45_000, ls: 1.5, lm: 4.1875, Fes: 5_600, Fem: 5_600, rd: rdTerms(0.5, 0.5, 0) }); // [D]
    expectClose(r.value / LBF, expected, { rel: 1e-9 });
  });

  test("wood screws: #10 × 3 in with 1 in of thread in a 1.5 in bearing length takes D_r = 0.152 in; #10 × 4 in with 0.5 in of thread in 2.5 in takes D = 0.19 in (ASME B18.6.1 [M])", () => {
    const screw = (length: number, threadLength: number) => WoodScrew.parse({ id: "s", kind: "wood-screw", standard: "NDS-2018", gauge: "#10", length: length * IN, threadLength: threadLength * IN });
    expectClose(step(woodScrewKind.resistance(screw(3, 1), us(1.5, 3.5)), "D") / IN, 0.152, { rel: 1e-9 });
    expectClose(step(woodScrewKind.resistance(screw(4, 0.5), us(1.5, 3.5)), "D") / IN, 0.19, { rel: 1e-9 });
    // 0.6 in of thread in 2.5 in is over a quarter: the root again.
    expectClose(step(woodScrewKind.resistance(screw(4, 0.7), us(1.5, 3.5)), "D") / IN, 0.152, { rel: 1e-9 });
  });
});

describe("§12.3.7 in double shear: the threads are held by the far outer member", () => {
  test("#10 × 4.5 in through 1.5 + 1.5 in into a 1.5 in far member: 0.3 in of thread (≤ ¼ × 1.5 in) takes D = 0.19 in, 1 in takes D_r = 0.152 in (root of a #10, ASME B18.6.1 [M]; NDS-2018 §12.3.7 [M])", () => {
    const screw = (threadLength: number) => WoodScrew.parse({ id: "s", kind: "wood-screw", standard: "NDS-2018", gauge: "#10", length: 4.5 * IN, threadLength: threadLength * IN, shear: "double" });
    expectClose(step(woodScrewKind.resistance(screw(0.3), us(1.5, 1.5)), "D") / IN, 0.19, { rel: 1e-9 });
    expectClose(step(woodScrewKind.resistance(screw(1), us(1.5, 1.5)), "D") / IN, 0.152, { rel: 1e-9 });
  });
});

describe("NDS-2018 Table 12.3.1B footnote [M]: D ≥ 1/4 in with D_r < 1/4 in takes R_d = K_D K_θ", () => {
  test("a 1/4 × 4 in lag screw with the side member's grain at 90°: R_d = (10 × 0.173 + 0.5) × 1.25 = 2.7875 and Z = 111.7 lb, not 139.6 lb", () => {
    const r = lagScrewKind.resistance(lag({ size: "1/4", length: 4 * IN, sideAngleToGrainDeg: 90 }), us(1.5, 3.5));
    expectClose(step(r, "D") / IN, 0.173, { rel: 1e-9 });
    const rd = rdTerms(0.173, 0.25, 90);
    expectClose(rd.I, 2.7875, { rel: 1e-12 }); // [D]
    const Fe = bearingPsi(0.5, 0.173, 0.25, 90); // 16 600 G^1.84 for D < 1/4 in [M]
    const expected = zSingle({ D: 0.173, Fyb: 70_000, ls: 1.5, lm: 4 - 1.5 - 5 / 32, Fes: Fe, Fem: Fe, rd });
    expectClose(expected, 111.68, { rel: 1e-3 }); // the issue's figure [D]
    expectClose(r.value / LBF, expected, { rel: 1e-9 });
    for (const s of r.steps.filter((x) => x.symbol.startsWith("Z_"))) expect(s.description).toContain("K_D K_θ");
  });

  test("a #10 wood screw (D = 0.19 in < 1/4 in, D_r = 0.152 in) keeps R_d = K_D = 2.2 at 90°", () => {
    const r = woodScrewKind.resistance(WoodScrew.parse({ id: "s", kind: "wood-screw", standard: "NDS-2018", gauge: "#10", length: 3 * IN, sideAngleToGrainDeg: 90 }), us(1.5, 3.5));
    const Fe = 16_600 * 0.5 ** 1.84;
    expectClose(r.value / LBF, zSingle({ D: 0.152, Fyb: 90_000, ls: 1.5, lm: 1.5, Fes: Fe, Fem: Fe, rd: rdTerms(0.152, 0.19, 90) }), { rel: 1e-9 });
    expectClose(rdTerms(0.152, 0.19, 90).I, 2.2, { rel: 1e-12 }); // D ≤ 0.17 in [M]
  });
});

describe("lag screws: tip by size, C_g and F_e⊥ from the nominal D", () => {
  test("the tip E = 5/16 in of a 1/2 in lag (Table L2 [M]) is left out of ℓ_m: 6 − 1.5 − 5/16 = 4.1875 in", () => {
    const r = lagScrewKind.resistance(lag({ size: "1/2", length: 6 * IN }), us(1.5, 5.5));
    expectClose(step(r, "ℓ_m") / IN, 4.1875, { rel: 1e-9 });
  });

  test("the least penetration 4D (§12.1.4 [M]) excludes the tip: a 1/2 × 3-1/2 in lag through 1.5 in reaches 1.6875 in < 2 in", () => {
    const problems = lagScrewKind.problems!(lag({ size: "1/2", length: 3.5 * IN }), us(1.5, 5.5));
    expect(problems).toHaveLength(1);
    expect(problems[0]).toMatchObject({ on: "connector", field: "length" });
    expect(problems[0]!.message).toContain("below the minimum 4d");
    // A tip length given (here none) is taken as given.
    expect(lagScrewKind.problems!(lag({ size: "1/2", length: 3.5 * IN, tipLength: 0 }), us(1.5, 5.5))).toEqual([]);
  });

  test("a lag screw of a diameter outside Table L2 needs its tip length (and root diameter) given", () => {
    const problems = lagScrewKind.problems!(lag({ diameter: 0.45 * IN, rootDiameter: 0.33 * IN, length: 6 * IN }), us(1.5, 5.5));
    expect(problems.map((p) => p.field)).toContain("tipLength");
    expect(lagScrewKind.problems!(lag({ diameter: 0.45 * IN, rootDiameter: 0.33 * IN, length: 6 * IN, tipLength: 0.3 * IN }), us(1.5, 5.5))).toEqual([]);
  });

  test("F_e⊥ of a 1/2 in lag at 90° takes the nominal D: 6 100 × 0.5^1.45/√0.5 psi (Table 12.3.3 footnote, as read [M])", () => {
    const r = lagScrewKind.resistance(lag({ size: "1/2", length: 6 * IN, mainAngleToGrainDeg: 90 }), us(1.5, 5.5));
    expectClose(step(r, "F_em") / PSI, (6_100 * 0.5 ** 1.45) / Math.sqrt(0.5), { rel: 1e-9 }); // 3 163 psi [D]
    expect(r.steps.find((s) => s.symbol === "F_em")!.description).toContain("nominal D");
  });

  test("C_g of a 1/4 in lag (D_r 0.173 in) in a row of 6 at 2 in is taken with D = 1/4 in, not waived as for D < 1/4 in", () => {
    const r = lagScrewKind.resistance(lag({ size: "1/4", length: 4 * IN, groupAction: { fasteners: 6, spacing: 2 * IN } }), us(1.5, 3.5));
    const E = 11_000 / PSI; // the test material's E, psi
    const expected = groupAction(6, 2, 0.25, E * 3.5 * 5.5, E * 1.5 * 5.5); // [D]
    expect(expected).toBeLessThan(1);
    expectClose(step(r, "C_g"), expected, { rel: 1e-9 });
  });

  test("in double shear C_g sums the outer members' E·A (§11.3.6 [M]): a 3/4 in bolt, 1.5 in outer plies on a 3.5 in core, 8 in a row at 3 in", () => {
    expect(ndsGroupSideStiffness([{ E: 2, area: 3 }, { E: 5, area: 7 }])).toBe(41);
    const bolt = TimberBolt.parse({ id: "b", kind: "timber-bolt", standard: "NDS-2018", size: "3/4", shear: "double", groupAction: { fasteners: 8, spacing: 3 * IN } });
    const r = timberBoltKind.resistance(bolt, us(1.5, 3.5));
    const E = 11_000 / PSI;
    // Today's context carries one outer member; the other is its twin, so A_s = 2 × 1.5 × 5.5 in².
    expectClose(step(r, "C_g"), groupAction(8, 3, 0.75, E * 3.5 * 5.5, 2 * E * 1.5 * 5.5), { rel: 1e-9 }); // [D]
  });
});

describe("C_M fabricated wet, used dry (NDS-2018 Table 11.3.3 and footnotes [M])", () => {
  const bolt = (fields: Record<string, unknown> = {}) => TimberBolt.parse({ id: "b", kind: "timber-bolt", standard: "NDS-2018", size: "3/4", moisture: "fabricated-wet", ...fields });
  test("a single row of bolts parallel to grain: 1.0; two rows: 0.4; one row across the grain of a member: 0.4", () => {
    expect(step(timberBoltKind.resistance(bolt(), us(1.5, 3.5, { rows: 1 })), "C_M")).toBe(1.0);
    expect(step(timberBoltKind.resistance(bolt(), us(1.5, 3.5, { rows: 2 })), "C_M")).toBe(0.4);
    expect(step(timberBoltKind.resistance(bolt({ mainAngleToGrainDeg: 90 }), us(1.5, 3.5, { rows: 1 })), "C_M")).toBe(0.4);
  });
  test("fasteners below 1/4 in in more than one row: 0.7 (a 16d common nail, D = 0.162 in); wet in service: 0.7; dry: 1.0", () => {
    const nail = (moisture: string) => Nail.parse({ id: "n", kind: "nail", standard: "NDS-2018", size: "16d common", moisture });
    expect(step(nailKind.resistance(nail("fabricated-wet"), us(1.5, 3.5, { rows: 2 })), "C_M")).toBe(0.7);
    expect(step(nailKind.resistance(nail("fabricated-wet"), us(1.5, 3.5, { rows: 1 })), "C_M")).toBe(1.0);
    expect(step(nailKind.resistance(nail("wet"), us(1.5, 3.5, { rows: 1 })), "C_M")).toBe(0.7);
    expect(step(nailKind.resistance(nail("dry"), us(1.5, 3.5, { rows: 2 })), "C_M")).toBe(1.0);
  });
});

describe("nails outside the diameters of the NDS F_yb footnotes (0.099 to 0.375 in [M]) need F_yb given", () => {
  test("a 6d sinker (0.092 in) and a 0.5 in spike are asked for bendingYieldStrength; given, they are designed", () => {
    const sinker = Nail.parse({ id: "n", kind: "nail", standard: "NDS-2018", size: "6d sinker" });
    expect(nailKind.problems!(sinker, us(0.75, 3.5))[0]).toMatchObject({ on: "connector", field: "bendingYieldStrength" });
    const spike = Nail.parse({ id: "n", kind: "nail", standard: "NDS-2018", diameter: 0.5 * IN, length: 10 * IN });
    expect(nailKind.problems!(spike, us(1.5, 9.25))[0]).toMatchObject({ on: "connector", field: "bendingYieldStrength" });
    const given = Nail.parse({ id: "n", kind: "nail", standard: "NDS-2018", size: "6d sinker", bendingYieldStrength: 100_000 * PSI });
    expect(nailKind.problems!(given, us(0.75, 3.5))).toEqual([]);
    expect(Number.isFinite(nailKind.resistance(given, us(0.75, 3.5)).value)).toBe(true);
    // A tabulated diameter is not asked: 16d common, 0.162 in, F_yb 90 ksi [M].
    expect(nailKind.problems!(Nail.parse({ id: "n", kind: "nail", standard: "NDS-2018", size: "16d common" }), us(1.5, 3.5))).toEqual([]);
  });

  test("through prepareJob the error names the connector's field", () => {
    const p = prepareJob(nailedTimberI({ kind: "nail", standard: "NDS-2018", diameter: 0.09, length: 3 }));
    expect(p.ok).toBe(false);
    if (!p.ok) expect(p.issues.some((i) => i.path === "connectors[0].bendingYieldStrength" && /is needed/.test(i.message))).toBe(true);
  });
});

describe("lag screws through designMember (property-based)", () => {
  // Timber I of REFERENCES Case 1.4: the screw passes the 1.5 in flange into the 9.25 in deep web, G = 0.50 both.
  test("the working's D and Z are those of §12.3.7, Table 12.3.1B (with its footnote) and Table 12.3.1A, for any size, length, thread length and grain angle", () => {
    fc.assert(
      fc.property(
        fc.record({
          size: fc.constantFrom(...Object.keys(LAG)),
          length: fc.integer({ min: 6, max: 16 }).map((x) => x / 2),
          thread: fc.option(fc.double({ min: 0.5, max: 8, noNaN: true }), { nil: undefined }),
          angle: fc.constantFrom(0, 30, 90),
        }),
        (p) => {
          const spec = LAG[p.size]!;
          const threadLength = p.thread === undefined ? undefined : Math.min(p.thread, p.length);
          const job = nailedTimberI({ kind: "lag-screw", standard: "NDS-2018", size: p.size, length: p.length, ...(threadLength !== undefined ? { threadLength } : {}), sideAngleToGrainDeg: p.angle });
          const prepared = prepareJob(job);
          const penetration = p.length - 1.5 - spec.E;
          if (!prepared.ok) {
            // Only the least penetration 4D may stop it.
            expect(penetration).toBeLessThan(4 * spec.D + 1e-9);
            return;
          }
          const lm = Math.min(penetration, 9.25);
          const threads = threadLength === undefined ? lm : Math.max(0, lm - Math.max(0, penetration - (threadLength - spec.E)));
          const D = threads <= lm / 4 + 1e-9 ? spec.D : spec.Dr;
          const Fes = bearingPsi(0.5, D, spec.D, p.angle);
          const Fem = bearingPsi(0.5, D, spec.D, 0);
          const Z = zSingle({ D, Fyb: spec.Fyb, ls: 1.5, lm, Fes, Fem, rd: rdTerms(D, spec.D, p.angle) });
          const result = designMember(prepared.core);
          expect(result.schedules.length).toBeGreaterThan(0);
          for (const s of result.schedules) {
            for (const r of s.resistance) {
              expectClose(r.steps.find((x) => x.symbol === "D")!.value / IN, D, { rel: 1e-9 });
              expectClose(r.steps.find((x) => x.symbol === "Z")!.value / LBF, Z, { rel: 1e-9 });
            }
          }
        },
      ),
      { numRuns: 60 },
    );
  });
});
