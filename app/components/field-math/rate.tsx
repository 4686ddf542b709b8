import { useTranslation } from "react-i18next";
import { useSay } from "~/components/ui/say";
import { useState } from "react";
import { appliedRate } from "~/lib/field-math/applied-rate";
import { fmt } from "~/lib/field-math/units";
import { NumberField, ResultBox, SourceNote, toNumber, tryFieldMath } from "./kit";

interface Row {
  key: number;
  name: string;
  spec: string;
  bags: string;
  bagLb: string;
}

// Three loads of a one-pass WSDOE BMP C120/C121 job as a start: the crew types what really went in.
const STARTER: Row[] = [
  { key: 1, name: "Wood fiber mulch", spec: "1500", bags: "45", bagLb: "50" },
  { key: 2, name: "Seed mix", spec: "120", bags: "4", bagLb: "50" },
  { key: 3, name: "Fertilizer 10-4-6", spec: "90", bags: "3", bagLb: "50" },
];

/** Within this much of the spec, the rate reads as on spec (common practice for a field check). */
const ON_SPEC_PERCENT = 10;

/** After loads are sprayed over a measured area: the rate actually put down against the spec. */
export function RateMath() {
  const [length, setLength] = useState("300");
  const [width, setWidth] = useState("240");
  const [rows, setRows] = useState<Row[]>(STARTER);
  const setRow = (key: number, change: Partial<Row>) => setRows(rows.map((r) => (r.key === key ? { ...r, ...change } : r)));

  const { t } = useTranslation();
  const say = useSay();
  const { result: r, errors } = tryFieldMath(appliedRate, {
    areaSqFt: toNumber(length) * toNumber(width),
    materials: rows.map((row) => ({ name: row.name, lb: toNumber(row.bags) * toNumber(row.bagLb), specLbPerAcre: toNumber(row.spec) })),
  });

  return (
    <div className="space-y-3">
      <fieldset className="space-y-3 rounded-md border-2 border-rule p-3">
        <legend className="px-1 font-bold">{t("fm.rate.area")}</legend>
        <NumberField id="rate-length" label={t("fm.rate.length")} value={length} onChange={setLength} unit="ft" />
        <NumberField id="rate-width" label={t("fm.rate.width")} value={width} onChange={setWidth} unit="ft" />
        {errors.areaSqFt ? <p className="font-bold text-stop">{t("fm.rate.areaBad", { error: say(errors.areaSqFt) })}</p> : null}
      </fieldset>
      <fieldset className="space-y-3 rounded-md border-2 border-rule p-3">
        <legend className="px-1 font-bold">{t("fm.rate.went")}</legend>
        {errors.materials ? <p className="font-bold text-stop">{say(errors.materials)}</p> : null}
        {rows.map((row, i) => (
          <div key={row.key} className="grid grid-cols-1 gap-2 border-b border-rule pb-3 sm:grid-cols-3">
            <label className="font-bold sm:col-span-3">
              {t("fm.rate.material", { n: i + 1 })}
              <input
                value={row.name}
                onChange={(e) => setRow(row.key, { name: e.target.value })}
                className="mt-1 block min-h-14 w-full rounded-md border-2 border-ink bg-paper px-3 text-lg"
              />
            </label>
            <NumberField
              id={`rate-spec-${row.key}`}
              label={t("fm.rate.spec")}
              value={row.spec}
              onChange={(v) => setRow(row.key, { spec: v })}
              unit="lb/ac"
              error={errors[`materials.${i}.specLbPerAcre`]}
            />
            <NumberField
              id={`rate-bags-${row.key}`}
              label={t("fm.rate.bags")}
              value={row.bags}
              onChange={(v) => setRow(row.key, { bags: v })}
              unit={t("fm.rate.bagsUnit")}
              error={errors[`materials.${i}.lb`]}
            />
            <NumberField id={`rate-bag-${row.key}`} label={t("fm.rate.bagSize")} value={row.bagLb} onChange={(v) => setRow(row.key, { bagLb: v })} unit="lb" />
          </div>
        ))}
      </fieldset>
      {r ? (
        <ResultBox tone={r.materials.every((m) => Math.abs(m.differencePercent) <= ON_SPEC_PERCENT) ? "good" : "warn"}>
          <p className="text-lg font-bold">{t("fm.rate.sprayed", { sqft: fmt(toNumber(length) * toNumber(width)), ac: fmt(r.acres, 3) })}</p>
          <ul className="mt-2 space-y-2">
            {r.materials.map((m) => (
              <li key={m.name} data-testid="applied-rate">
                <span className="font-bold">{m.name}</span>
                {t("fm.rate.against", { rate: fmt(m.lbPerAcre), kg: fmt(m.kgPerHa), spec: fmt(m.specLbPerAcre) })}
                <span className="font-bold">
                  {m.differencePercent >= 0 ? "+" : "−"}
                  {fmt(Math.abs(m.differencePercent), 1)} %
                </span>
                {Math.abs(m.differencePercent) > ON_SPEC_PERCENT ? (m.differencePercent < 0 ? t("fm.rate.light") : t("fm.rate.heavy")) : t("fm.rate.onSpec")}
              </li>
            ))}
          </ul>
          <SourceNote>
            Rate = what went in ÷ area; 43,560 ft² per acre and 1 lb/ac = 1.12085 kg/ha (NIST Handbook 44 / SP 811). Within ±{ON_SPEC_PERCENT} % reads as on
            spec (common practice).
          </SourceNote>
        </ResultBox>
      ) : null}
    </div>
  );
}
