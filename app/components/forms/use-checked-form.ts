import { useForm, type SubmissionResult } from "@conform-to/react";
import type { $ZodType, input, output } from "zod/v4/core";
import { parseForm } from "~/lib/forms/parse";

type Fields = Record<string, unknown>;

/**
 * A page form checked by its zod schema in the browser before it is sent, and again on the server
 * (conform). Field first: checked on submit, then as the person types — a message appearing when
 * focus leaves a field would move the button under the thumb.
 */
export function useCheckedForm<S extends $ZodType<Fields, Fields>>(
  schema: S,
  options: { id?: string; lastResult?: SubmissionResult<string[]> | null; defaultValue?: Parameters<typeof useForm<input<S>>>[0]["defaultValue"] } = {},
) {
  return useForm<input<S>, output<S>>({
    id: options.id,
    lastResult: options.lastResult,
    defaultValue: options.defaultValue,
    onValidate: ({ formData }) => parseForm(formData, schema),
    shouldValidate: "onSubmit",
    shouldRevalidate: "onInput",
  });
}
