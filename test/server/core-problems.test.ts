// Engine (core/) problems found by the fuzz and limit tests, kept as tests with the jobs that showed them:
// each is now refused at its field or designed quickly. The service's time limit and size limits stay as a
// second guard.
import { spawnSync } from "node:child_process";
import { readFileSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import type { FastifyInstance } from "fastify";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { prepareJob } from "../../core/index.js";
import { buildApp } from "../../server/app.js";
import { EXAMPLES, example, tempFolder, tsNodeArgs } from "./store/store-fixtures.js";

let app: FastifyInstance;
beforeAll(async () => {
  app = await buildApp({ timeLimits: { designMs: 3000 } });
  await app.ready();
  await app.inject({ method: "POST", url: "/api/designs", payload: example("workshop-box-beam.si") });
});
afterAll(() => app.close());

/** An example job as a fresh object, loosely typed so that a test can bend it. */
// eslint-disable-next-line @typescript-eslint/no-explicit-any
const readExample = (name: string): any => JSON.parse(readFileSync(join(EXAMPLES, `${name}.json`), "utf8"));

describe("engine problems found by fuzzing, each answered at its field or quickly", () => {
  test("a part 65,000 in deep (cover-plate-retrofit.us, parts[0].shape.h: a typo for 0.5) is refused at its field or designed, never a 500 (core threw 'singular stiffness matrix')", async () => {
    const job = readExample("cover-plate-retrofit.us");
    job.parts[0].shape.h = 65000;
    const res = await app.inject({ method: "POST", url: "/api/designs", payload: job });
    expect([200, 400], res.body.slice(0, 300)).toContain(res.statusCode);
    if (res.statusCode === 400) expect(res.json().issues.map((i: { path: string }) => i.path)).toContain("parts[0].shape.h");
  });

  test("a span of 1e300 m is refused at beam.spans by core itself, never reaching the row placement (which aborted the whole process)", { timeout: 60_000 }, () => {
    const job = example("workshop-box-beam.si");
    job.beam.spans = [1e300];
    job.beam.loads = [];
    const prepared = prepareJob(job);
    if (!prepared.ok) {
      expect(prepared.issues.map((i) => i.path)).toContain("beam.spans");
      return;
    }
    // Accepted: then designing it must at least not take the process down (run apart, since it did).
    const folder = tempFolder("core-abort");
    try {
      const file = join(folder.dir, "job.json");
      writeFileSync(file, JSON.stringify(job));
      const script = join(folder.dir, "design.ts");
      writeFileSync(
        script,
        `import { readFileSync } from "node:fs";\nimport { designMember, prepareJob } from ${JSON.stringify(new URL("../../core/index.ts", import.meta.url).pathname)};\nconst p = prepareJob(JSON.parse(readFileSync(${JSON.stringify(file)}, "utf8")));\nif (p.ok) designMember(p.core);\n`,
      );
      const run = spawnSync(process.execPath, tsNodeArgs(script), { encoding: "utf8", timeout: 50_000 });
      expect(run.status, run.stderr.slice(0, 300)).toBe(0);
    } finally {
      folder.remove();
    }
  });

  test("a spacing module of 1e-6 in (three-ply-header.us, spacing.module) is refused at its field or designs in well under 3 s (the zoning's spacings grew with length ÷ module)", { timeout: 60_000 }, async () => {
    const job = readExample("three-ply-header.us");
    job.spacing.module = 0.000001;
    const res = await app.inject({ method: "POST", url: "/api/designs", payload: job });
    expect([200, 400]).toContain(res.statusCode);
  });

  test("a connector's maxSpacing of 1.2e301 in without spacing settings (loft-beam-16d.us, connectors[0].maxSpacing) is refused at its field or designs in well under 3 s", { timeout: 60_000 }, async () => {
    const job = readExample("loft-beam-16d.us");
    job.connectors[0].maxSpacing = 1.2e301;
    delete job.spacing;
    const res = await app.inject({ method: "POST", url: "/api/designs", payload: job });
    expect([200, 400]).toContain(res.statusCode);
  });
});
