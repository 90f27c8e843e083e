import { describe, expect, test } from "vitest";
import { builderDimensions } from "../../../core/draw/builder-dimensions.js";
import type { TextItem } from "../../../core/draw/drawing.js";
import { renderSvg } from "../../../core/draw/render-svg.js";
import { rowAcrossDrawing, rowAcrossInOneLine, rowAcrossLines, rowAcrossOf } from "../../../core/draw/row-across.js";
import type { Schedule } from "../../../core/schema/result.js";

// A flitch joint's schedule as a result gives it in US units (lengths in inches), made by hand: two 3/4 in
// bolts per row across an 11 in plate, 3 in from the top edge and 8-1/4 in from it, alternate bolts 2 in apart.
const schedule = (layoutAcross: Schedule["layoutAcross"]): Pick<Schedule, "rows" | "layoutAcross" | "rowFit" | "limits"> => ({
  rows: 2,
  layoutAcross,
  rowFit: { needed: 9, available: 11, between: ["ply-left", "plate"], fits: true },
  limits: { minSpacing: 1.875, maxSpacing: 24, endDistance: 3, module: 1, preferred: null, minZoneLength: 24, edgeDistance: 3, rowSpacing: 3, penetration: null, sources: [] },
});
const us = builderDimensions("us");
const texts = (items: { type: string }[], role: string) => (items.filter((i) => i.type === "text" && (i as TextItem).role === role) as TextItem[]).map((i) => i.text);

describe("a row across the contact, for the field sheet and the page", () => {
  test("with the result's layout: each connector dimensioned from the named edge, the stagger and the face", () => {
    const across = rowAcrossOf(["plate"], schedule({ edge: "top edge of the plies", offsets: [3, 8.25], stagger: 2, drivenFrom: null }));
    const drawing = rowAcrossDrawing(across, us, { width: 200, height: 96 })!;
    expect(drawing).not.toBeNull();
    expect(texts(drawing.items, "offset-from-edge")).toEqual(["3 in", "8-1/4 in"]);
    expect(texts(drawing.items, "edge-name")).toEqual(["top edge of the plies"]);
    expect(texts(drawing.items, "stagger")).toEqual(["stagger 2 in"]);
    expect(texts(drawing.items, "driving-face")).toEqual(["from either face"]);
    // Three rows drawn, each with its two connectors: six dots.
    const dots = drawing.items.find((i) => i.type === "path" && i.role === "connectors-across")!;
    expect(((dots as { d: string }).d.match(/M/g) ?? []).length).toBe(6);
    // Across the contact to scale: 8-1/4 in sits 2.75 times as far from the edge as 3 in.
    const y = drawing.items.filter((i): i is TextItem => i.type === "text" && i.role === "offset-from-edge").map((t) => t.y - 2.5);
    const edgeY = 14;
    expect((y[1]! - edgeY) / (y[0]! - edgeY)).toBeCloseTo(8.25 / 3, 6);
    expect(renderSvg(drawing)).toContain("top edge of the plies");
    expect(rowAcrossLines(across, us)).toEqual([
      "Connectors across the contact at 3 in, 8-1/4 in from the top edge of the plies (contact 11 in).",
      "Staggered: alternate connectors 2 in apart along the member.",
      "From either face.",
    ]);
  });

  test("rows in line, driven from a named part: said in words on one line, not drawn", () => {
    const layout = { edge: "outer face of the flange", offsets: [20, 45], stagger: null, drivenFrom: "top flange" };
    const across = rowAcrossOf(["top"], { ...schedule(layout), rows: 2 });
    const si = builderDimensions("si");
    expect(rowAcrossDrawing(across, si, { width: 200, height: 96 })).toBeNull();
    expect(rowAcrossLines(across, si)[1]).toBe("Rows in line: no stagger.");
    expect(rowAcrossInOneLine(["top"], [{ joint: "top", layout, contact: 70 }], si)).toBe("at 20 mm and 45 mm from the outer face of the flange, driven from top flange");
  });

  test("one connector in the middle of the contact is centred; joints alike along the member but driven from different parts are named", () => {
    const one = (drivenFrom: string) => ({ edge: "left edge of the contact", offsets: [0.75], stagger: null, drivenFrom });
    // 3/4 in is the middle of a 1-1/2 in contact [D].
    expect(rowAcrossInOneLine(["top"], [{ joint: "top", layout: one("Top flange"), contact: 1.5 }], us)).toBe("centred 3/4 in from the left edge of the contact, driven from Top flange");
    expect(rowAcrossInOneLine(["top", "bottom"], [{ joint: "top", layout: one("Top flange"), contact: 1.5 }, { joint: "bottom", layout: one("Bottom flange"), contact: 1.5 }], us)).toBe(
      "centred 3/4 in from the left edge of the contact, top driven from Top flange, bottom driven from Bottom flange",
    );
    // A joint without a layout: nothing said for the group.
    expect(rowAcrossInOneLine(["top", "bottom"], [{ joint: "top", layout: one("Top flange"), contact: 1.5 }], us)).toBeNull();
  });

  test("without a layout: what the limits say, no drawing and no invented position", () => {
    const across = rowAcrossOf(["plate"], schedule(undefined));
    expect(rowAcrossDrawing(across, us, { width: 200, height: 96 })).toBeNull();
    const lines = rowAcrossLines(across, us);
    expect(lines[0]).toBe("2 per row across the contact of 11 in, at least 3 in from each edge and at least 3 in apart.");
    expect(lines[1]).toMatch(/gives no positions across the contact/);
  });
});
