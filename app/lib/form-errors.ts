/** `{ field: "message" }` → conform's `{ field: ["message"] }`. */
export const toFieldErrors = (errors: Record<string, string | undefined>): Record<string, string[]> =>
  Object.fromEntries(Object.entries(errors).map(([k, v]) => [k, v ? [v] : []]));
