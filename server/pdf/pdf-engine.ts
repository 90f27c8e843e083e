import { createRequire } from "node:module";

/**
 * pdfkit and fontkit, loaded on the first worksheet and not before. A design thread or a batch worker
 * that draws no worksheet never loads them: they were about half a thread's start (a batch worker
 * ready in 107–130 ms instead of 207–255 ms, eight starts each, in turns). Loaded through their CommonJS builds: a dynamic `import()`
 * here would make tsx, which runs the program from source, rewrite the threads' whole bundle when it
 * loads it. Every worksheet's bytes are the same with either build (the examples' worksheets and field
 * sheets compared before this change).
 */
const load = createRequire(import.meta.url);

let pdfkit: typeof import("pdfkit") | undefined;
let fontkit: typeof import("fontkit") | undefined;

/** pdfkit's document class. */
export const PdfDocument = (): typeof import("pdfkit") => (pdfkit ??= load("pdfkit") as typeof import("pdfkit"));

/** fontkit (pdfkit's own font engine, the same copy pdfkit loads). */
export const fontEngine = (): typeof import("fontkit") => (fontkit ??= load("fontkit") as typeof import("fontkit"));
