/** Name and version printed on every result and worksheet; a test keeps it equal to package.json. */
export const PROGRAM = { name: "stitchplan", version: "0.1.0" } as const;
