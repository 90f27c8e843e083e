import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { prepareJob } from "../../../core/check-job.js";
import { designMember } from "../../../core/design-member.js";
import type { JobInput, Shape } from "../../../core/schema/job.js";
import { findContacts, type ContactLine } from "../../../core/section/contacts.js";
import { searchJoints } from "../../../core/section/joints.js";
import type { PositionedPart } from "../../../core/section/rectangles.js";
import { buildSection } from "../../../core/section/section-model.js";
import { expectClose } from "../../expect-close.js";
import { platedCoreJob } from "../../job-builders.js";
import { material } from "../../section-builders.js";

// Issue 16 §1: every contact line belongs to the joint that governs it, whatever the orientation of the lines.

type Part = PositionedPart & { shape: Exclude<Shape, { type: "lumber" }> };

const E = { A: 10_000, B: 25_000 } as const;
const materials = [material("A", E.A), material("B", E.B)];

/** Width of material a part has at height y (strictly inside a layer), from the shape's own dimensions. */
function widthAt(p: Part, y: number): number {
  const s = p.shape;
  const t = y - p.y;
  switch (s.type) {
    case "rectangle":
      return t > 0 && t < s.h ? s.b : 0;
    case "i-section":
    case "channel":
      if (t <= 0 || t >= s.d) return 0;
      return t < s.tf || t > s.d - s.tf ? s.bf : s.tw;
    case "tee":
      if (t <= 0 || t >= s.d) return 0;
      return (s.flange === "top" ? t > s.d - s.tf : t < s.tf) ? s.bf : s.tw;
    case "hollow-rectangle":
      if (t <= 0 || t >= s.h) return 0;
      return t < s.t || t > s.h - s.t ? s.b : 2 * s.t;
    case "angle":
      if (t <= 0 || t >= s.d) return 0;
      return (s.heel.startsWith("top") ? t > s.d - s.t : t < s.t) ? s.b : s.t;
  }
}

/**
 * The transformed section integrated in thin horizontal strips (8 per mm; the generated dimensions are
 * whole millimetres, so every change of width falls on a strip edge): the neutral axis, I, and the first
 * moment of any group of parts about it.
 */
function strips(parts: Part[]) {
  const y0 = Math.min(...parts.map((p) => p.y));
  const y1 = Math.max(...parts.map((p) => p.y + ("d" in p.shape ? p.shape.d : p.shape.h)));
  const dy = 1 / 8;
  const count = Math.round((y1 - y0) / dy);
  const nOf = (p: Part) => E[p.material as keyof typeof E] / E[parts[0]!.material as keyof typeof E];
  const layer = (i: number) => y0 + (i + 0.5) * dy;
  let area = 0;
  let ay = 0;
  for (let i = 0; i < count; i++) for (const p of parts) {
    const a = nOf(p) * widthAt(p, layer(i)) * dy;
    area += a;
    ay += a * layer(i);
  }
  const yc = ay / area;
  let I = 0;
  for (let i = 0; i < count; i++) for (const p of parts) I += nOf(p) * widthAt(p, layer(i)) * (dy ** 3 / 12 + dy * (layer(i) - yc) ** 2);
  const firstMoment = (held: ReadonlySet<string>) => {
    let q = 0;
    for (let i = 0; i < count; i++) for (const p of parts) if (held.has(p.id)) q += nOf(p) * widthAt(p, layer(i)) * dy * (layer(i) - yc);
    return q;
  };
  return { yc, I, firstMoment };
}

const rectangle = (id: string, b: number, h: number, x: number, y: number, mat: "A" | "B" = "A"): Part => ({ id, name: id, material: mat, shape: { type: "rectangle", b, h }, x, y });
const mat = fc.constantFrom<"A" | "B">("A", "B");
const dim = (lo: number, hi: number) => fc.integer({ min: lo, max: hi });

/** A core with plates on its upper sides and a cap over them: plates touch by a vertical and a horizontal face. */
const coreAndPlates = fc
  .record({ b: dim(40, 200), h: dim(100, 500), t: dim(10, 40), drop: dim(0, 400), left: fc.boolean(), right: fc.boolean(), cap: fc.boolean(), capH: dim(10, 60), m: fc.array(mat, { minLength: 4, maxLength: 4 }) })
  .filter((r) => r.left || r.right)
  .map(({ b, h, t, drop, left, right, cap, capH, m }) => {
    const hp = Math.max(20, h - drop);
    const parts: Part[] = [rectangle("core", b, h, t, 0, m[0])];
    if (left) parts.push(rectangle("left", t, hp, 0, h - hp, m[1]));
    if (right) parts.push(rectangle("right", t, hp, t + b, h - hp, m[2]));
    if (cap) parts.push(rectangle("cap", b + (left ? t : 0) + (right ? t : 0), capH, left ? 0 : t, h, m[3]));
    return parts;
  });

/** An I with fillers between its flanges beside the web, and a cover plate. */
const iWithFillers = fc
  .record({ tw: dim(6, 30), half: dim(20, 100), tf: dim(5, 30), clear: dim(20, 500), fw: dim(5, 100), fh: dim(10, 500), left: fc.boolean(), right: fc.boolean(), cover: fc.boolean(), coverB: dim(10, 300), m: fc.array(mat, { minLength: 4, maxLength: 4 }) })
  .map(({ tw, half, tf, clear, fw, fh, left, right, cover, coverB, m }) => {
    const bf = tw + 2 * half;
    const d = clear + 2 * tf;
    const w = Math.min(fw, half);
    const h = Math.min(fh, clear);
    const parts: Part[] = [{ id: "beam", name: "beam", material: m[0]!, shape: { type: "i-section", designation: "", d, tw, bf, tf }, x: 0, y: 0 }];
    if (left || !right) parts.push(rectangle("filler-left", w, h, half - w, tf, m[1]));
    if (right) parts.push(rectangle("filler-right", w, h, half + tw, tf, m[2]));
    if (cover) parts.push(rectangle("cover", coverB, 12, Math.max(0, (bf - coverB) >> 1), d, m[3]));
    return parts;
  });

/** A channel with a block in its toes, and a plate under it. */
const channelWithBlock = fc
  .record({ tw: dim(5, 20), inner: dim(10, 150), tf: dim(5, 25), clear: dim(20, 400), bw: dim(5, 150), bh: dim(10, 400), plate: fc.boolean(), m: fc.array(mat, { minLength: 3, maxLength: 3 }) })
  .map(({ tw, inner, tf, clear, bw, bh, plate, m }) => {
    const lift = plate ? 10 : 0;
    const parts: Part[] = [
      { id: "channel", name: "channel", material: m[0]!, shape: { type: "channel", designation: "", d: clear + 2 * tf, bf: tw + inner, tf, tw, toes: "right" }, x: 0, y: lift },
      rectangle("block", Math.min(bw, inner), Math.min(bh, clear), tw, tf + lift, m[1]),
    ];
    if (plate) parts.push(rectangle("plate", tw + inner, 10, 0, 0, m[2]));
    return parts;
  });

/** A tee, flange up, with plates beside its stem under the flange, and a plate under the stem. */
const teeWithPlates = fc
  .record({ tw: dim(6, 30), half: dim(10, 100), tf: dim(5, 30), stem: dim(20, 400), pw: dim(5, 100), ph: dim(10, 400), both: fc.boolean(), under: fc.boolean(), m: fc.array(mat, { minLength: 4, maxLength: 4 }) })
  .map(({ tw, half, tf, stem, pw, ph, both, under, m }) => {
    const lift = under ? 15 : 0;
    const w = Math.min(pw, half);
    const h = Math.min(ph, stem);
    const parts: Part[] = [{ id: "tee", name: "tee", material: m[0]!, shape: { type: "tee", designation: "", d: stem + tf, bf: tw + 2 * half, tf, tw, flange: "top" }, x: 0, y: lift }];
    parts.push(rectangle("plate-left", w, h, half - w, lift + stem - h, m[1]));
    if (both) parts.push(rectangle("plate-right", w, h, half + tw, lift + stem - h, m[2]));
    if (under) parts.push(rectangle("under", tw, 15, half, 0, m[3]));
    return parts;
  });

/** A hollow section with a core in it, touching its bottom and sides, and a plate on top. */
const hollowWithCore = fc
  .record({ b: dim(60, 300), h: dim(60, 500), t: dim(4, 20), ch: dim(10, 480), top: fc.boolean(), m: fc.array(mat, { minLength: 3, maxLength: 3 }) })
  .map(({ b, h, t, ch, top, m }) => {
    const parts: Part[] = [
      { id: "tube", name: "tube", material: m[0]!, shape: { type: "hollow-rectangle", designation: "", b, h, t }, x: 0, y: 0 },
      rectangle("core", b - 2 * t, Math.min(ch, h - 2 * t), t, t, m[1]),
    ];
    if (top) parts.push(rectangle("top", b, 10, 0, h, m[2]));
    return parts;
  });

/** Laminations stacked on their faces, of random widths, centred. */
const stack = fc.array(fc.record({ half: dim(10, 150), h: dim(10, 100), m: mat }), { minLength: 2, maxLength: 5 }).map((layers) => {
  let y = 0;
  return layers.map(({ half, h, m }, i) => {
    const part = rectangle(`lam${i + 1}`, 2 * half, h, 150 - half, y, m);
    y += h;
    return part;
  });
});

const assembly = fc.oneof(coreAndPlates, iWithFillers, channelWithBlock, teeWithPlates, hollowWithCore, stack);

const lineKey = (l: ContactLine) => `${l.a}|${l.b}|${l.orientation}|${l.level}`;

function isConnected(ids: string[], contacts: ContactLine[]): boolean {
  const inside = new Set(ids);
  const reached = new Set([ids[0]!]);
  for (let grew = true; grew; ) {
    grew = false;
    for (const c of contacts) {
      if (!inside.has(c.a) || !inside.has(c.b)) continue;
      if (reached.has(c.a) !== reached.has(c.b)) {
        reached.add(c.a).add(c.b);
        grew = true;
      }
    }
  }
  return reached.size === inside.size;
}

describe("joint coverage (issue 16 §1)", () => {
  test("core 100 × 400, plates 20 × 240 on its upper sides, cap 140 × 40: the plates' lines to the core are fastened for the cut that holds cap and plates [D]", () => {
    const parts = [rectangle("core", 100, 400, 20, 0), rectangle("left", 20, 240, 0, 160), rectangle("right", 20, 240, 120, 160), rectangle("cap", 140, 40, 0, 400)];
    const section = buildSection(parts, materials);
    const contacts = findContacts(section);
    expect(contacts).toHaveLength(5);
    const { joints, uncovered } = searchJoints(section, contacts);
    expect(uncovered).toEqual([]);
    // By hand [D]: areas 40 000 at y 200, 2 × 4 800 at 280, 5 600 at 420; ȳ = 13.04e6 / 55 200 = 236.232 mm.
    const yc = (40_000 * 200 + 9_600 * 280 + 5_600 * 420) / 55_200;
    expectClose(yc, 236.232, { rel: 1e-5 });
    const qCap = 5_600 * (420 - yc); // 1.029e6 mm³
    const qCapAndPlates = qCap + 9_600 * (280 - yc); // 1.449e6 mm³
    expectClose(qCap, 1.029e6, { rel: 1e-3 });
    expectClose(qCapAndPlates, 1.449e6, { rel: 1e-3 });

    const all = joints.flatMap((j) => j.lines.map(lineKey));
    expect(all.sort()).toEqual(contacts.map(lineKey).sort());
    const both = joints.find((j) => j.held.length === 3)!;
    expect(new Set(both.held)).toEqual(new Set(["left", "right", "cap"]));
    expectClose(both.firstMoment, qCapAndPlates, { rel: 1e-9 });
    // It crosses the cap's line to the core and the two plates' vertical lines; 1.449e6 / 3 > 1.029e6 / 3, so it governs all three.
    expect(both.crossed).toHaveLength(3);
    expect(both.lines.map((l) => l.orientation).sort()).toEqual(["horizontal", "vertical", "vertical"]);
    const cap = joints.find((j) => j.id === "cap")!;
    expectClose(cap.firstMoment, qCap, { rel: 1e-9 });
    expect(cap.crossed).toHaveLength(3);
    // The cap's lines onto the plates: the cut holding the cap and one plate would load them more (1.239e6 / 3),
    // yet that cut is already carried (cap–core and core–plate lines at 1.449e6 / 3, the other cap–plate line at 1.029e6 / 3).
    expect(cap.lines.map((l) => `${l.a}|${l.b}`).sort()).toEqual(["left|cap", "right|cap"]);
  });

  test("through designMember: the plates are scheduled, each line of the governing cut at V·Q/(3·I) [D]", () => {
    const job = platedCoreJob();
    const p = prepareJob(job);
    if (!p.ok) throw new Error(JSON.stringify(p.issues));
    const result = designMember(p.core);
    expect(result.joints.flatMap((j) => j.lines)).toHaveLength(5);
    expect(result.schedules).toHaveLength(2);
    // V = wL/2 = 10 N/mm × 4000 mm / 2 = 20 kN [D]; I by parallel axes [D].
    const yc = (40_000 * 200 + 9_600 * 280 + 5_600 * 420) / 55_200;
    const I = (100 * 400 ** 3) / 12 + 40_000 * (200 - yc) ** 2 + 2 * ((20 * 240 ** 3) / 12 + 4_800 * (280 - yc) ** 2) + (140 * 40 ** 3) / 12 + 5_600 * (420 - yc) ** 2;
    const V = 20_000;
    const both = result.joints.find((j) => j.held.length === 3)!;
    const s = result.schedules.find((x) => x.joint === both.id)!;
    expect(s.lineCount).toBe(3);
    expectClose(Math.max(...s.shearFlow), (V * (5_600 * (420 - yc) + 9_600 * (280 - yc))) / I / 3, { rel: 1e-6 });
    const cap = result.schedules.find((x) => x.joint === "cap")!;
    expect(cap.lineCount).toBe(2);
    expectClose(Math.max(...cap.shearFlow), (V * 5_600 * (420 - yc)) / I / 3, { rel: 1e-6 });
    expect(result.joints.find((j) => j.id === "cap")!.sharing).toMatch(/crosses 3 contact lines/);
  });

  test("a named held group that leaves a cut short fails the member with its reason", () => {
    const job: JobInput = { ...platedCoreJob(), member: { mark: "PC-2" }, fastening: { default: { connector: "N", rows: 1 }, joints: [{ held: ["cap"], connector: "N", rows: 1 }] } };
    const p = prepareJob(job);
    if (!p.ok) throw new Error(JSON.stringify(p.issues));
    const result = designMember(p.core);
    // The cap's lines at 1.029e6 / 3 each, the core–plate lines raised to 1.449e6 / 3: 1.309e6 < 1.449e6 across that cut [D].
    expect(result.status.passes).toBe(false);
    expect(result.status.failures.join("\n")).toMatch(/Contact line between .* the cut that holds left \+ right \+ cap has Q = /);
  });

  test("more parts than the joint search takes (the job schema allows 16): every contact line is reported, none silently dropped", () => {
    const layers = Array.from({ length: 17 }, (_, i) => rectangle(`lam${i + 1}`, 100, 20, 0, 20 * i));
    const section = buildSection(layers, materials);
    const { joints, uncovered } = searchJoints(section, findContacts(section));
    expect(joints).toEqual([]);
    expect(uncovered).toHaveLength(16);
    expect(uncovered.every((u) => u.cause === "too-many-parts")).toBe(true);
  });

  test.each(["per-line", "by-width"] as const)("generated assemblies, flow shared %s: every contact line in exactly one joint, Q by strips, and every cut carried by the lines it crosses", (sharing) => {
    fc.assert(
      fc.property(assembly, (parts) => {
        const section = buildSection(parts, materials);
        const contacts = findContacts(section);
        const { joints, uncovered } = searchJoints(section, contacts, { sharing });
        expect(uncovered).toEqual([]);
        const owner = new Map<string, (typeof joints)[number]>();
        for (const j of joints) for (const l of j.lines) {
          expect(owner.has(lineKey(l))).toBe(false);
          owner.set(lineKey(l), j);
        }
        expect([...owner.keys()].sort()).toEqual(contacts.map(lineKey).sort());

        const integrated = strips(parts);
        const scale = Math.max(...parts.map((p) => Math.abs(integrated.firstMoment(new Set([p.id])))), 1);
        expectClose(section.secondMoment, integrated.I, { rel: 1e-6 });
        for (const j of joints) expect(Math.abs(j.firstMoment - Math.abs(integrated.firstMoment(new Set(j.held))))).toBeLessThan(1e-6 * scale);

        // Each line is fastened for its joint's Q shared by the lines that joint's cut crosses (counted here):
        // equally (connectors, welds), or in proportion to their widths (glue: one stress τ = VQ/(I·t)).
        const crossedBy = (held: ReadonlySet<string>) => contacts.filter((c) => held.has(c.a) !== held.has(c.b));
        const share = (l: ContactLine) => {
          const j = owner.get(lineKey(l))!;
          const crossed = crossedBy(new Set(j.held));
          return sharing === "per-line" ? j.firstMoment / crossed.length : (j.firstMoment * l.length) / crossed.reduce((t, c) => t + c.length, 0);
        };
        const ids = parts.map((p) => p.id);
        for (let mask = 1; mask < 1 << (ids.length - 1); mask++) {
          const side = ids.slice(1).filter((_, i) => (mask >> i) & 1);
          const rest = ids.filter((id) => !side.includes(id));
          if (!isConnected(side, contacts) || !isConnected(rest, contacts)) continue;
          const held = new Set(side);
          const carried = crossedBy(held).reduce((s, l) => s + share(l), 0);
          expect(carried).toBeGreaterThanOrEqual(Math.abs(integrated.firstMoment(held)) - 1e-6 * scale);
        }
      }),
      { numRuns: 200 },
    );
  });

  test("generated assemblies through designMember: every contact line is in a designed joint and none is reported uncovered", () => {
    fc.assert(
      fc.property(assembly, (parts) => {
        const job: JobInput = {
          format: "stitchplan-job",
          version: 1,
          units: "si",
          basis: "allowable",
          project: { name: "Generated" },
          member: { mark: "G-1" },
          materials: [
            { id: "A", name: "A", E: E.A, density: 0 },
            { id: "B", name: "B", E: E.B, density: 0 },
          ],
          parts: parts.map((p) => ({ id: p.id, material: p.material, shape: p.shape, x: p.x, y: p.y })),
          connectors: [{ id: "N", kind: "rated", label: "rated connector", resistance: 5000, minSpacing: 20, maxSpacing: 600 }],
          fastening: { default: { connector: "N", rows: 1 } },
          beam: { spans: [3], loads: [{ type: "uniform", category: "dead", w: 1 }], selfWeight: false },
          spacing: { module: 5, minZoneLength: 300, maxZonesPerSpan: 3, symmetric: true },
        };
        const p = prepareJob(job);
        if (!p.ok) throw new Error(JSON.stringify(p.issues));
        const result = designMember(p.core);
        const contacts = findContacts(buildSection(parts, materials));
        const designed = result.joints.flatMap((j) => j.lines.map((l) => `${l.between[0]}|${l.between[1]}|${l.orientation}|${l.level}`));
        expect(designed.sort()).toEqual(contacts.map(lineKey).sort());
        expect(result.schedules.map((s) => s.joint).sort()).toEqual(result.joints.map((j) => j.id).sort());
        expect(result.status.failures.filter((f) => f.startsWith("Contact line"))).toEqual([]);
      }),
      { numRuns: 60 },
    );
  });
});
