import { useState } from "react";
import { useTranslation } from "react-i18next";
import { boltTorque, convertTorque } from "~/lib/field-math/torque";
import { fmt } from "~/lib/field-math/units";
import { NumberField, ResultBox, SourceNote, toNumber, tryFieldMath } from "./kit";
import type { RigSpecs } from "~/lib/rigs/specs";

/** ft·lb ↔ N·m, the rig's own torque figures, and an estimate for when no figure is given. */
export function TorqueMath({ rig, compact = false }: { rig?: RigSpecs; compact?: boolean }) {
  const { t } = useTranslation();
  const [value, setValue] = useState("25");
  const [unit, setUnit] = useState<"ft-lb" | "N-m">("ft-lb");
  const [bolt, setBolt] = useState({ diameterIn: "0.5", threadsPerInch: "13", grade: "5", condition: "dry" });
  const converted = tryFieldMath(convertTorque, { value: toNumber(value), unit });
  const estimate = tryFieldMath(boltTorque, {
    diameterIn: toNumber(bolt.diameterIn),
    threadsPerInch: toNumber(bolt.threadsPerInch),
    grade: Number(bolt.grade),
    condition: bolt.condition,
  });
  return (
    <div className="space-y-3">
      {rig?.torqueSpecs.length ? (
        <table className="w-full text-left">
          <caption className="text-left font-bold">{t("fm.torque.company", { code: rig.code })}</caption>
          <tbody>
            {rig.torqueSpecs.map((s) => (
              <tr key={s.part} className="border-b border-rule">
                <th scope="row" className="py-1 font-normal">
                  {s.part}
                </th>
                <td className="font-bold">
                  {fmt(s.ftLb)} ft·lb ({fmt(convertTorque({ value: s.ftLb, unit: "ft-lb" }).nm)} N·m)
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      ) : (
        <p>{t("fm.torque.none")}</p>
      )}
      <div className="grid grid-cols-[1fr_auto] items-end gap-2">
        <NumberField id="torque-value" label={t("fm.torque.convert")} value={value} onChange={setValue} unit="" error={converted.errors.value} />
        <select
          aria-label={t("fm.torque.unit")}
          value={unit}
          onChange={(e) => setUnit(e.target.value as "ft-lb")}
          className="mb-[2px] min-h-14 rounded-md border-2 border-ink bg-paper px-2 text-lg"
        >
          <option value="ft-lb">ft·lb</option>
          <option value="N-m">N·m</option>
        </select>
      </div>
      {converted.result ? (
        <ResultBox>
          <p className="text-xl font-bold">
            {fmt(converted.result.ftLb, 1)} ft·lb = {fmt(converted.result.nm, 1)} N·m
          </p>
          <SourceNote>1 ft·lbf = 1.3558179483 N·m (NIST SP 811).</SourceNote>
        </ResultBox>
      ) : null}
      {compact ? null : (
        <details className="rounded-md border-2 border-rule bg-paper p-3">
          <summary className="min-h-12 cursor-pointer py-2 font-bold">{t("fm.torque.estimate")}</summary>
          <div className="mt-2 grid grid-cols-2 gap-3">
            <NumberField
              id="bolt-d"
              label={t("fm.torque.diameter")}
              value={bolt.diameterIn}
              onChange={(v) => setBolt({ ...bolt, diameterIn: v })}
              unit="in"
              error={estimate.errors.diameterIn}
            />
            <NumberField
              id="bolt-n"
              label={t("fm.torque.tpi")}
              value={bolt.threadsPerInch}
              onChange={(v) => setBolt({ ...bolt, threadsPerInch: v })}
              unit="TPI"
              error={estimate.errors.threadsPerInch}
            />
            <label className="font-bold">
              {t("fm.torque.grade")}
              <select
                value={bolt.grade}
                onChange={(e) => setBolt({ ...bolt, grade: e.target.value })}
                className="mt-1 block min-h-14 w-full rounded-md border-2 border-ink bg-paper px-2"
              >
                <option value="5">5</option>
                <option value="8">8</option>
              </select>
            </label>
            <label className="font-bold">
              {t("fm.torque.threads")}
              <select
                value={bolt.condition}
                onChange={(e) => setBolt({ ...bolt, condition: e.target.value })}
                className="mt-1 block min-h-14 w-full rounded-md border-2 border-ink bg-paper px-2"
              >
                <option value="dry">{t("fm.torque.dry")}</option>
                <option value="lubricated">{t("fm.torque.lubricated")}</option>
              </select>
            </label>
          </div>
          {estimate.result ? (
            <p className="mt-2 text-lg font-bold">{t("fm.torque.about", { ftlb: fmt(estimate.result.ftLb), nm: fmt(estimate.result.nm) })}</p>
          ) : null}
          <SourceNote>
            T = K·D·P with P = 75 % of proof load (SAE J429), K 0.20 dry / 0.15 lubricated. Charts with other K differ: never mix charts. The maker's figure
            comes first.
          </SourceNote>
        </details>
      )}
    </div>
  );
}
