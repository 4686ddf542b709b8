import { getFormProps, getInputProps, getSelectProps, getTextareaProps, type SubmissionResult } from "@conform-to/react";
import { Form } from "react-router";
import { useCheckedForm } from "~/components/forms/use-checked-form";
import { FormField, inputClass } from "~/components/forms/form-field";
import { ErrorList } from "~/components/ui/error-list";
import { MATERIAL_KIND_LABELS, MATERIAL_KINDS } from "~/lib/field-math/load-rules";
import { jobInputSchema, type JobInput } from "~/lib/jobs/schema";

/** A new job starts from a one-pass mulch, seed and fertilizer spec (WSDOE BMP C120/C121 rates), to be changed to the contract's. */
export const STARTER_JOB: Partial<JobInput> = {
  passes: 1,
  materials: [
    { name: "Wood fiber mulch", lbPerAcre: 1500, kind: "fiber", bagLb: 50 },
    { name: "Seed mix", lbPerAcre: 120, kind: "seed", bagLb: 50 },
    { name: "Fertilizer", lbPerAcre: 90, kind: "fertilizer", bagLb: 50 },
  ],
};

/** Create or edit a job: site, customer, where it is, the spec per acre, the dates. The same zod schema checks it here and on the server. */
export function JobForm({
  defaultValue,
  lastResult,
  submitLabel,
}: {
  defaultValue?: Partial<JobInput>;
  lastResult?: SubmissionResult<string[]> | null;
  submitLabel: string;
}) {
  const [form, fields] = useCheckedForm(jobInputSchema, { lastResult, defaultValue: defaultValue ?? STARTER_JOB });
  const materials = fields.materials.getFieldList();
  const number = (f: Parameters<typeof getInputProps>[0]) => ({ ...getInputProps(f, { type: "text" }), inputMode: "decimal" as const });

  return (
    <Form method="post" {...getFormProps(form)} className="space-y-4 rounded-lg border-2 border-ink bg-paper p-4">
      {form.errors?.length ? <ErrorList id={form.errorId} error={form.errors.join(" ")} /> : null}
      <FormField field={fields.name} label="Site" hint="What the crew calls the place, like “Pine Ridge phase 2 cut slopes”.">
        <input {...getInputProps(fields.name, { type: "text" })} className={inputClass} />
      </FormField>
      <FormField field={fields.customer} label="Customer">
        <input {...getInputProps(fields.customer, { type: "text" })} className={inputClass} />
      </FormField>
      <FormField field={fields.address} label="Address or directions (optional)">
        <input {...getInputProps(fields.address, { type: "text" })} className={inputClass} />
      </FormField>
      <div className="grid gap-3 sm:grid-cols-2">
        <FormField field={fields.latitude} label="Latitude (optional)" hint="Decimal degrees, like 39.7392.">
          <input {...number(fields.latitude)} className={inputClass} />
        </FormField>
        <FormField field={fields.longitude} label="Longitude (optional)" hint="Decimal degrees, like −104.9903.">
          <input {...number(fields.longitude)} className={inputClass} />
        </FormField>
      </div>
      <FormField field={fields.elevationFt} label="Site elevation (ft)" hint="The suction check on this job's rigs starts from it; leave blank if not known.">
        <input {...number(fields.elevationFt)} className={inputClass} />
      </FormField>
      <fieldset className="space-y-3 rounded-md border-2 border-rule p-3">
        <legend className="px-1 font-bold">Spec</legend>
        <div className="grid gap-3 sm:grid-cols-2">
          <FormField field={fields.areaAcres} label="Area (acres)">
            <input {...number(fields.areaAcres)} className={inputClass} />
          </FormField>
          <FormField field={fields.passes} label="Passes over it">
            <input {...number(fields.passes)} className={inputClass} />
          </FormField>
        </div>
        <FormField field={fields.waterGalPerAcre} label="Water per acre (US gal, optional)" hint="Blank: the load card sizes water by the fiber.">
          <input {...number(fields.waterGalPerAcre)} className={inputClass} />
        </FormField>
        {fields.materials.errors?.length ? <p className="font-bold text-stop">{fields.materials.errors.join(" ")}</p> : null}
        {materials.map((material, index) => {
          const m = material.getFieldset();
          return (
            <div key={material.key} className="grid gap-2 border-b border-rule pb-3">
              <FormField field={m.name} label={`Material ${index + 1}`}>
                <input {...getInputProps(m.name, { type: "text" })} className={inputClass} />
              </FormField>
              <div className="grid grid-cols-2 gap-2">
                <FormField field={m.lbPerAcre} label="lb per acre">
                  <input {...number(m.lbPerAcre)} className={inputClass} />
                </FormField>
                <FormField field={m.bagLb} label="Bag (lb)">
                  <input {...number(m.bagLb)} className={inputClass} />
                </FormField>
              </div>
              <FormField field={m.kind} label="What it is">
                <select {...getSelectProps(m.kind)} className={inputClass}>
                  {MATERIAL_KINDS.map((k) => (
                    <option key={k} value={k}>
                      {MATERIAL_KIND_LABELS[k]}
                    </option>
                  ))}
                </select>
              </FormField>
              <button
                {...form.remove.getButtonProps({ name: fields.materials.name, index })}
                className="min-h-12 rounded-md border-2 border-ink px-3 font-bold"
              >
                Remove material {index + 1}
              </button>
            </div>
          );
        })}
        <button
          {...form.insert.getButtonProps({ name: fields.materials.name, defaultValue: { kind: "other" } })}
          className="min-h-12 rounded-md border-2 border-ink px-3 font-bold"
        >
          Add a material
        </button>
      </fieldset>
      <div className="grid gap-3 sm:grid-cols-2">
        <FormField field={fields.startsOn} label="Starts">
          <input {...getInputProps(fields.startsOn, { type: "date" })} className={inputClass} />
        </FormField>
        <FormField field={fields.endsOn} label="Ends (optional)">
          <input {...getInputProps(fields.endsOn, { type: "date" })} className={inputClass} />
        </FormField>
      </div>
      <FormField field={fields.notes} label="Notes">
        <textarea {...getTextareaProps(fields.notes)} rows={3} className={inputClass} />
      </FormField>
      <button type="submit" className="min-h-14 w-full rounded-md bg-go text-lg font-bold text-white">
        {submitLabel}
      </button>
    </Form>
  );
}
