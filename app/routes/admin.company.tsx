import { getFormProps, getSelectProps } from "@conform-to/react";
import { parseForm } from "~/lib/forms/parse";
import { useCheckedForm } from "~/components/forms/use-checked-form";
import { data, Form } from "react-router";
import { FormField, inputClass } from "~/components/forms/form-field";
import { DoneNote } from "~/components/ui/done-note";
import { PageTitle } from "~/components/ui/page-title";
import { companySettingsSchema } from "~/lib/people/company-schema";
import { companySettings, saveCompanySettings } from "~/services/company.server";
import { requirePermission } from "~/services/guards.server";
import { readForm } from "~/services/read-request.server";
import type { Route } from "./+types/admin.company";

export async function loader({ request, context }: Route.LoaderArgs) {
  const user = await requirePermission({ request, context }, "company-settings");
  return { company: await companySettings(user), zones: Intl.supportedValuesOf("timeZone") };
}

export async function action({ request, context }: Route.ActionArgs) {
  const user = await requirePermission({ request, context }, "company-settings");
  const submission = parseForm(await readForm(request), companySettingsSchema);
  if (submission.status !== "success") return data({ result: submission.reply(), message: null }, { status: 400 });
  await saveCompanySettings(user, submission.value);
  return { result: submission.reply(), message: `Saved. Times now show in ${submission.value.timeZone}.` };
}

export default function CompanyPage({ loaderData, actionData }: Route.ComponentProps) {
  const { company, zones } = loaderData;
  const [form, fields] = useCheckedForm(companySettingsSchema, { lastResult: actionData?.result, defaultValue: { timeZone: company.timeZone } });
  return (
    <>
      <PageTitle lead={company.name}>Company settings</PageTitle>
      <DoneNote message={actionData?.message} />
      <Form method="post" {...getFormProps(form)} className="space-y-4 rounded-lg border-2 border-ink bg-paper p-4">
        <FormField field={fields.timeZone} label="Time zone" hint="Screens, e-mails, the digest and CSV files show times in this zone.">
          <select {...getSelectProps(fields.timeZone)} key={fields.timeZone.key} className={inputClass}>
            {zones.map((z) => (
              <option key={z} value={z}>
                {z}
              </option>
            ))}
          </select>
        </FormField>
        <button type="submit" className="min-h-14 w-full rounded-lg bg-go text-lg font-bold text-white">
          Save
        </button>
      </Form>
    </>
  );
}

export const meta: Route.MetaFunction = () => [{ title: "Company settings · Tankside" }];
