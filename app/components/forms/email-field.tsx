import { getInputProps, type FieldMetadata } from "@conform-to/react";
import { FormField, inputClass } from "./form-field";

/** The e-mail a person signs in with, on the sign-in and forgot-password pages; its error is announced with it. */
export function EmailField({ field }: { field: FieldMetadata<string, Record<string, unknown>, string[]> }) {
  return (
    <FormField field={field as never} label="E-mail">
      <input {...getInputProps(field, { type: "email" })} autoComplete="username" className={inputClass} />
    </FormField>
  );
}
