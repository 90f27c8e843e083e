import type { FastifyInstance } from "fastify";
import { ApiError } from "./errors.js";

/** The names under which this machine reaches itself; any port. */
export const loopbackHosts = ["localhost", "127.0.0.1", "[::1]"];

const hostName = (host: string) => (host.startsWith("[") ? host.slice(0, host.indexOf("]") + 1) : host.split(":")[0]!).toLowerCase();

/**
 * Refuses requests addressed to another host name. A web page elsewhere can point its own name at
 * 127.0.0.1 (DNS rebinding) and then read this service as if it were its own origin; the Host header
 * it sends still carries its name.
 */
export function hostCheck(app: FastifyInstance, allowed: readonly string[]): void {
  const names = new Set(allowed.map((h) => h.toLowerCase()));
  app.addHook("onRequest", async (request) => {
    const host = request.headers.host ?? "";
    if (!names.has(hostName(host))) {
      throw new ApiError("ERR_HOST_NOT_ALLOWED", `This service answers requests addressed to ${[...names].join(", ")}, not ${JSON.stringify(host.slice(0, 100))}.`, [
        { path: "(headers).host", message: `must name this machine (${[...names].join(", ")})` },
      ]);
    }
  });
}
