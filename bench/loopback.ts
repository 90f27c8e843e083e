// The real server in a child process on 127.0.0.1, and loopback load on it with autocannon: shared by
// the HTTP bench and scripts/load-test.ts.
import { execFileSync, spawn, type ChildProcess } from "node:child_process";
import { mkdtempSync, readdirSync, readFileSync, rmSync } from "node:fs";
import { createRequire } from "node:module";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { pathToFileURL } from "node:url";
import autocannon from "autocannon";

const root = new URL("../", import.meta.url);

export interface RunningServer {
  url: string;
  pid: number;
  /** Everything the server printed, both streams. */
  output: () => string;
  /** Resolves with the exit code (null when a signal ended it) once the process has ended. */
  exited: Promise<number | null>;
  /** Ends it at once, like a power cut or `kill -9`. */
  kill: () => void;
  stop: () => Promise<void>;
}

export interface ServerOptions {
  /** More arguments for server/main.ts (`--host`, `--threads`). */
  args?: string[];
  /** Arguments for node itself (`--cpu-prof`). */
  nodeArgs?: string[];
  /** The job store's folder, kept afterwards; a fresh one removed on stop when absent. */
  dataDir?: string;
}

/** `server/main.ts` on a free port, started with node and the tsx loader (so its pid is the server's). */
export async function startServer(options: ServerOptions = {}): Promise<RunningServer> {
  const data = options.dataDir ?? mkdtempSync(join(tmpdir(), "stitchplan-loopback-"));
  const loader = pathToFileURL(createRequire(import.meta.url).resolve("tsx")).href;
  const child: ChildProcess = spawn(process.execPath, [...(options.nodeArgs ?? []), "--import", loader, new URL("server/main.ts", root).pathname, "--port", "0", "--data", data, ...(options.args ?? [])], {
    stdio: ["ignore", "pipe", "pipe"],
  });
  let text = "";
  child.stdout!.on("data", (d) => (text += d));
  child.stderr!.on("data", (d) => (text += d));
  const exited = new Promise<number | null>((resolve) => child.once("exit", (code) => resolve(code)));
  const url = await new Promise<string>((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error(`the server did not start within 60 s:\n${text}`)), 60_000);
    child.stdout!.on("data", () => {
      const found = /running at (http:\/\/\S+?)\/\s/.exec(text);
      if (found) {
        clearTimeout(timer);
        resolve(found[1]!);
      }
    });
    void exited.then(() => reject(new Error(`the server stopped before it was listening:\n${text}`)));
  });
  const running = () => child.exitCode === null && child.signalCode === null;
  return {
    url,
    pid: child.pid!,
    output: () => text,
    exited,
    kill: () => {
      if (running()) child.kill("SIGKILL");
    },
    stop: async () => {
      if (running()) child.kill("SIGTERM");
      const killer = setTimeout(() => child.kill("SIGKILL"), 5000);
      await exited;
      clearTimeout(killer);
      if (!options.dataDir) rmSync(data, { recursive: true, force: true });
    },
  };
}

let ticksPerSecond: number | undefined;

/** Resident size now and at its peak (MiB), and CPU time used so far (ms, all threads), of a process on Linux. */
export function processStats(pid: number): { rssMiB: number; peakMiB: number; cpuMs: number } {
  ticksPerSecond ??= Number(execFileSync("getconf", ["CLK_TCK"], { encoding: "utf8" }).trim()) || 100;
  const status = readFileSync(`/proc/${pid}/status`, "utf8");
  const kib = (name: string) => Number(new RegExp(`^${name}:\\s+(\\d+)`, "m").exec(status)?.[1] ?? Number.NaN);
  // Fields 14 and 15 of /proc/pid/stat (after the command name in parentheses): user and system ticks.
  const stat = readFileSync(`/proc/${pid}/stat`, "utf8");
  const fields = stat.slice(stat.lastIndexOf(")") + 2).split(" ");
  const ticks = Number(fields[11]) + Number(fields[12]);
  return { rssMiB: kib("VmRSS") / 1024, peakMiB: kib("VmHWM") / 1024, cpuMs: (ticks / ticksPerSecond) * 1000 };
}

/** An example job document by file name (without `.json`). */
export function exampleJob(name: string): Record<string, unknown> {
  return JSON.parse(readFileSync(new URL(`fixtures/examples/${name}.json`, root), "utf8"));
}

export const exampleNames = () =>
  readdirSync(new URL("fixtures/examples/", root))
    .filter((f) => f.endsWith(".json"))
    .map((f) => f.replace(/\.json$/, ""))
    .sort();

/**
 * A job body whose `member.description` carries autocannon's `[<id>]`, so that with `idReplacement`
 * every request is a different job (another fingerprint): each one is designed, none comes from the cache.
 */
export function distinctBody(job: Record<string, unknown>): string {
  const member = { ...(job.member as Record<string, unknown>), description: "load test [<id>]" };
  return JSON.stringify({ ...job, member });
}

export interface Load {
  path: string;
  /** The body of every request, or bodies taken in turn. */
  body: string | string[];
  connections: number;
  /** Every request a different job (`[<id>]` in the body replaced). */
  distinct: boolean;
  /** What a good answer looks like; anything else counts as a bad answer. */
  check: (status: number, body: string) => boolean;
}

export interface LoadFigures {
  requests: number;
  perSecond: number;
  latency: { p50: number; p90: number; p99: number; max: number };
  errors: number;
  timeouts: number;
  non2xx: number;
  bad: number;
  /** The first bad answers, for the report. */
  badSamples: string[];
}

/**
 * Loopback load for `seconds` (and at most `maxRequests` answers), with autocannon. Bodies of every
 * answer are checked; connection errors, timeouts, non-2xx statuses and bad answers are counted.
 */
export async function fire(url: string, load: Load, seconds: number, maxRequests = Number.POSITIVE_INFINITY): Promise<LoadFigures> {
  let bad = 0;
  let answered = 0;
  const badSamples: string[] = [];
  let instance: autocannon.Instance | undefined;
  const options: autocannon.Options = {
    url: url + load.path,
    connections: load.connections,
    duration: seconds,
    timeout: 60,
    idReplacement: load.distinct,
    requests: (Array.isArray(load.body) ? load.body : [load.body]).map((body) => ({
      method: "POST" as const,
      headers: { "content-type": "application/json" },
      body,
      onResponse: (status: number, answer: string) => {
        answered++;
        if (!load.check(status, answer)) {
          bad++;
          if (badSamples.length < 5) badSamples.push(`${status} ${answer.slice(0, 300)}`);
        }
        if (answered >= maxRequests) instance?.stop();
      },
    })),
  };
  const result = await new Promise<autocannon.Result>((resolve, reject) => {
    instance = autocannon(options, (error, figures) => (error ? reject(error) : resolve(figures)));
  });
  const elapsed = result.duration || seconds;
  return {
    requests: result.requests.total,
    perSecond: result.requests.total / elapsed,
    latency: { p50: result.latency.p50, p90: result.latency.p90, p99: result.latency.p99, max: result.latency.max },
    errors: result.errors,
    timeouts: result.timeouts,
    non2xx: result.non2xx,
    bad,
    badSamples,
  };
}

export const isResult = (status: number, body: string) => status === 200 && body.startsWith('{"format":"stitchplan-result"');
export const isJob = (status: number, body: string) => status === 200 && body.startsWith('{"format":"stitchplan-job"');
export const isPdf = (status: number, body: string) => status === 200 && body.startsWith("%PDF-");
