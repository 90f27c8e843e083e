import { createRequire } from "node:module";
import { dirname, join } from "node:path";
import { pathToFileURL } from "node:url";
import { Worker, type ResourceLimits } from "node:worker_threads";

/**
 * A worker thread on a module of this program, given as its `.ts` source URL. Node 20 does not apply a
 * loader given with --import to a worker's entry, so from source the worker first registers tsx itself.
 */
export function startThread(entry: URL, resourceLimits?: ResourceLimits): Worker {
  const options = resourceLimits ? { resourceLimits } : {};
  if (!import.meta.url.endsWith(".ts")) return new Worker(new URL(entry.href.replace(/\.ts$/, ".js")), options);
  // tsx/esm/api's ESM file (require.resolve would pick its CommonJS twin).
  const tsxApi = pathToFileURL(join(dirname(createRequire(import.meta.url).resolve("tsx/package.json")), "dist/esm/api/index.mjs")).href;
  const code = `import(${JSON.stringify(tsxApi)}).then((tsx) => { tsx.register(); return import(${JSON.stringify(entry.href)}); });`;
  return new Worker(code, { ...options, eval: true });
}
