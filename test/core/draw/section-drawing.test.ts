import { describe, expect, test } from "vitest";
import { prepareJob } from "../../../core/check-job.js";
import { designMember } from "../../../core/design-member.js";
import type { PathItem } from "../../../core/draw/drawing.js";
import { renderSvg } from "../../../core/draw/render-svg.js";
import { sectionDrawing } from "../../../core/draw/section-drawing.js";
import type { JobInput } from "../../../core/schema/job.js";
import { plankIJob } from "../../job-builders.js";

function boxBeam() {
  const job: JobInput = {
    ...plankIJob(),
    parts: [
      { id: "web-l", material: "W", shape: { type: "rectangle", b: 18, h: 400 }, x: 0, y: 0 },
      { id: "bottom", material: "W", shape: { type: "rectangle", b: 95, h: 70 }, x: 18, y: 0 },
      { id: "top", material: "W", shape: { type: "rectangle", b: 95, h: 70 }, x: 18, y: 330 },
      { id: "web-r", material: "W", shape: { type: "rectangle", b: 18, h: 400 }, x: 113, y: 0 },
    ],
  };
  const p = prepareJob(job);
  if (!p.ok) throw new Error(JSON.stringify(p.issues));
  return designMember(p.core);
}

const numbers = (d: string) => [...d.matchAll(/-?\d+(\.\d+)?/g)].map((m) => Number(m[0]));
const extent = (d: string) => {
  const n = numbers(d);
  const xs = n.filter((_, i) => i % 2 === 0);
  const ys = n.filter((_, i) => i % 2 === 1);
  return { x0: Math.min(...xs), x1: Math.max(...xs), y0: Math.min(...ys), y1: Math.max(...ys) };
};

describe("sectionDrawing", () => {
  test("the shaded area is the held part of the selected joint and the width marks sit on that joint's lines", () => {
    const result = boxBeam();
    for (const jointId of ["top", "bottom"]) {
      const drawing = sectionDrawing(result, { width: 400, height: 300, joint: jointId });
      const paths = drawing.items.filter((i): i is PathItem => i.type === "path");
      const held = paths.filter((p) => p.role === `held-area ${jointId}`);
      const part = paths.find((p) => p.role === `part ${jointId}`)!;
      expect(held).toHaveLength(1);
      expect(extent(held[0]!.d)).toEqual(extent(part.d));
      expect(paths.some((p) => p.role?.startsWith("held-area") && p.role !== `held-area ${jointId}`)).toBe(false);
      // Two vertical contact lines per flange: each gets a tick at both ends, inside the flange's depth.
      const marks = paths.filter((p) => p.role === `width-mark ${jointId}`);
      expect(marks).toHaveLength(2);
      const flange = extent(part.d);
      for (const m of marks) {
        const e = extent(m.d);
        expect(e.y0).toBeCloseTo(flange.y0, 1);
        expect(e.y1).toBeCloseTo(flange.y1, 1);
      }
      const selectedLines = paths.filter((p) => p.role === `joint-line ${jointId} selected`);
      expect(selectedLines).toHaveLength(2);
      const label = drawing.items.find((i) => i.type === "text" && i.role === `width-label ${jointId}`);
      expect(label && label.type === "text" ? label.text : "").toBe("t = 140 mm");
    }
  });

  test("renderSvg draws the same items with their roles, escaping text", () => {
    const drawing = sectionDrawing(boxBeam(), { width: 400, height: 300, joint: "top" });
    const svg = renderSvg({ ...drawing, title: "a <section> & more" });
    expect(svg).toContain('data-role="held-area top"');
    expect(svg).toContain('data-role="width-mark top"');
    expect(svg).toContain("a &lt;section&gt; &amp; more");
    expect(svg.match(/<path /g)!.length).toBe(drawing.items.filter((i) => i.type === "path").length);
  });
});
