import { relative, resolve } from "node:path";
import { parseArgs } from "node:util";
import { PROGRAM } from "../../core/index.js";
import type { progressReporter as ProgressReporter } from "./progress.js";

export const HELP = `stitchplan ${PROGRAM.version}: connector spacing schedules, member checks and worksheets for built-up members

Usage
  stitchplan design <job files or folders...> [options]
  stitchplan check  <job files or folders...> [options]
  stitchplan serve  [--port N] [--host ADDR] [--data DIR]
  stitchplan --help | --version

Commands
  design   designs each member (or checks it, if its job says "mode": "check") and writes, per job
           file <name>.json, into the output folder: <name>.result.json, <name>.schedule.csv (one row
           per zone per joint), <name>.positions.csv (every row of connectors), <name>.welds.csv
           (welded joints only) and <name>.pdf (the worksheet); then summary.csv and a summary table. A folder means the *.json files directly
           in it (not *.result.json).
  check    the same for check-mode jobs only ("mode": "check", the schedules to check given in
           fastening.default.provided or fastening.joints[i].provided); a design-mode job is reported.
  serve    starts the page and the HTTP API with the job store (as npm start does).

Options for design and check
  --out DIR         output folder, created if needed (default ./out); its files of the same names are replaced
  --units si|us     results and CSV in these units; the worksheets stay in each job's own units, so the
                    fingerprint they print matches the job file
  --no-pdf          no worksheets
  --jobs N          worker threads (default: chosen from the batch and the cores; 1 runs on one thread)
  --date YYYY-MM-DD print date on the worksheets (default today)
  --quiet           no progress bar or progress lines

Options for serve
  --port N          port (default 4318, or PORT)
  --host ADDR       address to listen on (default 127.0.0.1; any other prints a warning)
  --data DIR        the job store's folder (default STITCHPLAN_DATA, else data/ beside the program)

Exit status
  0 every member passes   1 a member does not pass   2 the command line is wrong
  3 a file is missing, invalid or could not be done (each problem is listed with its file and field)

Examples
  npx stitchplan design fixtures/examples
  npx stitchplan design level-2/ roof/R-4.json --out issued/2025-03-14 --units us
  npx stitchplan check site-survey/ --no-pdf --out checks
  npx stitchplan serve --port 8080 --data ~/stitchplan-data
`;

export interface CliIo {
  stdout: NodeJS.WritableStream & { isTTY?: boolean };
  stderr: NodeJS.WritableStream & { isTTY?: boolean };
}

const usage = (io: CliIo, message: string) => {
  io.stderr.write(`stitchplan: ${message}\nstitchplan --help shows the commands and options.\n`);
  return 2;
};

/** Runs the command line; resolves to the exit status. */
export async function main(argv: string[], io: CliIo = { stdout: process.stdout, stderr: process.stderr }): Promise<number> {
  const [command, ...rest] = argv;
  if (command === undefined || command === "--help" || command === "-h" || command === "help") {
    io.stdout.write(HELP);
    return command === undefined ? 2 : 0;
  }
  if (command === "--version" || command === "-v") {
    io.stdout.write(`${PROGRAM.name} ${PROGRAM.version}\n`);
    return 0;
  }
  if (command === "serve") {
    let values;
    try {
      ({ values } = parseArgs({
        args: rest,
        options: { port: { type: "string", default: process.env.PORT ?? "4318" }, host: { type: "string", default: "127.0.0.1" }, data: { type: "string" }, help: { type: "boolean", short: "h" } },
      }));
    } catch (error) {
      return usage(io, (error as Error).message);
    }
    if (values.help) {
      io.stdout.write(HELP);
      return 0;
    }
    // Loaded on demand, so that --help and usage errors answer at once.
    const { serve } = await import("../serve.js");
    const code = await serve({ port: values.port, host: values.host, data: values.data });
    return code ?? -1;
  }
  if (command !== "design" && command !== "check") return usage(io, `unknown command "${command}"; the commands are design, check and serve`);

  let parsed;
  try {
    parsed = parseArgs({
      args: rest,
      allowPositionals: true,
      options: {
        out: { type: "string", default: "out" },
        units: { type: "string" },
        "no-pdf": { type: "boolean", default: false },
        jobs: { type: "string" },
        date: { type: "string" },
        quiet: { type: "boolean", default: false },
        help: { type: "boolean", short: "h" },
      },
    });
  } catch (error) {
    return usage(io, (error as Error).message);
  }
  const { values, positionals } = parsed;
  if (values.help) {
    io.stdout.write(HELP);
    return 0;
  }
  if (positionals.length === 0) return usage(io, `${command} needs job files or folders, e.g. stitchplan ${command} fixtures/examples`);
  if (values.units !== undefined && values.units !== "si" && values.units !== "us") return usage(io, `--units must be si or us, not "${values.units}"`);
  let threads: number | undefined;
  if (values.jobs !== undefined) {
    threads = Number(values.jobs);
    if (!/^\d+$/.test(values.jobs) || threads < 1 || threads > 64) return usage(io, `--jobs must be a whole number from 1 to 64, not "${values.jobs}"`);
  }
  if (values.date !== undefined && !/^\d{4}-\d{2}-\d{2}$/.test(values.date)) return usage(io, `--date must be written YYYY-MM-DD, not "${values.date}"`);

  const [{ runBatch }, { progressReporter }, { summaryTable }, { batchProfile, tuneJit }] = await Promise.all([import("./run-batch.js"), import("./progress.js"), import("./summary-table.js"), import("../jit-tuning.js")]);
  // Without worksheets each member is designed once: optimise later, so that less of the optimiser's work is thrown away.
  tuneJit(batchProfile(!values["no-pdf"]));
  let progress: ReturnType<typeof ProgressReporter> | undefined;
  const report = await runBatch({
    mode: command,
    inputs: positionals,
    out: values.out,
    units: values.units,
    pdf: !values["no-pdf"],
    threads,
    printDate: values.date,
    onOutcome: values.quiet
      ? undefined
      : (done, total, outcome) => {
          progress ??= progressReporter(io.stderr, total);
          progress.update(done, outcome);
        },
  });
  progress?.stop();

  const problems = report.outcomes.flatMap((o) => o.problems.map((p) => `  ${o.file}: ${p.path}: ${p.message}`));
  if (problems.length > 0) io.stderr.write(`\nProblems (${problems.length}):\n${problems.join("\n")}\n\n`);

  io.stdout.write(`${summaryTable(report.outcomes)}\n\n`);
  const count = (status: string) => report.outcomes.filter((o) => o.status === status).length;
  const members = count("pass") + count("fail");
  const parts = [`${count("pass")} pass`, `${count("fail")} fail`];
  if (count("invalid")) parts.push(`${count("invalid")} invalid`);
  if (count("error")) parts.push(`${count("error")} not done (error)`);
  const rate = members > 0 ? `, ${(members / report.seconds).toFixed(1)} members/s` : "";
  const near = relative(process.cwd(), values.out);
  const where = near === "" ? "." : near.startsWith("..") ? resolve(values.out) : near;
  io.stdout.write(
    `${report.outcomes.length} job file${report.outcomes.length === 1 ? "" : "s"}: ${parts.join(", ")}. ${report.seconds.toFixed(1)} s${rate} on ${report.threads} thread${report.threads === 1 ? "" : "s"}. Files in ${where}/\n`,
  );
  return report.exitCode;
}
