import { getFormProps, getInputProps, getSelectProps, getTextareaProps, type SubmissionResult } from "@conform-to/react";
import { parseForm } from "~/lib/forms/parse";
import { useCheckedForm } from "~/components/forms/use-checked-form";
import { data, Form } from "react-router";
import { FormField, inputClass } from "~/components/forms/form-field";
import { DoneNote } from "~/components/ui/done-note";
import { PageTitle } from "~/components/ui/page-title";
import { companySettingsSchema } from "~/lib/people/company-schema";
import { LOAD_STEP_LABELS, loadRulesSchema, type LoadStep } from "~/lib/field-math/load-rules";
import { companySettings, saveCompanySettings, saveLoadRules } from "~/services/company.server";
import { requirePermission } from "~/services/guards.server";
import { readForm } from "~/services/read-request.server";
import type { Route } from "./+types/admin.company";

export async function loader({ request, context }: Route.LoaderArgs) {
  const user = await requirePermission({ request, context }, "company-settings");
  return { company: await companySettings(user), zones: Intl.supportedValuesOf("timeZone") };
}

export async function action({ request, context }: Route.ActionArgs) {
  const user = await requirePermission({ request, context }, "company-settings");
  const form = await readForm(request);
  if (form.get("settings") === "load-rules") {
    const submission = parseForm(form, loadRulesSchema);
    if (submission.status !== "success") return data({ result: null, rulesResult: submission.reply(), message: null }, { status: 400 });
    await saveLoadRules(user, submission.value);
    return { result: null, rulesResult: submission.reply(), message: "Saved. Load cards now use these rules." };
  }
  const submission = parseForm(form, companySettingsSchema);
  if (submission.status !== "success") return data({ result: submission.reply(), rulesResult: null, message: null }, { status: 400 });
  await saveCompanySettings(user, submission.value);
  return { result: submission.reply(), rulesResult: null, message: `Saved. Times now show in ${submission.value.timeZone}.` };
}

export default function CompanyPage({ loaderData, actionData }: Route.ComponentProps) {
  const { company, zones } = loaderData;
  const [form, fields] = useCheckedForm(companySettingsSchema, { lastResult: actionData?.result, defaultValue: { timeZone: company.timeZone } });
  return (
    <>
      <PageTitle lead={company.name}>Company settings</PageTitle>
      <DoneNote message={actionData?.rulesResult ? null : actionData?.message} />
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
          Save time zone
        </button>
      </Form>
      <LoadRulesForm rules={company.loadRules} lastResult={actionData?.rulesResult ?? null} message={actionData?.rulesResult ? actionData.message : null} />
    </>
  );
}

/** The company's rules for the load card: where fiber starts and ends, the seed limit, the fiber ceiling, pace and loading order. */
function LoadRulesForm({
  rules,
  lastResult,
  message,
}: {
  rules: Route.ComponentProps["loaderData"]["company"]["loadRules"];
  lastResult: SubmissionResult<string[]> | null;
  message: string | null;
}) {
  const [form, fields] = useCheckedForm(loadRulesSchema, { id: "load-rules", lastResult, defaultValue: rules });
  const order = fields.order.getFieldList();
  const number = (field: typeof fields.paceFt) => ({ ...getInputProps(field, { type: "text" }), inputMode: "decimal" as const, className: inputClass });
  return (
    <Form method="post" {...getFormProps(form)} className="mt-6 space-y-4 rounded-lg border-2 border-ink bg-paper p-4">
      <h2 className="text-2xl font-bold">Loading rules</h2>
      <p>
        The load card on every crew phone works to these. Defaults follow the USDA NRCS Wyoming hydroseeding fact sheet and common practice; change them to your
        products&apos; labels.
      </p>
      <input type="hidden" name="settings" value="load-rules" />
      {form.errors?.length ? <p className="font-bold text-stop">{form.errors.join(" ")}</p> : null}
      <FormField
        field={fields.fiberStartPercent}
        label="Fiber may start at (% of the tank)"
        hint="Below this the paddles are not covered: fiber bends them and plugs valves. Half is common practice."
      >
        <input {...number(fields.fiberStartPercent)} key={fields.fiberStartPercent.key} />
      </FormField>
      <FormField field={fields.fiberDonePercent} label="All fiber in by (% of the tank)" hint="Three-quarters is common practice.">
        <input {...number(fields.fiberDonePercent)} key={fields.fiberDonePercent.key} />
      </FormField>
      <FormField
        field={fields.seedLimitMinutes}
        label="Seed limit (minutes in the tank)"
        hint="The seed clock on the phone counts down from this. 30 minutes: USDA NRCS Wyoming fact sheet."
      >
        <input {...number(fields.seedLimitMinutes)} key={fields.seedLimitMinutes.key} />
      </FormField>
      <FormField
        field={fields.fiberCeilingLbPer100Gal}
        label="Most fiber per 100 gal of water (lb)"
        hint="About 50 lb is common practice; use your product's figure."
      >
        <input {...number(fields.fiberCeilingLbPer100Gal)} key={fields.fiberCeilingLbPer100Gal.key} />
      </FormField>
      <FormField field={fields.paceFt} label="Pace length (ft)" hint="One step, heel to heel. Each person can set their own on their account page.">
        <input {...number(fields.paceFt)} key={fields.paceFt.key} />
      </FormField>
      <fieldset className="space-y-3">
        <legend className="text-xl font-bold">Loading order</legend>
        {fields.order.errors?.length ? <p className="font-bold text-stop">{fields.order.errors.join(" ")}</p> : null}
        <ol className="space-y-3">
          {order.map((place, n) => {
            const row = place.getFieldset();
            const step = (row.step.value ?? "water") as LoadStep;
            return (
              <li key={place.key} className="rounded-md border-2 border-rule p-3">
                <input type="hidden" name={row.step.name} value={step} />
                <p className="text-lg font-bold">
                  {n + 1}. {LOAD_STEP_LABELS[step] ?? step}
                </p>
                <FormField field={row.reason} label="Why here">
                  <textarea {...getTextareaProps(row.reason)} key={row.reason.key} rows={2} className={inputClass} />
                </FormField>
                {n > 0 ? (
                  <div className="mt-2 grid grid-cols-2 gap-2">
                    <button
                      {...form.reorder.getButtonProps({ name: fields.order.name, from: n, to: n - 1 })}
                      aria-label={`Move ${LOAD_STEP_LABELS[step] ?? step} up`}
                      disabled={n === 1}
                      className="min-h-12 rounded-md border-2 border-ink bg-paper font-bold disabled:opacity-40"
                    >
                      Move up
                    </button>
                    <button
                      {...form.reorder.getButtonProps({ name: fields.order.name, from: n, to: n + 1 })}
                      aria-label={`Move ${LOAD_STEP_LABELS[step] ?? step} down`}
                      disabled={n === order.length - 1}
                      className="min-h-12 rounded-md border-2 border-ink bg-paper font-bold disabled:opacity-40"
                    >
                      Move down
                    </button>
                  </div>
                ) : (
                  <p className="mt-1 text-sm">Water always comes first.</p>
                )}
              </li>
            );
          })}
        </ol>
      </fieldset>
      {/* Said beside the button pressed: the top of this long form is out of sight. */}
      <DoneNote message={message} />
      <button type="submit" className="min-h-14 w-full rounded-lg bg-go text-lg font-bold text-white">
        Save loading rules
      </button>
    </Form>
  );
}

export const meta: Route.MetaFunction = () => [{ title: "Company settings · Tankside" }];
