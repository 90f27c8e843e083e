import { join, resolve } from "node:path";
import { buildApp, projectRoot } from "./app.js";
import { loopbackHosts } from "./host-check.js";
import { tuneJit } from "./jit-tuning.js";
import { StoreOpenError } from "./store/open-database.js";

export interface ServeOptions {
  port: string;
  host: string;
  /** Data folder of the job store; STITCHPLAN_DATA or data/ beside the project when absent. */
  data?: string | undefined;
  /** Design threads; one fewer than the cores (at least 1) when absent. */
  threads?: string | undefined;
}

/** The job store's folder: `--data`, else STITCHPLAN_DATA, else `data/` beside the project. */
export function dataFolder(option?: string): string {
  return resolve(option || process.env.STITCHPLAN_DATA || join(projectRoot, "data"));
}

/** Checks the options, builds the app and listens; prints the address and the data folder. Returns an exit code on failure. */
export async function serve(options: ServeOptions): Promise<number | undefined> {
  const port = Number(options.port);
  if (!/^\d+$/.test(options.port) || !Number.isInteger(port) || port < 0 || port > 65535) {
    console.error(`--port must be a whole number from 0 to 65535, not "${options.port}"`);
    return 2;
  }
  const loopback = options.host === "127.0.0.1" || options.host === "localhost" || options.host === "::1";
  if (!loopback) {
    console.warn(`Warning: listening on ${options.host} makes the service reachable from other machines. It has no login; use only on a trusted network.`);
  }
  const threads = options.threads === undefined ? undefined : Number(options.threads);
  if (threads !== undefined && (!/^\d+$/.test(options.threads!) || threads < 1 || threads > 64)) {
    console.error(`--threads must be a whole number from 1 to 64, not "${options.threads}"`);
    return 2;
  }
  const dataDir = dataFolder(options.data);
  // Before any thread starts: the design threads run for hours and should settle on their optimised code soon.
  tuneJit("repeating");
  let app;
  try {
    // Reached under other names than the loopback ones, the Host header cannot be checked against a list.
    app = await buildApp({ dataDir, warmThreads: true, allowedHosts: loopback ? loopbackHosts : "any", ...(threads ? { designThreads: threads } : {}) });
  } catch (error) {
    if (error instanceof StoreOpenError) {
      console.error(error.message);
      return 1;
    }
    throw error;
  }
  try {
    await app.listen({ port, host: options.host });
  } catch (error) {
    await app.close();
    const code = (error as NodeJS.ErrnoException).code;
    console.error(code === "EADDRINUSE" ? `Port ${port} on ${options.host} is already in use; pick another with --port.` : `Cannot listen on ${options.host}:${port}: ${(error as Error).message}`);
    return 1;
  }
  const address = app.server.address();
  const shown = typeof address === "object" && address ? address.port : port;
  const store = (await app.inject("/api/store")).json() as { file: string; upgrade: { from: number; to: number; backup: string | null } };
  console.log(`Job store: ${store.file}  (--data or STITCHPLAN_DATA picks another folder)`);
  if (store.upgrade.backup) console.log(`  upgraded from schema version ${store.upgrade.from} to ${store.upgrade.to}; the file as it was is kept at ${store.upgrade.backup}`);
  console.log(`stitchplan is running at http://${options.host === "::1" ? "[::1]" : options.host}:${shown}/  (Ctrl+C stops it)`);
  for (const signal of ["SIGINT", "SIGTERM"] as const) process.on(signal, () => void app.close().then(() => process.exit(0)));
  return undefined;
}
