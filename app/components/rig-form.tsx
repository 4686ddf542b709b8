import { getFormProps, getInputProps, getSelectProps, getTextareaProps, type SubmissionResult } from "@conform-to/react";
import { useCheckedForm } from "~/components/forms/use-checked-form";
import { ErrorList } from "~/components/ui/error-list";
import { Form } from "react-router";
import { rigInputSchema, type RigInput } from "~/lib/rigs/schema";
import { FormField, inputClass } from "~/components/forms/form-field";

/** Add or edit a rig; the same zod schema checks it here and on the server. */
export function RigForm({
  defaultValue,
  lastResult,
  submitLabel,
}: {
  defaultValue?: Partial<RigInput>;
  lastResult?: SubmissionResult<string[]> | null;
  submitLabel: string;
}) {
  const [form, fields] = useCheckedForm(rigInputSchema, {
    lastResult,
    defaultValue: defaultValue ?? { mount: "truck", hasHourMeter: true, engineHours: 0, yardElevationFt: 0, nozzleTips: [], torqueSpecs: [] },
  });
  const tips = fields.nozzleTips.getFieldList();
  const specs = fields.torqueSpecs.getFieldList();
  const number = (f: typeof fields.tankGal | typeof fields.pumpRatedGpm) => ({ ...getInputProps(f, { type: "text" }), inputMode: "decimal" as const });

  return (
    <Form method="post" {...getFormProps(form)} className="space-y-4 rounded-lg border-2 border-ink bg-paper p-4">
      {form.errors?.length ? <ErrorList id={form.errorId} error={form.errors.join(" ")} /> : null}
      <FormField field={fields.code} label="Unit code" hint="Short and unique in your company, like CF-07.">
        <input {...getInputProps(fields.code, { type: "text" })} className={inputClass} autoCapitalize="characters" />
      </FormField>
      <FormField field={fields.name} label="Name">
        <input {...getInputProps(fields.name, { type: "text" })} className={inputClass} />
      </FormField>
      <FormField field={fields.mount} label="Mount">
        <select {...getSelectProps(fields.mount)} className={inputClass}>
          <option value="truck">Truck</option>
          <option value="trailer">Trailer</option>
        </select>
      </FormField>
      <FormField field={fields.tankGal} label="Tank size (US gal)">
        <input {...number(fields.tankGal)} className={inputClass} />
      </FormField>
      <FormField field={fields.pumpKind} label="Pump" hint="For example: centrifugal, 3 in, clutch-driven.">
        <input {...getInputProps(fields.pumpKind, { type: "text" })} className={inputClass} />
      </FormField>
      <div className="flex items-center gap-3">
        <input {...getInputProps(fields.hasHourMeter, { type: "checkbox" })} className="h-7 w-7" />
        <label htmlFor={fields.hasHourMeter.id} className="font-bold">
          Has an hour meter
        </label>
      </div>
      <FormField field={fields.engineHours} label="Engine hours">
        <input {...number(fields.engineHours)} className={inputClass} />
      </FormField>
      <FormField field={fields.hoseLengthFt} label="Hose carried (ft)">
        <input {...number(fields.hoseLengthFt)} className={inputClass} />
      </FormField>
      <FormField field={fields.hoseDiameterIn} label="Hose inside diameter (in)">
        <input {...number(fields.hoseDiameterIn)} className={inputClass} />
      </FormField>
      <FormField field={fields.yardElevationFt} label="Yard elevation (ft)">
        <input {...number(fields.yardElevationFt)} className={inputClass} />
      </FormField>
      <FormField
        field={fields.agitatorMixes}
        label="Agitator mixes in"
        hint="The direction the agitator turns when it mixes; the stall guide names the other one."
      >
        <select {...getSelectProps(fields.agitatorMixes)} className={inputClass}>
          <option value="forward">Forward</option>
          <option value="reverse">Reverse</option>
        </select>
      </FormField>
      <fieldset className="space-y-3 rounded-md border-2 border-rule p-3">
        <legend className="px-1 font-bold">Pump figures (from its plate or curve; leave blank if not known)</legend>
        <FormField field={fields.pumpRatedGpm} label="Rated flow (gpm)">
          <input {...number(fields.pumpRatedGpm)} className={inputClass} />
        </FormField>
        <FormField field={fields.pumpRatedPsi} label="Rated pressure (psi)">
          <input {...number(fields.pumpRatedPsi)} className={inputClass} />
        </FormField>
        <FormField field={fields.pumpNpshrFt} label="How much suction the pump needs, from its curve (ft)">
          <input {...number(fields.pumpNpshrFt)} className={inputClass} />
        </FormField>
      </fieldset>
      <FormField
        field={fields.carrierRatingLb}
        label="Truck or trailer rated payload (lb)"
        hint="What it may carry, not its gross weight rating. Leave blank if not known."
      >
        <input {...number(fields.carrierRatingLb)} className={inputClass} />
      </FormField>
      <fieldset className="space-y-3 rounded-md border-2 border-rule p-3">
        <legend className="px-1 font-bold">Nozzle tips</legend>
        {fields.nozzleTips.errors?.length ? <p className="font-bold text-stop">{fields.nozzleTips.errors.join(" ")}</p> : null}
        {tips.map((tip, index) => {
          const t = tip.getFieldset();
          return (
            <div key={tip.key} className="grid gap-2 border-b border-rule pb-3">
              <FormField field={t.name} label={`Tip ${index + 1} name`}>
                <input {...getInputProps(t.name, { type: "text" })} className={inputClass} />
              </FormField>
              <FormField field={t.reachFt} label="Rated reach (ft)">
                <input {...number(t.reachFt)} className={inputClass} />
              </FormField>
              <FormField field={t.widthFt} label="Pattern width (ft)">
                <input {...number(t.widthFt)} className={inputClass} />
              </FormField>
              <button
                {...form.remove.getButtonProps({ name: fields.nozzleTips.name, index })}
                className="min-h-12 rounded-md border-2 border-ink px-3 font-bold"
              >
                Remove tip {index + 1}
              </button>
            </div>
          );
        })}
        <button {...form.insert.getButtonProps({ name: fields.nozzleTips.name })} className="min-h-12 rounded-md border-2 border-ink px-3 font-bold">
          Add a tip
        </button>
      </fieldset>
      <fieldset className="space-y-3 rounded-md border-2 border-rule p-3">
        <legend className="px-1 font-bold">Torque figures (your company's, per part)</legend>
        {specs.map((spec, index) => {
          const t = spec.getFieldset();
          return (
            <div key={spec.key} className="grid gap-2 border-b border-rule pb-3">
              <FormField field={t.part} label={`Part ${index + 1}`}>
                <input {...getInputProps(t.part, { type: "text" })} className={inputClass} />
              </FormField>
              <FormField field={t.ftLb} label="Torque (ft·lb)">
                <input {...number(t.ftLb)} className={inputClass} />
              </FormField>
              <button
                {...form.remove.getButtonProps({ name: fields.torqueSpecs.name, index })}
                className="min-h-12 rounded-md border-2 border-ink px-3 font-bold"
              >
                Remove part {index + 1}
              </button>
            </div>
          );
        })}
        <button {...form.insert.getButtonProps({ name: fields.torqueSpecs.name })} className="min-h-12 rounded-md border-2 border-ink px-3 font-bold">
          Add a torque figure
        </button>
      </fieldset>
      <FormField field={fields.notes} label="Notes">
        <textarea {...getTextareaProps(fields.notes)} rows={3} className={inputClass} />
      </FormField>
      <button type="submit" className="min-h-14 w-full rounded-md bg-go text-lg font-bold text-white">
        {submitLabel}
      </button>
    </Form>
  );
}
