import { z } from "zod";

/** Bad calculator input: each field named with what is wrong, never NaN or Infinity out. */
export class FieldMathInputError extends Error {
  constructor(readonly fields: Record<string, string>) {
    super(
      Object.entries(fields)
        .map(([k, v]) => `${k}: ${v}`)
        .join("; "),
    );
  }
}

/** Parses with the schema or throws FieldMathInputError naming each bad field. */
export function parseInput<S extends z.ZodType>(schema: S, input: unknown): z.infer<S> {
  const parsed = schema.safeParse(input);
  if (parsed.success) return parsed.data;
  const fields: Record<string, string> = {};
  for (const issue of parsed.error.issues) fields[issue.path.join(".") || "input"] ??= issue.message;
  throw new FieldMathInputError(fields);
}

/** A finite number in a plausible range, with messages in plain words. */
export const num = (label: string, min: number, max: number, opts: { minInclusive?: boolean } = {}) =>
  z
    .number({ error: `${label} must be a number` })
    .refine(Number.isFinite, `${label} must be a number`)
    .refine((v) => (opts.minInclusive === false ? v > min : v >= min), `${label} must be ${opts.minInclusive === false ? "more than" : "at least"} ${min}`)
    .refine((v) => v <= max, `${label} over ${max.toLocaleString("en-US")} is not plausible`);
