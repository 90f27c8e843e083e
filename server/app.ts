import { availableParallelism } from "node:os";
import type { Duplex } from "node:stream";
import { dirname, join } from "node:path";
import { fileURLToPath } from "node:url";
import fastifyStatic from "@fastify/static";
import { build } from "esbuild";
import Fastify, { type FastifyError, type FastifyInstance } from "fastify";
import { DesignQueues, DesignThreads, prepareDesignThreads } from "./design-threads.js";
import { ApiError, errorBody, type ErrorCode } from "./errors.js";
import { loadExamples } from "./examples.js";
import { hostCheck, loopbackHosts } from "./host-check.js";
import { boundedIssues, serviceLimits } from "./job-limits.js";
import { requestGuard, rewriteUrl } from "./request-guard.js";
import { ResultCache } from "./result-cache.js";
import { hardeningHeaders, securityHeaders } from "./security-headers.js";
import { apiRoutes } from "./routes/api.js";
import { storeRoutes } from "./routes/store.js";
import type { StoreOptions } from "./store/job-store.js";

export const projectRoot = join(dirname(fileURLToPath(import.meta.url)), "..");

export interface AppOptions {
  /** Folder of example job documents. */
  examplesDir?: string;
  /** Largest accepted request body, bytes. */
  bodyLimit?: number;
  /** Folder of the job store's database; without it the store's routes are not served. */
  dataDir?: string;
  /** The store's clock and test hooks. */
  store?: StoreOptions;
  /** Threads that design; one fewer than the cores (at least 1, at most 4) by default. Worksheets have their own. */
  designThreads?: number;
  /** Threads that draw worksheets; 1 by default. */
  worksheetThreads?: number;
  /** Time limits, ms: a design or a worksheet still running then is stopped (README "Performance and limits"). */
  timeLimits?: { designMs?: number; worksheetMs?: number };
  /** Heap of each thread, MiB, and how many tasks may wait (README "Performance and limits"). */
  threadLimits?: { memoryMb?: number; designQueue?: number; worksheetQueue?: number };
  /** Host names the service answers to; loopback names by default, "any" when it listens on another address. */
  allowedHosts?: readonly string[] | "any";
  /** Memory for answers already computed, bytes; 0 turns the cache off. */
  resultCacheBytes?: number;
  /** Start the design threads with the app rather than on the first design (a second saved on the first answer). */
  warmThreads?: boolean;
}

/** The page's script, bundled once from web/src when the app is built. */
async function bundlePage(): Promise<string> {
  const out = await build({
    entryPoints: [join(projectRoot, "web/src/main.ts")],
    bundle: true,
    write: false,
    format: "esm",
    target: "es2022",
    minify: true,
    sourcemap: false,
    logLevel: "silent",
  });
  return out.outputFiles[0]!.text;
}

/** Builds the HTTP app without listening: tests inject requests or listen on port 0. */
export async function buildApp(options: AppOptions = {}): Promise<FastifyInstance> {
  const app = Fastify({ logger: false, bodyLimit: options.bodyLimit ?? serviceLimits.bodyBytes, rewriteUrl: (request) => rewriteUrl(request.url), clientErrorHandler: answerClientError });
  // Only JSON is read: a text body must not reach a route as a string.
  app.removeContentTypeParser(["text/plain"]);
  const examples = loadExamples(options.examplesDir ?? join(projectRoot, "fixtures/examples"));
  const [pageScript] = await Promise.all([bundlePage(), prepareDesignThreads()]);

  const limits = { designMs: options.timeLimits?.designMs ?? serviceLimits.designMs, worksheetMs: options.timeLimits?.worksheetMs ?? serviceLimits.worksheetMs };
  const memoryMb = options.threadLimits?.memoryMb ?? serviceLimits.threadMemoryMb;
  const designs = new DesignQueues(
    new DesignThreads({
      name: "design",
      threads: options.designThreads ?? Math.max(1, Math.min(4, availableParallelism() - 1)),
      timeLimitMs: () => limits.designMs,
      memoryMb,
      queueLength: options.threadLimits?.designQueue ?? serviceLimits.designQueue,
    }),
    new DesignThreads({
      name: "worksheet",
      threads: options.worksheetThreads ?? 1,
      timeLimitMs: () => limits.worksheetMs,
      memoryMb,
      queueLength: options.threadLimits?.worksheetQueue ?? serviceLimits.worksheetQueue,
    }),
  );
  app.addHook("onClose", () => designs.close());
  if (options.warmThreads) designs.warm();
  const cache = new ResultCache(options.resultCacheBytes ?? 32 * 1024 * 1024);

  app.setErrorHandler((error: FastifyError | ApiError, request, reply) => {
    if (error instanceof ApiError) {
      if (error.extra.retryAfterSeconds) reply.header("retry-after", String(error.extra.retryAfterSeconds));
      return reply.status(errorBody(error.code).statusCode).send(errorBody(error.code, error.message, boundedIssues(error.issues)));
    }
    const code = fastifyCode(error as FastifyError);
    if (code === "ERR_BODY_TOO_LARGE") {
      const limit = mebibytes(request.routeOptions.bodyLimit ?? serviceLimits.bodyBytes);
      return reply.status(413).send(errorBody(code, `The request body is larger than the limit of ${limit}.`, [{ path: "(body)", message: `must be at most ${limit}` }]));
    }
    // Fastify's own refusals keep the documented body; a 400 names what was wrong with the request (Fastify's sentence, which quotes no input).
    if (code) return reply.status(errorBody(code).statusCode).send(errorBody(code, undefined, code === "ERR_INPUT_INVALID" ? [{ path: "(request)", message: String((error as FastifyError).message).slice(0, 200) }] : []));
    return reply.status(500).send(errorBody("ERR_INTERNAL"));
  });
  app.setNotFoundHandler((_request, reply) => reply.status(404).send(errorBody("ERR_NOT_FOUND")));
  // The headers first, so that every refusal below carries them too.
  await securityHeaders(app);
  const allowedHosts = options.allowedHosts ?? loopbackHosts;
  if (allowedHosts !== "any") hostCheck(app, allowedHosts);
  requestGuard(app);

  await app.register(apiRoutes, { examples, designs, cache });
  if (options.dataDir) await app.register(storeRoutes, { dataDir: options.dataDir, store: options.store, designs });
  app.get("/app.js", (_request, reply) => reply.type("text/javascript; charset=utf-8").header("cache-control", "no-cache").send(pageScript));
  await app.register(fastifyStatic, { root: join(projectRoot, "web"), index: ["index.html"], allowedPath: (path) => !path.startsWith("/src/") });
  return app;
}

/** A request Node cannot parse (a malformed request line or header): the documented 400, with the hardening headers. */
function answerClientError(error: NodeJS.ErrnoException, socket: Duplex): void {
  if (error.code === "ECONNRESET" || !socket.writable) {
    socket.destroy();
    return;
  }
  const body = JSON.stringify(errorBody("ERR_INPUT_INVALID", "The request is not well-formed HTTP.", [{ path: "(request)", message: "cannot be read as an HTTP request" }]));
  const headers = { ...hardeningHeaders, "content-type": "application/json; charset=utf-8", "content-length": String(Buffer.byteLength(body)), connection: "close" };
  socket.end(`HTTP/1.1 400 Bad Request\r\n${Object.entries(headers).map(([k, v]) => `${k}: ${v}`).join("\r\n")}\r\n\r\n${body}`);
}

const mebibytes = (bytes: number) => (bytes % (1024 * 1024) === 0 ? `${bytes / (1024 * 1024)} MiB` : `${bytes} bytes`);

function fastifyCode(error: FastifyError): ErrorCode | undefined {
  switch (error.code) {
    case "FST_ERR_CTP_INVALID_JSON_BODY":
      return "ERR_JSON_MALFORMED";
    case "FST_ERR_CTP_EMPTY_JSON_BODY":
      return "ERR_BODY_EMPTY";
    case "FST_ERR_CTP_BODY_TOO_LARGE":
      return "ERR_BODY_TOO_LARGE";
    case "FST_ERR_CTP_INVALID_MEDIA_TYPE":
      return "ERR_UNSUPPORTED_MEDIA_TYPE";
    default:
      // A static file refused (403) or missing is, to the client, nothing at this address.
      return error.statusCode === 404 || error.statusCode === 403 ? "ERR_NOT_FOUND" : error.statusCode && error.statusCode < 500 ? "ERR_INPUT_INVALID" : undefined;
  }
}
