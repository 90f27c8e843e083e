// Run by jit-tuning.test.ts in a process of its own: sets the JIT profile named on the command line,
// designs every example three times (so that the optimised code runs too) and prints the budget set and
// a digest of every answer, which must equal the digest made with V8's own settings.
import { tuneJit, type JitProfile } from "../../server/jit-tuning.js";
import { examplesDigest } from "./jit-tuning-digest.js";

const profile = process.argv[2] as JitProfile;
const budget = tuneJit(profile);
process.stdout.write(JSON.stringify({ budget: budget ?? null, digest: examplesDigest(3) }));
