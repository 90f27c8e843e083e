// Run by jit-tuning.test.ts in a process of its own: sets the JIT profile named on the command line,
// designs every example three times (so that the optimised code runs too) and prints the budget set and
// a digest of every answer, which must equal the digest made with V8's own settings.
import { compileInThread, tuneJit, type JitProfile } from "../../server/jit-tuning.js";
import { examplesDigest } from "./jit-tuning-digest.js";

const profile = process.argv[2] as JitProfile;
const budget = tuneJit(profile);
// As a batch's workers run: optimised on the thread that runs the code (V8 reads it when an isolate starts: a thread of its own).
if (process.argv[3] === "in-thread") {
  compileInThread();
  // From source through tsx (the bundler gives only server/ files their own import.meta.url, which the examples' reader needs).
  const { startThread } = await import("../../server/thread-entry.js");
  const worker = startThread(new URL("./jit-tuning-child-thread.ts", import.meta.url));
  const digest = await new Promise<string>((resolve, reject) => worker.once("message", resolve).once("error", reject));
  process.stdout.write(JSON.stringify({ budget: budget ?? null, digest }));
  process.exit(0);
}
process.stdout.write(JSON.stringify({ budget: budget ?? null, digest: examplesDigest(3) }));
