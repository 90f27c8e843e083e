import helmet from "@fastify/helmet";
import type { FastifyInstance } from "fastify";

/**
 * Security headers on every answer. The page loads only its own script, style sheet and icon and
 * talks only to this service: no inline script or style, no other origin, no framing.
 */
export const contentSecurityPolicy = {
  "default-src": ["'self'"],
  "script-src": ["'self'"],
  "script-src-attr": ["'none'"],
  "style-src": ["'self'"],
  "img-src": ["'self'", "data:"],
  "font-src": ["'self'"],
  "connect-src": ["'self'"],
  "object-src": ["'none'"],
  "base-uri": ["'none'"],
  "form-action": ["'self'"],
  "frame-ancestors": ["'none'"],
};

/**
 * The headers helmet sets on every answer, written out for the one answer Fastify gives outside its hooks:
 * a request Node cannot parse (`clientError`). test/server/security.test.ts checks they match helmet's.
 */
export const hardeningHeaders: Record<string, string> = {
  "content-security-policy": Object.entries(contentSecurityPolicy)
    .map(([k, v]) => `${k} ${v.join(" ")}`)
    .join(";"),
  "cross-origin-opener-policy": "same-origin",
  "cross-origin-resource-policy": "same-origin",
  "origin-agent-cluster": "?1",
  "referrer-policy": "no-referrer",
  "x-content-type-options": "nosniff",
  "x-dns-prefetch-control": "off",
  "x-download-options": "noopen",
  "x-frame-options": "SAMEORIGIN",
  "x-permitted-cross-domain-policies": "none",
  "x-xss-protection": "0",
};

export async function securityHeaders(app: FastifyInstance): Promise<void> {
  await app.register(helmet, {
    contentSecurityPolicy: { useDefaults: false, directives: contentSecurityPolicy },
    // Plain HTTP on this machine: HSTS would mean nothing here and upgrading requests would break the page.
    strictTransportSecurity: false,
  });
}
