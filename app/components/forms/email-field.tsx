import { getInputProps, type FieldMetadata } from "@conform-to/react";
import { FormField, inputClass } from "./form-field";

/** The e-mail a person signs in with, on the sign-in and forgot-password pages; its error is announced with it. */
export function EmailField({ field, label = "E-mail" }: { field: FieldMetadata<string, Record<string, unknown>, string[]>; label?: string }) {
  return (
    <FormField field={field as never} label={label}>
      <input {...getInputProps(field, { type: "email" })} autoComplete="username" className={inputClass} />
    </FormField>
  );
}
