import { z } from "zod";
import { hiddenCharacter } from "../text/plain-text.js";
import type { Quantity } from "../units/quantity.js";

/** Registry of the quantity kind of each number in the job and result schemas. */
export const quantityOf = z.registry<{ quantity: Quantity }>();

/** A number that carries a physical quantity; `schema` defaults to a finite number. */
export function quantity<S extends z.ZodNumber>(kind: Quantity, schema?: S): S {
  const s = (schema ?? z.number()) as S;
  quantityOf.add(s, { quantity: kind });
  return s;
}

export const positive = (kind: Quantity) => quantity(kind, z.number().positive());
export const nonNegative = (kind: Quantity) => quantity(kind, z.number().nonnegative());

/** Identifier a person types and other fields refer to. */
export const Id = z
  .string()
  .min(1, "must not be empty")
  .max(40, "must be at most 40 characters")
  .regex(/^[A-Za-z0-9_.-]+$/, "may hold only letters, digits, '-', '_' and '.'");

/** Free text shown on the page and printed on the worksheet: no control or text-direction characters (core/text/plain-text.ts). */
export const Text = (max = 120) => z.string().max(max, `must be at most ${max} characters`).superRefine(refuseHidden);

export function refuseHidden(text: string, ctx: z.RefinementCtx): void {
  const found = hiddenCharacter(text);
  if (found) ctx.addIssue({ code: "custom", message: `must not hold control or text-direction characters (${found})`, input: text });
}
