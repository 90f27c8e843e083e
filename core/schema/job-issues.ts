import { z } from "zod";

/** A problem with a job document, at a field path such as `parts[1].shape.h`. */
export interface JobIssue {
  path: string;
  message: string;
}

export function formatPath(path: readonly PropertyKey[]): string {
  let out = "";
  for (const key of path) {
    if (typeof key === "number") out += `[${key}]`;
    else out += out ? `.${String(key)}` : String(key);
  }
  return out || "(document)";
}

/** zod issues as sentences a person understands, each with its field path. */
export function issuesFromZod(error: z.ZodError): JobIssue[] {
  return error.issues.map((issue) => ({ path: formatPath(issue.path), message: sentence(issue) }));
}

function sentence(issue: z.core.$ZodIssue): string {
  switch (issue.code) {
    case "invalid_type":
      if (issue.input === undefined) return `is required (expected ${article(issue.expected)})`;
      return `must be ${article(issue.expected)}, not ${describe(issue.input)}`;
    case "too_small":
      if (issue.origin === "array") return issue.message.startsWith("Too small") ? `needs at least ${issue.minimum} item(s)` : issue.message;
      if (issue.origin === "string") return issue.message.startsWith("Too small") ? `must not be empty` : issue.message;
      return `must be ${issue.inclusive ? "at least" : "greater than"} ${issue.minimum}${numberInput(issue.input)}`;
    case "too_big":
      if (issue.origin === "array") return issue.message.startsWith("Too big") ? `may hold at most ${issue.maximum} item(s)` : issue.message;
      if (issue.origin === "string") return issue.message.startsWith("Too big") ? `must be at most ${issue.maximum} characters` : issue.message;
      return `must be ${issue.inclusive ? "at most" : "less than"} ${issue.maximum}${numberInput(issue.input)}`;
    case "unrecognized_keys":
      return `has field(s) this document does not use: ${issue.keys.join(", ")} (check the spelling)`;
    case "invalid_value":
      if (issue.input === undefined) return `is required: ${issue.values.map((v) => JSON.stringify(v)).join(" or ")}`;
      return `must be one of: ${issue.values.map((v) => JSON.stringify(v)).join(", ")}, not ${JSON.stringify(issue.input)}`;
    case "invalid_union":
      return issue.message.startsWith("Invalid input") ? "does not match any of the accepted forms" : issue.message;
    case "not_multiple_of":
      return `must be a multiple of ${issue.divisor}`;
    default:
      return issue.message;
  }
}

function article(expected: string): string {
  const word = expected === "nan" ? "number" : expected;
  return /^[aeiou]/.test(word) ? `an ${word}` : `a ${word}`;
}

function describe(input: unknown): string {
  if (input === null) return "null";
  if (Array.isArray(input)) return "a list";
  if (typeof input === "string") return `the text ${JSON.stringify(input.length > 30 ? `${input.slice(0, 30)}…` : input)}`;
  if (typeof input === "number") return Number.isNaN(input) ? "NaN" : `${input}`;
  return `${article(typeof input)}`;
}

function numberInput(input: unknown): string {
  return typeof input === "number" ? ` (got ${input})` : "";
}
