import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { prepareJob } from "../../../core/check-job.js";
import { designMember } from "../../../core/design-member.js";
import type { JobInput } from "../../../core/schema/job.js";
import { resolvePlacement } from "../../../core/section/place-parts.js";
import { partRectangles, shapeRectangles, type PositionedPart } from "../../../core/section/rectangles.js";
import { buildSection, firstMomentAbove } from "../../../core/section/section-model.js";
import { lumberSize } from "../../../core/section/lumber-sizes.js";
import { expectClose } from "../../expect-close.js";
import { material, rect, sectionOf } from "../../section-builders.js";
import { plankIJob } from "../../job-builders.js";

const part = (id: string, shape: PositionedPart["shape"], x = 0, y = 0): PositionedPart => ({ id, name: id, material: "M", shape, x, y });

describe("shapeRectangles", () => {
  test("lumber by nominal size takes the PS 20 dressed sizes: 2x10 is 1.5 × 9.25 in, 2x6 is 1.5 × 5.5 in, 1x12 is 0.75 × 11.25 in (REFERENCES §10 [V])", () => {
    expect(lumberSize("2x10")).toEqual({ thickness: 1.5 * 25.4, width: 9.25 * 25.4 });
    expect(lumberSize("2x6")).toEqual({ thickness: 1.5 * 25.4, width: 5.5 * 25.4 });
    expect(lumberSize("1x12")).toEqual({ thickness: 0.75 * 25.4, width: 11.25 * 25.4 });
    expect(lumberSize("4x4")).toEqual({ thickness: 3.5 * 25.4, width: 3.5 * 25.4 });
    expect(lumberSize("6x6")).toEqual({ thickness: 5.5 * 25.4, width: 5.5 * 25.4 });
    const [flat] = shapeRectangles({ type: "lumber", nominal: "2x8", orientation: "flat" });
    expect(flat).toEqual({ x0: 0, x1: 7.25 * 25.4, y0: 0, y1: 1.5 * 25.4 });
  });

  test("timbers 5 in and thicker are dressed 1/2 in less on both sizes: 6x10 is 5.5 × 9.5 in, 5x5 is 4.5 × 4.5, 8x12 is 7.5 × 11.5; a 4x10 stays 3.5 × 9.25 (PS 20, NDS Supplement Table 1A [M])", () => {
    expect(lumberSize("6x10")).toEqual({ thickness: 5.5 * 25.4, width: 9.5 * 25.4 });
    expect(lumberSize("5x5")).toEqual({ thickness: 4.5 * 25.4, width: 4.5 * 25.4 });
    expect(lumberSize("8x12")).toEqual({ thickness: 7.5 * 25.4, width: 11.5 * 25.4 });
    expect(lumberSize("4x10")).toEqual({ thickness: 3.5 * 25.4, width: 9.25 * 25.4 });
    const [edge] = shapeRectangles({ type: "lumber", nominal: "6x10", orientation: "edge" });
    expect(edge!.x1 - edge!.x0).toBeCloseTo(5.5 * 25.4, 9);
    expect(edge!.y1 - edge!.y0).toBeCloseTo(9.5 * 25.4, 9);
  });

  test("an I-section part gives the same properties as its three plates (REFERENCES §1.3 [D])", () => {
    const asShape = sectionOf([part("girder", { type: "i-section", designation: "", d: 600, tw: 10, bf: 300, tf: 20 })]);
    expectClose(asShape.section.area, 17_600, { rel: 1e-12 });
    expectClose(asShape.section.secondMoment, 1155.95e6, { rel: 1e-5 });
    expectClose(firstMomentAbove(asShape.section, 300), 2.132e6, { rel: 1e-4 });
    expect(asShape.joints).toEqual([]);
  });

  test("an I-section with unequal flanges puts the neutral axis by hand calculation", () => {
    // Top 200 × 20, web 10 × 460, bottom 300 × 20: ȳ = (6000·10 + 4600·250 + 4000·490)/14 600 = 216.16 mm.
    const { section } = sectionOf([part("g", { type: "i-section", designation: "", d: 500, tw: 10, bf: 200, tf: 20, bfBottom: 300, tfBottom: 20 })]);
    expectClose(section.centroidY, (6000 * 10 + 4600 * 250 + 4000 * 490) / 14_600, { rel: 1e-12 });
  });

  test("a rectangular hollow section: I = (bh³ − b_i·h_i³)/12 (closed form, any mechanics text [D])", () => {
    const { section } = sectionOf([part("rhs", { type: "hollow-rectangle", designation: "", b: 100, h: 200, t: 8 })]);
    expectClose(section.secondMoment, (100 * 200 ** 3 - 84 * 184 ** 3) / 12, { rel: 1e-12 });
    expectClose(section.area, 100 * 200 - 84 * 184, { rel: 1e-12 });
  });

  test("an angle L100×75×10 (bottom-left heel): A = 1650 mm², ȳ from the horizontal leg's face by hand; every heel gives the same I about x when mirrored left-right [D]", () => {
    // [D]: vertical leg 10 × 100 (centre 50), horizontal leg 65 × 10 (centre 5): A = 1000 + 650, ȳ = (1000·50 + 650·5)/1650.
    const ybar = (1000 * 50 + 650 * 5) / 1650;
    const Ix = (10 * 100 ** 3) / 12 + 1000 * (50 - ybar) ** 2 + (65 * 10 ** 3) / 12 + 650 * (5 - ybar) ** 2;
    const L = (heel: "bottom-left" | "bottom-right" | "top-left" | "top-right") => sectionOf([part("L", { type: "angle", designation: "", d: 100, b: 75, t: 10, heel })]).section;
    expectClose(L("bottom-left").area, 1650, { rel: 1e-12 });
    expectClose(L("bottom-left").centroidY, ybar, { rel: 1e-12 });
    expectClose(L("bottom-left").secondMoment, Ix, { rel: 1e-12 });
    expectClose(L("bottom-right").secondMoment, Ix, { rel: 1e-12 });
    expectClose(L("top-left").centroidY, 100 - ybar, { rel: 1e-12 });
    expect(shapeRectangles({ type: "angle", designation: "", d: 100, b: 75, t: 10, heel: "bottom-right" })).toEqual([
      { x0: 65, x1: 75, y0: 0, y1: 100 },
      { x0: 0, x1: 65, y0: 0, y1: 10 },
    ]);
  });

  test("an angle thicker than a leg is refused with the field named", () => {
    const job = plankIJob() as { parts: { shape: unknown }[] };
    job.parts[0]!.shape = { type: "angle", d: 50, b: 40, t: 40 };
    const r = prepareJob(job);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.issues.some((i) => i.path === "parts[0].shape.t" && i.message.includes("less than either leg"))).toBe(true);
  });

  test("a channel facing either way has the same I; its web is at the back", () => {
    const right = shapeRectangles({ type: "channel", designation: "", d: 250, bf: 80, tf: 12, tw: 8, toes: "right" });
    const left = shapeRectangles({ type: "channel", designation: "", d: 250, bf: 80, tf: 12, tw: 8, toes: "left" });
    expect(right[1]).toMatchObject({ x0: 0, x1: 8 });
    expect(left[1]).toMatchObject({ x0: 72, x1: 80 });
    const a = sectionOf([part("c", { type: "channel", designation: "", d: 250, bf: 80, tf: 12, tw: 8, toes: "right" })]);
    const b = sectionOf([part("c", { type: "channel", designation: "", d: 250, bf: 80, tf: 12, tw: 8, toes: "left" })]);
    expectClose(a.section.secondMoment, b.section.secondMoment, { rel: 1e-12 });
    expectClose(a.section.secondMoment, (80 * 250 ** 3 - 72 * 226 ** 3) / 12, { rel: 1e-12 }, "I = (b·d³ − (b − t_w)·h_w³)/12");
  });

  test("a tee with the flange at the top is the T of two boards (REFERENCES §1.6 [D])", () => {
    const { section } = sectionOf([part("t", { type: "tee", designation: "", d: 250, bf: 200, tf: 50, tw: 50, flange: "top" })]);
    expectClose(section.centroidY, 162.5, { rel: 1e-12 });
    expectClose(section.secondMoment, 113.542e6, { rel: 1e-5 });
    const flipped = sectionOf([part("t", { type: "tee", designation: "", d: 250, bf: 200, tf: 50, tw: 50, flange: "bottom" })]);
    expectClose(flipped.section.centroidY, 250 - 162.5, { rel: 1e-12 });
  });

  test("a rolled beam with cover plates finds one joint per plate, each held by its plate (cover-plated W18x50 dimensions, REFERENCES §2.2 [V])", () => {
    const w = { type: "i-section" as const, designation: "W18x50", d: 17.99, tw: 0.355, bf: 7.495, tf: 0.57 };
    const { joints } = sectionOf([part("cover-bottom", { type: "rectangle", b: 6, h: 0.5 }, 0.7475, 0), part("beam", w, 0, 0.5), part("cover-top", { type: "rectangle", b: 6, h: 0.5 }, 0.7475, 18.49)]);
    expect(joints.map((j) => j.id).sort()).toEqual(["cover-bottom", "cover-top"]);
    for (const j of joints) expectClose(j.contactWidth, 6, { rel: 1e-12 }, "t = plate width");
  });
});

describe("resolvePlacement", () => {
  test("a flange placed on top of a web, centred, lands where the coordinates of REFERENCES §1.5 put it", () => {
    const { parts, issues } = resolvePlacement([
      { id: "web", name: "", material: "M", shape: { type: "lumber", nominal: "2x8", orientation: "edge" }, x: 0, y: 0 },
      { id: "flange", name: "", material: "M", shape: { type: "lumber", nominal: "2x8", orientation: "flat" }, place: { on: "web", side: "top", align: "centre" } },
    ]);
    expect(issues).toEqual([]);
    expectClose(parts[1]!.x, -2.875 * 25.4, { rel: 1e-12 });
    expectClose(parts[1]!.y, 7.25 * 25.4, { rel: 1e-12 });
  });

  test("flush placements and a chain of three plies side by side", () => {
    const ply = { type: "rectangle" as const, b: 38, h: 235 };
    const { parts } = resolvePlacement([
      { id: "a", name: "", material: "M", shape: ply, x: 10, y: 5 },
      { id: "b", name: "", material: "M", shape: ply, place: { on: "a", side: "right", align: "start" } },
      { id: "c", name: "", material: "M", shape: ply, place: { on: "b", side: "right", align: "end" } },
      { id: "cap", name: "", material: "M", shape: { type: "rectangle", b: 50, h: 20 }, place: { on: "a", side: "top", align: "start" } },
    ]);
    expect(parts.map((p) => [p.x, p.y])).toEqual([[10, 5], [48, 5], [86, 5], [10, 240]]);
  });

  test("a placement on an unknown part, on itself or round a circle is an issue at place.on", () => {
    const ply = { type: "rectangle" as const, b: 38, h: 235 };
    expect(resolvePlacement([{ id: "a", name: "", material: "M", shape: ply, place: { on: "zz", side: "top", align: "centre" } }]).issues).toEqual([{ path: "parts[0].place.on", message: '"zz" is not one of the parts' }]);
    expect(resolvePlacement([{ id: "a", name: "", material: "M", shape: ply, place: { on: "a", side: "top", align: "centre" } }]).issues[0]!.message).toMatch(/itself/);
    const loop = resolvePlacement([
      { id: "a", name: "", material: "M", shape: ply, place: { on: "b", side: "top", align: "centre" } },
      { id: "b", name: "", material: "M", shape: ply, place: { on: "a", side: "top", align: "centre" } },
    ]);
    expect(loop.issues[0]!.message).toMatch(/circle/);
  });

  test("a job built with placements designs like the same job with coordinates", () => {
    const withCoordinates = plankIJob();
    const placed: JobInput = {
      ...plankIJob(),
      parts: [
        { id: "bottom", material: "W", shape: { type: "rectangle", b: 100, h: 20 }, x: 0, y: 0 },
        { id: "web", material: "W", shape: { type: "rectangle", b: 20, h: 100 }, place: { on: "bottom", side: "top" } },
        { id: "top", material: "W", shape: { type: "rectangle", b: 100, h: 20 }, place: { on: "web", side: "top" } },
      ],
    };
    const run = (job: JobInput) => {
      const p = prepareJob(job);
      if (!p.ok) throw new Error(JSON.stringify(p.issues));
      return designMember(p.core);
    };
    const a = run(withCoordinates);
    const b = run(placed);
    expect(b.section.secondMoment).toBe(a.section.secondMoment);
    expect(b.schedules.map((s) => s.count)).toEqual(a.schedules.map((s) => s.count));
  });

  test("a shape with flanges thicker than its depth is refused at the field", () => {
    const job = plankIJob();
    job.parts[1]!.shape = { type: "i-section", d: 30, tw: 5, bf: 100, tf: 20 };
    const p = prepareJob(job);
    expect(p.ok).toBe(false);
    if (!p.ok) expect(p.issues).toContainEqual({ path: "parts[1].shape.d", message: "must exceed the two flange thicknesses together" });
  });
});

describe("section properties against numerical integration (property-based)", () => {
  // Independent check: integrate over a grid of cells whose lines include every rectangle edge,
  // so each cell is wholly inside or outside the material; sum area, first and second moments cell by cell.
  const stack = fc.array(
    fc.record({
      b: fc.integer({ min: 5, max: 400 }),
      h: fc.integer({ min: 5, max: 300 }),
      shift: fc.double({ min: -0.45, max: 0.45, noNaN: true }),
      E: fc.constantFrom(1, 2, 20),
    }),
    { minLength: 1, maxLength: 6 },
  );

  test("A, centroid, I and Q at random cuts agree within 1e-6 for random stacks of mixed-material rectangles", () => {
    fc.assert(
      fc.property(stack, fc.double({ min: 0.01, max: 0.99, noNaN: true }), (boards, cutAt) => {
        let y = 0;
        let x = 0;
        const parts: PositionedPart[] = [];
        boards.forEach((board, i) => {
          const prev = boards[i - 1];
          // Centre each board near the previous one so that they always overlap in plan and touch.
          if (prev) x = x + prev.b / 2 - board.b / 2 + board.shift * Math.min(prev.b, board.b);
          parts.push(rect(`p${i}`, board.b, board.h, x, y, `E${board.E}`));
          y += board.h;
        });
        const materials = [1, 2, 20].map((E) => material(`E${E}`, E));
        const section = buildSection(parts, materials);
        const rects = parts.map((p) => ({ r: partRectangles(p)[0]!, n: Number(p.material.slice(1)) / Number(parts[0]!.material.slice(1)) }));
        const xs = [...new Set(rects.flatMap(({ r }) => [r.x0, r.x1]))].sort((a, b) => a - b);
        const ys = [...new Set(rects.flatMap(({ r }) => [r.y0, r.y1]))].sort((a, b) => a - b);
        const refine = (lines: number[], k: number) => lines.slice(0, -1).flatMap((a, i) => Array.from({ length: k }, (_, j) => a + ((lines[i + 1]! - a) * j) / k)).concat(lines[lines.length - 1]!);
        const gx = refine(xs, 3);
        const gy = refine(ys, 5);
        let A = 0;
        let Sy = 0;
        const cells: { a: number; yc: number; dy: number }[] = [];
        for (let i = 0; i < gx.length - 1; i++) {
          for (let j = 0; j < gy.length - 1; j++) {
            const cx = (gx[i]! + gx[i + 1]!) / 2;
            const cy = (gy[j]! + gy[j + 1]!) / 2;
            const owner = rects.find(({ r }) => cx > r.x0 && cx < r.x1 && cy > r.y0 && cy < r.y1);
            if (!owner) continue;
            const dy = gy[j + 1]! - gy[j]!;
            const a = owner.n * (gx[i + 1]! - gx[i]!) * dy;
            A += a;
            Sy += a * cy;
            cells.push({ a, yc: cy, dy });
          }
        }
        const yc = Sy / A;
        const I = cells.reduce((s, c) => s + c.a * (c.yc - yc) ** 2 + (c.a * c.dy * c.dy) / 12, 0);
        const cut = ys[0]! + cutAt * (ys[ys.length - 1]! - ys[0]!);
        // Q above the cut: split cells that the cut crosses.
        let Q = 0;
        for (const c of cells) {
          const lo = c.yc - c.dy / 2;
          const hi = c.yc + c.dy / 2;
          if (hi <= cut) continue;
          const from = Math.max(lo, cut);
          Q += (c.a / c.dy) * (hi - from) * ((from + hi) / 2 - yc);
        }
        expectClose(section.transformedArea, A, { rel: 1e-6 }, "A");
        expectClose(section.centroidY, yc, { rel: 1e-6, abs: 1e-9 }, "ȳ");
        expectClose(section.secondMoment, I, { rel: 1e-6 }, "I");
        expectClose(firstMomentAbove(section, cut), Q, { rel: 1e-6, abs: 1e-6 * Math.abs(A) * (ys[ys.length - 1]! - ys[0]!) }, "Q");
      }),
      { numRuns: 150 },
    );
  });
});
