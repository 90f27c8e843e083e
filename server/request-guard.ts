import type { FastifyInstance, FastifyRequest } from "fastify";
import { ApiError } from "./errors.js";

const CHANGING = new Set(["POST", "PUT", "PATCH", "DELETE"]);

/** How deep a request body may nest; a job document is about eight levels, a project file a few more. */
export const MAX_BODY_DEPTH = 64;

/** Where a malformed URL or one with a `..` segment is sent: no route, so the 404 answer with every header. */
export const NOWHERE = "/.nowhere";

/** For Fastify's `rewriteUrl`: a path that does not decode, or that climbs with `..`, is nowhere (404). */
export function rewriteUrl(url: string | undefined): string {
  const raw = url ?? "/";
  const path = raw.split("?")[0]!;
  try {
    if (decodeURIComponent(path).split(/[/\\]/).includes("..")) return NOWHERE;
  } catch {
    return NOWHERE;
  }
  return raw;
}

/** The origin a request came from names another site than the one it was sent to. */
function crossSite(request: FastifyRequest): string | undefined {
  const site = request.headers["sec-fetch-site"];
  if (site === "cross-site" || site === "same-site") return `Sec-Fetch-Site is ${JSON.stringify(site)}`;
  const origin = request.headers.origin;
  if (origin === undefined) return undefined;
  try {
    // Through URL both, so that a default port written out or left off compares the same.
    const from = new URL(origin);
    const to = new URL(`${from.protocol}//${request.headers.host ?? ""}`);
    if (from.host === to.host) return undefined;
  } catch {
    // An origin that is not a URL ("null" from a sandboxed page) is another site.
  }
  return `Origin is ${JSON.stringify(origin.slice(0, 100))}`;
}

/** Depth of nested arrays and objects, without recursion (a body may nest far deeper than the stack). */
function depthOver(value: unknown, limit: number): boolean {
  const stack: [unknown, number][] = [[value, 1]];
  while (stack.length > 0) {
    const [v, depth] = stack.pop()!;
    if (v === null || typeof v !== "object") continue;
    if (depth > limit) return true;
    for (const child of Array.isArray(v) ? v : Object.values(v)) if (child !== null && typeof child === "object") stack.push([child, depth + 1]);
  }
  return false;
}

/**
 * Requests that change something: only from this service's own page (a page on another site can send a
 * form or a plain-text POST without asking first), and only as JSON. Bodies nested deeper than any job
 * are refused before any code walks them.
 */
export function requestGuard(app: FastifyInstance): void {
  app.addHook("onRequest", async (request) => {
    if (!CHANGING.has(request.method)) return;
    const why = crossSite(request);
    if (why) {
      throw new ApiError("ERR_CROSS_SITE", `This service takes changes only from its own page; this request came from another site (${why}). Nothing was stored or changed.`, [
        { path: "(headers).origin", message: "must be this service's own address" },
      ]);
    }
    const type = (request.headers["content-type"] ?? "").split(";")[0]!.trim().toLowerCase();
    if (type !== "application/json") {
      throw new ApiError("ERR_UNSUPPORTED_MEDIA_TYPE", `Send the request body as JSON with Content-Type: application/json${type ? `, not ${JSON.stringify(type.slice(0, 100))}` : " (the request had none)"}.`, [
        { path: "(headers).content-type", message: "must be application/json" },
      ]);
    }
  });
  app.addHook("preValidation", async (request) => {
    if (request.body !== undefined && depthOver(request.body, MAX_BODY_DEPTH)) {
      throw new ApiError("ERR_INPUT_INVALID", `The request body is nested more than ${MAX_BODY_DEPTH} levels deep; no job document is.`, [{ path: "(body)", message: `must nest at most ${MAX_BODY_DEPTH} levels deep` }]);
    }
  });
}
