import { parseWithZod } from "@conform-to/zod/v4";
import { configureCoercion } from "@conform-to/zod/v4/future";
import type { $ZodType } from "zod/v4/core";

/**
 * Form numbers as people type them: "1,200" and "1 200" are twelve hundred (thousands separators
 * dropped); anything else that is not a number stays NaN and is refused by name.
 */
const { coerceFormValue } = configureCoercion({
  type: { number: (text) => (/^(?=.*\d)\s*[-+]?[\d,\s]*\.?\d*\s*$/.test(text) ? Number(text.replace(/[,\s]/g, "")) : Number.NaN) },
});

/** The one way a page form is read, in the browser and on the server alike (conform + zod). */
export function parseForm<S extends $ZodType>(formData: FormData | URLSearchParams, schema: S) {
  return parseWithZod(formData, { schema: coerceFormValue(schema), disableAutoCoercion: true });
}
