import { getFormProps, getInputProps, type SubmissionResult } from "@conform-to/react";
import { useCheckedForm } from "~/components/forms/use-checked-form";
import { useTranslation } from "react-i18next";
import { Form, useNavigation } from "react-router";
import { changePasswordSchema, choosePasswordSchema, MIN_PASSWORD } from "~/lib/people/schema";
import { FormField, inputClass } from "~/components/forms/form-field";

/** A new password typed twice, checked by the same schema here and on the server (joining, resetting, changing). */
export function ChoosePasswordForm({
  lastResult,
  submitLabel,
  askCurrent = false,
}: {
  lastResult?: SubmissionResult<string[]> | null;
  submitLabel: string;
  /** Signed in and changing it: the current password comes first. */
  askCurrent?: boolean;
}) {
  const busy = useNavigation().state !== "idle";
  const { t } = useTranslation();
  const [form, fields] = useCheckedForm((askCurrent ? changePasswordSchema : choosePasswordSchema) as typeof changePasswordSchema, { lastResult });
  return (
    <Form method="post" {...getFormProps(form)} className="mt-6 space-y-4 rounded-lg border-2 border-ink bg-paper p-5">
      {askCurrent ? (
        <FormField field={fields.current} label={t("password.current")}>
          <input {...getInputProps(fields.current, { type: "password" })} autoComplete="current-password" className={inputClass} />
        </FormField>
      ) : null}
      <FormField field={fields.password} label={askCurrent ? t("password.new") : t("password.password")} hint={t("password.hint", { min: MIN_PASSWORD })}>
        <input {...getInputProps(fields.password, { type: "password" })} autoComplete="new-password" className={inputClass} />
      </FormField>
      <FormField field={fields.confirm} label={t("password.again")}>
        <input {...getInputProps(fields.confirm, { type: "password" })} autoComplete="new-password" className={inputClass} />
      </FormField>
      <button type="submit" disabled={busy} className="min-h-14 w-full rounded-md bg-go text-lg font-bold text-white">
        {busy ? t("password.saving") : submitLabel}
      </button>
    </Form>
  );
}
