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

export async function securityHeaders(app: FastifyInstance): Promise<void> {
  await app.register(helmet, {
    contentSecurityPolicy: { useDefaults: false, directives: contentSecurityPolicy },
    // Plain HTTP on this machine: HSTS would mean nothing here and upgrading requests would break the page.
    strictTransportSecurity: false,
  });
}
