import { execFileSync, spawn, spawnSync } from "node:child_process";
import { copyFileSync, existsSync, mkdirSync, readdirSync, readFileSync, symlinkSync, writeFileSync } from "node:fs";
import { availableParallelism } from "node:os";
import { join } from "node:path";
import { PassThrough } from "node:stream";
import { Worker } from "node:worker_threads";
import { afterAll, describe, expect, test } from "vitest";
import { collectJobFiles, outputNames } from "../../server/cli/collect-job-files.js";
import { main } from "../../server/cli/main.js";
import { autoThreads, busySampler, runBatch } from "../../server/cli/run-batch.js";
import { EXAMPLES, example, tempFolder } from "./store/store-fixtures.js";

const ROOT = join(import.meta.dirname, "../..");
const work = tempFolder("cli");
afterAll(() => work.remove());

/** A folder of job files: three examples in both unit systems, plus whatever `extra` adds. */
function jobFolder(name: string, extra: Record<string, string> = {}): string {
  const dir = join(work.dir, name);
  mkdirSync(dir, { recursive: true });
  for (const file of ["loft-beam-16d.us.json", "workshop-box-beam.si.json", "glued-lintel.si.json"]) copyFileSync(join(EXAMPLES, file), join(dir, file));
  for (const [file, text] of Object.entries(extra)) writeFileSync(join(dir, file), text);
  return dir;
}

const badJob = () => {
  const job = example("workshop-box-beam.si");
  job.parts[1].shape.h = -5;
  job.member.mark = "MB-9";
  return `${JSON.stringify(job, null, 2)}\n`;
};

/** Runs main() in this process with captured output. */
async function cli(args: string[]) {
  const stdout = new PassThrough();
  const stderr = new PassThrough();
  let out = "";
  let err = "";
  stdout.on("data", (d) => (out += d));
  stderr.on("data", (d) => (err += d));
  const code = await main(args, { stdout, stderr });
  return { code, out, err };
}

describe("stitchplan design (the installed command)", () => {
  test("a folder of SI and US jobs with one invalid and one broken file: outputs for the valid ones, each problem by file and path, exit 3", () => {
    const dir = jobFolder("mixed", { "bad.si.json": badJob(), "broken.json": '{\n  "format": "stitchplan-job",,\n}' });
    const out = join(work.dir, "mixed-out");
    const run = spawnSync(process.execPath, [join(ROOT, "bin/stitchplan.js"), "design", dir, "--out", out, "--date", "2025-03-14"], { encoding: "utf8", cwd: work.dir, timeout: 120_000 });
    expect(run.status, run.stderr).toBe(3);

    expect(run.stderr).toContain(`${join(dir, "bad.si.json")}: parts[1].shape.h: must be greater than 0`);
    expect(run.stderr).toMatch(/broken\.json: \(file\): is not valid JSON \(.*line 2, column \d+\)/);
    expect(run.stderr).toMatch(/^\[1\/5\] /m); // plain progress lines when not a terminal

    const table = run.stdout.split("\n");
    expect(table[0]).toMatch(/^file\s+member\s+utilisation\s+governs\s+connectors\s+result$/);
    const row = (file: string) => table.find((l) => l.includes(file))!;
    expect(row("loft-beam-16d.us.json")).toMatch(/LB-1\s+0\.\d\d .*\s70\s+pass$/);
    expect(row("glued-lintel.si.json")).toMatch(/L-3 .*pass$/);
    expect(row("bad.si.json")).toMatch(/MB-9 .*invalid \(1 problem\)$/);
    expect(row("broken.json")).toMatch(/invalid \(1 problem\)$/);
    expect(run.stdout).toMatch(/5 job files: 3 pass, 0 fail, 2 invalid\./);

    const written = readdirSync(out).sort();
    for (const name of ["loft-beam-16d.us", "workshop-box-beam.si", "glued-lintel.si"]) {
      for (const ext of [".result.json", ".schedule.csv", ".positions.csv", ".pdf"]) expect(written).toContain(name + ext);
    }
    expect(written.filter((f) => f.startsWith("bad.") || f.startsWith("broken."))).toEqual([]);
    expect(written).toContain("summary.csv");
    expect(readFileSync(join(out, "loft-beam-16d.us.pdf")).subarray(0, 5).toString()).toBe("%PDF-");
    const result = JSON.parse(readFileSync(join(out, "loft-beam-16d.us.result.json"), "utf8"));
    expect(result).toMatchObject({ format: "stitchplan-result", units: "us", fingerprint: expect.stringMatching(/^[0-9a-f]{64}$/) });
    expect(readFileSync(join(out, "workshop-box-beam.si.schedule.csv"), "utf8").split("\r\n")[0]).toBe("member,joint,zone,from (m),to (m),spacing (mm),rows,count,utilisation");
  });

  test("--help explains the commands with examples and exits 0", async () => {
    const { code, out } = await cli(["--help"]);
    expect(code).toBe(0);
    expect(out).toContain("stitchplan design <job files or folders...>");
    expect(out).toContain("Examples");
    expect(out).toContain("npx stitchplan check");
  });
});

describe("runBatch", () => {
  test("every valid member passing gives exit 0; --units si writes a US job's result and CSV in SI", async () => {
    const dir = jobFolder("units");
    const out = join(work.dir, "units-out");
    const report = await runBatch({ mode: "design", inputs: [dir], out, units: "si", pdf: false, threads: 1 });
    expect(report.exitCode).toBe(0);
    expect(report.outcomes.map((o) => o.status)).toEqual(["pass", "pass", "pass"]);
    const result = JSON.parse(readFileSync(join(out, "loft-beam-16d.us.result.json"), "utf8"));
    expect(result).toMatchObject({ units: "si", unitLabels: { span: "m", length: "mm" } });
    expect(readFileSync(join(out, "loft-beam-16d.us.positions.csv"), "utf8").split("\r\n")[0]).toBe("joint,row,x (m)");
    expect(existsSync(join(out, "loft-beam-16d.us.pdf"))).toBe(false);
  });

  test("a member that does not pass is FAIL and the exit status is 1", async () => {
    const job = example("loft-beam-16d.us");
    job.beam.loads[0].w *= 1.5;
    const file = join(work.dir, "heavy.us.json");
    writeFileSync(file, JSON.stringify(job));
    const report = await runBatch({ mode: "design", inputs: [file], out: join(work.dir, "heavy-out"), pdf: false, threads: 1 });
    expect(report.outcomes[0]).toMatchObject({ status: "fail", mark: "LB-1", summary: { passes: false } });
    expect(report.outcomes[0]!.summary!.governing!.utilisation).toBeGreaterThan(1);
    expect(report.exitCode).toBe(1);
  });

  test("check runs check-mode jobs and reports a design-mode job at its mode field", async () => {
    const job = example("loft-beam-16d.us");
    job.mode = "check";
    job.fastening.default.provided = {
      type: "zones",
      zones: [
        { from: 0, to: 2, spacing: 3 },
        { from: 2, to: 4, spacing: 4 },
        { from: 4, to: 8, spacing: 8 },
        { from: 8, to: 10, spacing: 4 },
        { from: 10, to: 12, spacing: 3 },
      ],
    };
    const dir = join(work.dir, "check");
    mkdirSync(dir);
    writeFileSync(join(dir, "given.us.json"), JSON.stringify(job));
    copyFileSync(join(EXAMPLES, "glued-lintel.si.json"), join(dir, "lintel.si.json"));
    const report = await runBatch({ mode: "check", inputs: [dir], out: join(work.dir, "check-out"), pdf: false, threads: 1 });
    const [given, lintel] = report.outcomes;
    expect(given).toMatchObject({ status: "pass", summary: { connectors: 70 } });
    expect(lintel).toMatchObject({ status: "invalid", problems: [{ path: "mode", message: expect.stringContaining("stitchplan check runs check-mode jobs") }] });
    expect(report.exitCode).toBe(3);
  });

  test("outputs that would overwrite an input file are refused for that member and the input is left alone", async () => {
    const dir = join(work.dir, "clash");
    mkdirSync(dir);
    const mine = '{"my": "notes"}';
    writeFileSync(join(dir, "beam.result.json"), mine);
    copyFileSync(join(EXAMPLES, "glued-lintel.si.json"), join(dir, "beam.json"));
    const report = await runBatch({ mode: "design", inputs: [join(dir, "beam.json"), join(dir, "beam.result.json")], out: dir, pdf: false, threads: 1, summaryFile: false });
    expect(report.outcomes[0]).toMatchObject({ status: "error", problems: [{ path: "(output)", message: expect.stringContaining("would overwrite the input file") }] });
    expect(readFileSync(join(dir, "beam.result.json"), "utf8")).toBe(mine);
  });

  test("two worker threads give the same outcomes and files as one thread", async () => {
    const dir = jobFolder("threads", { "bad.si.json": badJob() });
    const one = await runBatch({ mode: "design", inputs: [dir], out: join(work.dir, "threads-1"), pdf: false, threads: 1 });
    const two = await runBatch({ mode: "design", inputs: [dir], out: join(work.dir, "threads-2"), pdf: false, threads: 2 });
    expect(two.threads).toBe(2);
    // Which of two joints at equal utilisation (to the last bit) governs is not what this compares.
    const view = (r: typeof one) =>
      r.outcomes.map((o) => ({ file: o.file, status: o.status, connectors: o.summary?.connectors, utilisation: o.summary?.governing?.utilisation.toPrecision(9), problems: o.problems }));
    expect(view(two)).toEqual(view(one));
    expect(readFileSync(join(work.dir, "threads-2", "workshop-box-beam.si.schedule.csv"), "utf8")).toBe(readFileSync(join(work.dir, "threads-1", "workshop-box-beam.si.schedule.csv"), "utf8"));
  });

  test("autoThreads(…) keeps small batches on one thread and spreads large ones over the idle cores", () => {
    expect(autoThreads(5, false, 2, 0)).toBe(1);
    expect(autoThreads(1000, false, 2, 0)).toBe(2);
    expect(autoThreads(40, true, 2, 0.5)).toBe(2);
    expect(autoThreads(1000, true, 1, 0)).toBe(1);
    expect(autoThreads(1000, false, 2, 1.2)).toBe(1);
    expect(autoThreads(1000, false, 8, 3)).toBe(5);
  });

  test("busySampler counts a core kept busy by another program, and never more cores than there are", async () => {
    const spinner = spawn(process.execPath, ["-e", "const t = Date.now(); while (Date.now() - t < 3000);"], { stdio: "ignore" });
    try {
      await new Promise((resolve) => setTimeout(resolve, 300));
      const busy = await busySampler(300).read();
      expect(busy).toBeGreaterThanOrEqual(0.5);
      expect(busy).toBeLessThanOrEqual(availableParallelism());
    } finally {
      spinner.kill();
    }
  });

  test("busySampler leaves out this process's own work: a thread of its own spinning is not another program", async () => {
    // With 2 cores: the spinner keeps one busy; read as another program's, it would keep a 1,000-member batch on one thread.
    // Other programs on a shared machine: compared with a reading just before the spinner starts.
    const before = await busySampler(300).read();
    const spinner = new Worker("const t = Date.now(); while (Date.now() - t < 1500);", { eval: true });
    try {
      await new Promise((resolve) => setTimeout(resolve, 100));
      const busy = await busySampler(300).read();
      expect(busy - before).toBeLessThan(0.5);
    } finally {
      await spinner.terminate();
    }
  });
});

describe("the command line and the file system", () => {
  test("a symbolic link planted in the output folder is not written through: the file it points to is left alone", async () => {
    const dir = jobFolder("links-in");
    const out = join(work.dir, "links-out");
    mkdirSync(out);
    const outside = join(work.dir, "precious.txt");
    writeFileSync(outside, "keep me");
    symlinkSync(outside, join(out, "glued-lintel.si.result.json"));
    symlinkSync(outside, join(out, "summary.csv"));
    const report = await runBatch({ mode: "design", inputs: [dir], out, pdf: false, threads: 1 });
    expect(readFileSync(outside, "utf8")).toBe("keep me");
    const lintel = report.outcomes.find((o) => o.file.endsWith("glued-lintel.si.json"))!;
    expect(lintel).toMatchObject({ status: "error", problems: [{ path: "(output)", message: expect.stringContaining("symbolic link") }] });
    expect(report.outcomes.some((o) => o.file.endsWith("summary.csv") && o.status === "error")).toBe(true);
    expect(report.exitCode).toBe(3);
  });

  test("an output folder that is the input folder under another name (a link) never overwrites an input", async () => {
    const dir = join(work.dir, "same-folder");
    mkdirSync(dir);
    const mine = '{"my": "notes"}';
    writeFileSync(join(dir, "beam.result.json"), mine);
    copyFileSync(join(EXAMPLES, "glued-lintel.si.json"), join(dir, "beam.json"));
    symlinkSync(dir, join(work.dir, "same-folder-link"));
    const report = await runBatch({ mode: "design", inputs: [join(dir, "beam.json"), join(dir, "beam.result.json")], out: join(work.dir, "same-folder-link"), pdf: false, threads: 1, summaryFile: false });
    expect(report.outcomes[0]).toMatchObject({ status: "error", problems: [{ path: "(output)", message: expect.stringContaining("would overwrite the input file") }] });
    expect(readFileSync(join(dir, "beam.result.json"), "utf8")).toBe(mine);
  });

  test("a FIFO named *.json is skipped with a message (it used to hang the batch); the other files are done", { timeout: 30_000 }, async () => {
    const dir = jobFolder("fifo");
    execFileSync("mkfifo", [join(dir, "pipe.json")]);
    const report = await runBatch({ mode: "design", inputs: [dir, join(dir, "pipe.json")], out: join(work.dir, "fifo-out"), pdf: false, threads: 1 });
    const pipe = report.outcomes.filter((o) => o.file.endsWith("pipe.json"));
    expect(pipe.length).toBeGreaterThan(0);
    for (const o of pipe) expect(o).toMatchObject({ status: "invalid", problems: [{ path: "(file)", message: "is not a regular file (a pipe, socket or device); skipped" }] });
    expect(report.outcomes.filter((o) => o.status === "pass").length).toBe(3);
  });

  test("a file that is not JSON is reported with where it breaks, never with its content", async () => {
    const dir = jobFolder("secret", { "notes.json": "SECRET-TOKEN-1234 is not a job", "half.json": '{"format": "stitchplan-job", "SECRET-KEY": ' });
    const { err } = await cli(["design", dir, "--out", join(work.dir, "secret-out"), "--quiet", "--no-pdf"]);
    expect(err).toMatch(/notes\.json: \(file\): is not valid JSON/);
    expect(err).toMatch(/half\.json: \(file\): is not valid JSON/);
    expect(err).not.toContain("SECRET");
  });
});

describe("collecting job files", () => {
  test("collectJobFiles takes a folder's *.json by name (not *.result.json) and reports paths that give none", async () => {
    const dir = join(work.dir, "collect");
    mkdirSync(join(dir, "empty"), { recursive: true });
    for (const f of ["b.json", "a.json", "a.result.json", "notes.txt", ".hidden.json"]) writeFileSync(join(dir, f), "{}");
    const found = await collectJobFiles([dir, join(dir, "a.json"), join(dir, "empty"), join(dir, "missing.json")]);
    expect(found.files).toEqual([join(dir, "a.json"), join(dir, "b.json")]);
    expect(found.problems).toEqual([
      { file: join(dir, "empty"), problems: [{ path: "(folder)", message: "holds no job files (*.json)" }] },
      { file: join(dir, "missing.json"), problems: [{ path: "(file)", message: "does not exist" }] },
    ]);
  });

  test("outputNames gives a name met twice a -2", () => {
    expect(outputNames(["x/b-1.json", "y/b-1.json", "y/B-1.json", "z/c.json"])).toEqual(["b-1", "b-1-2", "B-1-3", "c"]);
  });
});

describe("command line errors", () => {
  test.each([
    [["frobnicate"], 'unknown command "frobnicate"'],
    [["design"], "design needs job files or folders"],
    [["design", "x.json", "--units", "cubits"], "--units must be si or us"],
    [["design", "x.json", "--jobs", "0"], "--jobs must be a whole number from 1 to 64"],
    [["design", "x.json", "--date", "14/03/2025"], "--date must be written YYYY-MM-DD"],
    [["design", "x.json", "--colour"], "Unknown option '--colour'"],
  ])("stitchplan %j exits 2 saying what is wrong", async (args, message) => {
    const { code, err } = await cli(args);
    expect(code).toBe(2);
    expect(err).toContain(message);
    expect(err).toContain("stitchplan --help");
  });

  test("a missing file is reported by name with exit 3, not a crash", async () => {
    const { code, err, out } = await cli(["design", join(work.dir, "nowhere.json"), "--out", join(work.dir, "nowhere-out"), "--quiet"]);
    expect(code).toBe(3);
    expect(err).toContain("nowhere.json: (file): does not exist");
    expect(out).toContain("1 job file: 0 pass, 0 fail, 1 invalid.");
  });
});
