import { z } from "zod";

// The page runs under a CSP without 'unsafe-eval': zod must not probe or compile with new Function
// (its probe alone is reported as a violation). Imported first by main.ts, before any schema is parsed.
z.config({ jitless: true });
