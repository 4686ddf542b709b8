import type { FieldMetadata } from "@conform-to/react";
import { useSay } from "~/components/ui/say";

/** A label, its control and the field's own error message, wired for screen readers. */
export function FormField({
  field,
  label,
  hint,
  children,
}: {
  field: FieldMetadata<unknown, Record<string, unknown>, string[]>;
  label: string;
  hint?: string;
  children: React.ReactNode;
}) {
  const say = useSay();
  return (
    <div>
      <label htmlFor={field.id} className="block font-bold">
        {label}
      </label>
      {hint ? (
        <p id={`${field.id}-hint`} className="text-sm">
          {hint}
        </p>
      ) : null}
      {children}
      {field.errors?.length ? (
        <p id={field.errorId} className="mt-1 font-bold text-stop">
          {field.errors.map(say).join(" ")}
        </p>
      ) : null}
    </div>
  );
}

export const inputClass =
  "mt-1 block min-h-14 w-full rounded-md border-2 border-ink bg-paper px-3 text-lg aria-[invalid=true]:border-stop aria-[invalid=true]:border-4";
