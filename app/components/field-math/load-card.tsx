import { useEffect, useState } from "react";
import type { TFunction } from "i18next";
import { Trans, useTranslation } from "react-i18next";
import { useSay } from "~/components/ui/say";
import { lbText, loadCard, loadNumbers, loadSteps, type CardLoad, type CardMaterial, type LoadCard } from "~/lib/field-math/load-card";
import { DEFAULT_LOAD_RULES, MATERIAL_KINDS, type LoadRules, type MaterialKind } from "~/lib/field-math/load-rules";
import { acresToSqFt, fmt, galToL, lbPerAcreToKgPerHa, lbToKg, sqFtToAcres, sqMToSqFt } from "~/lib/field-math/units";
import { NumberField, ResultBox, SourceNote, toNumber, tryFieldMath } from "./kit";
import { SeedClock } from "./seed-clock";
import type { RigSpecs } from "~/lib/rigs/specs";
import { SprayedLoads } from "./sprayed-loads";

interface Row {
  key: number;
  name: string;
  rate: string;
  kind: MaterialKind;
  bag: string;
}

// A one-pass mulch, seed and fertilizer job at WSDOE BMP C120/C121 rates, as a starting point (named in the reader's language).
const starter = (t: TFunction): Row[] => [
  { key: 1, name: t("fm.load.starterFiber"), rate: "1500", kind: "fiber", bag: "50" },
  { key: 2, name: t("fm.load.starterSeed"), rate: "120", kind: "seed", bag: "50" },
  { key: 3, name: t("fm.load.starterFertilizer"), rate: "90", kind: "fertilizer", bag: "50" },
];

const AREA_UNITS = { sqft: "ft²", acres: "acres", sqm: "m²" } as const;
/** The most the load sheet plans at once (its area limit, 100 acres). */
const MAX_CARD_ACRES = 100;
const today = () => new Date().toLocaleDateString("en-CA");

/** What the crew typed, kept on the phone so a trip to another screen or a reload does not lose it. */
const KEPT_INPUTS = "tankside.load-card";
interface KeptInputs {
  job: string;
  /** The job the inputs were for (a job's card restores only its own). */
  jobId?: number | null;
  area: string;
  areaUnit: keyof typeof AREA_UNITS;
  slopeWidth: string;
  waterRate: string;
  rows: Row[];
}
function keptInputs(): KeptInputs | null {
  try {
    const kept = JSON.parse(localStorage.getItem(KEPT_INPUTS) ?? "null") as KeptInputs | null;
    return kept && Array.isArray(kept.rows) && kept.rows.length ? kept : null;
  } catch {
    return null;
  }
}

/** The load sheet as the tank-side card: marks, whole bags, order, weight, strips and the seed clock; prints on one page. */
export function LoadCardMath({ rig, rules = DEFAULT_LOAD_RULES, compact = false }: { rig?: RigSpecs; rules?: LoadRules; compact?: boolean }) {
  const { t } = useTranslation();
  const say = useSay();
  // A rig on a job starts from the job's spec and the area it has left.
  const onJob = rig?.job ?? null;
  const [job, setJob] = useState(onJob?.name ?? "");
  const [date, setDate] = useState(today);
  // The card plans at most 100 acres at a time: a bigger job starts from its first 100 (today's section is usually less).
  const [area, setArea] = useState(onJob ? String(Math.round(Math.min(onJob.remainingAcres, MAX_CARD_ACRES) * 100) / 100) : "1");
  const [areaUnit, setAreaUnit] = useState<keyof typeof AREA_UNITS>("acres");
  const [tank, setTank] = useState(String(rig?.tankGal ?? 1000));
  const [ceiling, setCeiling] = useState(String(rules.fiberCeilingLbPer100Gal));
  const [slopeWidth, setSlopeWidth] = useState("60");
  const [waterRate, setWaterRate] = useState(onJob?.waterGalPerAcre ? String(onJob.waterGalPerAcre) : "");
  const [rows, setRows] = useState<Row[]>(
    onJob
      ? onJob.materials.map((m, i) => ({ key: i + 1, name: m.name, rate: String(m.lbPerAcre), kind: m.kind, bag: m.bagLb ? String(m.bagLb) : "" }))
      : starter(t),
  );
  const setRow = (key: number, change: Partial<Row>) => setRows(rows.map((r) => (r.key === key ? { ...r, ...change } : r)));
  // The job, area and materials come back as the crew left them (the full screen only; a guide's figure starts fresh).
  const [restored, setRestored] = useState(compact);
  useEffect(() => {
    if (compact) return;
    const kept = keptInputs();
    if (kept && (kept.jobId ?? null) === (onJob?.id ?? null)) {
      setJob(kept.job);
      setArea(kept.area);
      setAreaUnit(kept.areaUnit);
      setSlopeWidth(kept.slopeWidth);
      setWaterRate(kept.waterRate ?? "");
      setRows(kept.rows);
    }
    setRestored(true);
  }, [compact, onJob?.id]);
  useEffect(() => {
    if (restored && !compact)
      localStorage.setItem(KEPT_INPUTS, JSON.stringify({ job, jobId: onJob?.id ?? null, area, areaUnit, slopeWidth, waterRate, rows } satisfies KeptInputs));
  }, [restored, compact, job, onJob?.id, area, areaUnit, slopeWidth, waterRate, rows]);

  const a = toNumber(area);
  const areaSqFt = areaUnit === "acres" ? acresToSqFt(a) : areaUnit === "sqm" ? sqMToSqFt(a) : a;
  const { result: r, errors } = tryFieldMath((input) => loadCard(input, rules), {
    areaSqFt,
    tankGal: toNumber(tank),
    maxFiberLbPer100Gal: toNumber(ceiling),
    ...(slopeWidth.trim() ? { slopeWidthFt: toNumber(slopeWidth) } : {}),
    ...(waterRate.trim() ? { waterGalPerAcre: toNumber(waterRate) } : {}),
    carrierRatingLb: rig?.carrierRatingLb ?? null,
    paceFt: rules.paceFt,
    materials: rows.map((row) => ({
      name: row.name,
      lbPerAcre: toNumber(row.rate),
      kind: row.kind,
      ...(row.bag.trim() ? { bagLb: toNumber(row.bag) } : {}),
    })),
  });

  return (
    <div className="space-y-3">
      <div className="no-print space-y-3">
        {compact ? null : (
          <div className="grid grid-cols-1 gap-3 sm:grid-cols-2">
            <label className="block font-bold">
              {t("fm.load.jobName")}
              <input
                value={job}
                onChange={(e) => setJob(e.target.value)}
                placeholder={t("fm.load.jobPlaceholder")}
                className="mt-1 block min-h-14 w-full rounded-md border-2 border-ink bg-paper px-3 text-lg"
              />
            </label>
            <label className="block font-bold">
              {t("fm.load.date")}
              <input
                type="date"
                value={date}
                onChange={(e) => setDate(e.target.value)}
                className="mt-1 block min-h-14 w-full rounded-md border-2 border-ink bg-paper px-3 text-lg"
              />
            </label>
          </div>
        )}
        {onJob ? (
          <p className="rounded-md border-2 border-ink bg-field p-3">
            <Trans
              i18nKey="fm.load.fromJob"
              values={{ name: onJob.name, left: fmt(onJob.remainingAcres, 2), total: fmt(onJob.areaAcres * onJob.passes, 2) }}
              components={{ b: <span className="font-bold" /> }}
            />{" "}
            {onJob.remainingAcres > MAX_CARD_ACRES ? t("fm.load.fromJobBig", { max: MAX_CARD_ACRES }) : t("fm.load.fromJobSmall")}
          </p>
        ) : null}
        <div className="grid grid-cols-[1fr_auto] items-end gap-2">
          <NumberField
            id="load-area"
            label={t("fm.load.area")}
            value={area}
            onChange={setArea}
            unit=""
            error={
              errors.areaSqFt && areaSqFt > MAX_CARD_ACRES * 43_560
                ? t("fm.load.areaTooBig", { max: MAX_CARD_ACRES, sqft: fmt(MAX_CARD_ACRES * 43_560) })
                : errors.areaSqFt
            }
          />
          <select
            aria-label={t("fm.load.areaUnit")}
            value={areaUnit}
            onChange={(e) => setAreaUnit(e.target.value as "acres")}
            className="mb-[2px] min-h-14 rounded-md border-2 border-ink bg-paper px-2 text-lg"
          >
            {Object.entries(AREA_UNITS).map(([k, v]) => (
              <option key={k} value={k}>
                {v}
              </option>
            ))}
          </select>
        </div>
        {Number.isFinite(areaSqFt) ? (
          <p className="text-sm">
            = {fmt(areaSqFt)} ft² = {fmt(sqFtToAcres(areaSqFt), 3)} ac
          </p>
        ) : null}
        <NumberField
          id="load-tank"
          label={t("fm.load.tank")}
          value={tank}
          onChange={setTank}
          unit="gal"
          beside={
            rig && toNumber(tank) > rig.tankGal
              ? t("fm.load.tankOver", { code: rig.code, gal: fmt(rig.tankGal) })
              : t("fm.load.liters", { l: fmt(galToL(toNumber(tank) || 0)) })
          }
          error={errors.tankGal}
        />
        <NumberField
          id="load-water-rate"
          label={t("fm.load.waterRate")}
          value={waterRate}
          onChange={setWaterRate}
          unit="gal"
          beside={t("fm.load.waterRateHint")}
          error={errors.waterGalPerAcre}
        />
        <NumberField
          id="load-ceiling"
          label={t("fm.load.ceiling")}
          value={ceiling}
          onChange={setCeiling}
          unit="lb"
          beside={t("fm.load.ceilingHint")}
          error={errors.maxFiberLbPer100Gal}
        />
        <NumberField
          id="load-slope-width"
          label={t("fm.load.stripWidth")}
          value={slopeWidth}
          onChange={setSlopeWidth}
          unit="ft"
          beside={t("fm.load.stripHint")}
          error={errors.slopeWidthFt}
        />
        {compact ? null : (
          <fieldset className="space-y-3 rounded-md border-2 border-rule p-3">
            <legend className="px-1 font-bold">{t("fm.load.materials")}</legend>
            {errors.materials ? <p className="font-bold text-stop">{say(errors.materials)}</p> : null}
            {rows.map((row, i) => (
              <div key={row.key} className="grid grid-cols-1 gap-2 border-b border-rule pb-3 sm:grid-cols-2">
                <label className="font-bold sm:col-span-2">
                  {t("fm.load.material", { n: i + 1 })}
                  <input
                    value={row.name}
                    onChange={(e) => setRow(row.key, { name: e.target.value })}
                    className="mt-1 block min-h-14 w-full rounded-md border-2 border-ink bg-paper px-3 text-lg"
                  />
                  {errors[`materials.${i}.name`] ? <span className="text-stop">{say(errors[`materials.${i}.name`])}</span> : null}
                </label>
                <NumberField
                  id={`rate-${row.key}`}
                  label={t("fm.load.rate")}
                  value={row.rate}
                  onChange={(v) => setRow(row.key, { rate: v })}
                  unit="lb/ac"
                  error={errors[`materials.${i}.lbPerAcre`]}
                />
                <NumberField
                  id={`bag-${row.key}`}
                  label={t("fm.load.bagSize")}
                  value={row.bag}
                  onChange={(v) => setRow(row.key, { bag: v })}
                  unit="lb"
                  error={errors[`materials.${i}.bagLb`]}
                />
                <label className="block font-bold">
                  {t("fm.load.whatItIs")}
                  <select
                    value={row.kind}
                    onChange={(e) => setRow(row.key, { kind: e.target.value as MaterialKind })}
                    className="mt-1 block min-h-14 w-full rounded-md border-2 border-ink bg-paper px-2 text-lg"
                  >
                    {MATERIAL_KINDS.map((k) => (
                      <option key={k} value={k}>
                        {t(`fm.kinds.${k}`)}
                      </option>
                    ))}
                  </select>
                </label>
                <button
                  type="button"
                  onClick={() => setRows(rows.filter((x) => x.key !== row.key))}
                  className="min-h-12 rounded-md border-2 border-ink bg-paper font-bold"
                >
                  {t("fm.load.remove")}
                </button>
              </div>
            ))}
            <button
              type="button"
              onClick={() => setRows([...rows, { key: Date.now(), name: t("fm.load.newMaterial"), rate: "100", kind: "tackifier", bag: "" }])}
              className="min-h-12 rounded-md border-2 border-ink bg-paper px-3 font-bold"
            >
              {t("fm.load.add")}
            </button>
          </fieldset>
        )}
      </div>
      {/* Marking loads sprayed comes first: it is what the crew comes back to between loads. */}
      {r && onJob && !compact ? <SprayedLoads job={onJob} rigCode={rig?.code ?? null} loads={r.loads} /> : null}
      {r ? <CardResult card={r} rules={rules} rig={rig} job={job} date={date} rates={rows} compact={compact} /> : null}
    </div>
  );
}

function CardResult({
  card,
  rules,
  rig,
  job,
  date,
  rates,
  compact,
}: {
  card: LoadCard;
  rules: LoadRules;
  rig?: RigSpecs;
  job: string;
  date: string;
  rates: Row[];
  compact: boolean;
}) {
  const { t } = useTranslation();
  const say = useSay();
  const first = card.loads[0];
  const hasSeed = first.materials.some((m) => m.kind === "seed");
  const over = card.loads.some((l) => l.overRatingLb !== null);
  return (
    <>
      <ResultBox tone={over ? "bad" : "plain"}>
        <div className="load-card">
          <p className="hidden text-2xl font-bold print:block">
            {t("fm.load.printedTitle", { job: job.trim() || t("fm.load.jobNotNamed"), date, rig: rig ? `${rig.code} ${rig.name}` : t("fm.load.rigNotChosen") })}
          </p>
          <p className="text-2xl font-bold" data-testid="load-count">
            {t("fm.load.count", { count: card.sheet.loads })}
          </p>
          <p>
            {t(card.sheet.loads === 1 ? "fm.load.theLoad" : "fm.load.fullLoad", {
              gal: fmt(first.fillToGal),
              sqft: fmt(first.areaSqFt),
              ac: fmt(first.acres, 3),
            })}
          </p>
          {hasSeed ? (
            <div className="mt-2">
              <SeedClock limitMinutes={rules.seedLimitMinutes} label={job.trim() || (rig ? rig.code : t("fm.load.thisLoad"))} />
            </div>
          ) : null}
          {card.notes.map((note) => (
            <p
              key={note}
              className={`mt-2 rounded-md border-2 p-2 font-bold ${note.startsWith("Over") ? "border-stop text-stop" : "border-ink bg-caution"}`}
              role="alert"
            >
              {say(note)}
            </p>
          ))}
          <div className="print:hidden">
            {card.groups.map((g) => (
              <LoadGroup key={g.numbers[0]} numbers={g.numbers} load={g.load} card={card} rules={rules} carrierRatingLb={rig?.carrierRatingLb ?? null} />
            ))}
          </div>
          <PrintedLoads card={card} rules={rules} />
          <p className="mt-3">
            {t("fm.load.totals", {
              gal: fmt(card.waterGal),
              l: fmt(galToL(card.waterGal)),
              list: card.totals
                .map(
                  (m) =>
                    `${m.name} ${lbText(m.lb)} (${fmt(lbToKg(m.lb), m.lb < 10 ? 1 : 0)} kg)${m.bringBags !== null ? `: ${t("fm.load.bring", { count: m.bringBags })}` : ""}`,
                )
                .join("; "),
            })}
          </p>
          {compact ? null : (
            <p className="text-sm print:hidden">
              {t("fm.load.metric", { list: rates.map((row) => `${row.name} ${fmt(lbPerAcreToKgPerHa(toNumber(row.rate) || 0))} kg/ha`).join("; ") })}
            </p>
          )}
          <p className="mt-2 text-sm print:text-xs">{say(card.bagRule)}</p>
          <p className="hidden text-lg font-bold print:block">{t("fm.load.seedLine", { min: rules.seedLimitMinutes })}</p>
          <div className="print:hidden">
            <SourceNote>
              Seed limit {rules.seedLimitMinutes} minutes and the loading order: your company&apos;s rules (defaults from the USDA NRCS Wyoming hydroseeding
              fact sheet; fiber from the {rules.fiberStartPercent} % mark, all in by {rules.fiberDonePercent} %, and the fiber ceiling are your company&apos;s
              figures, half and three-quarters being common practice). Area per load = fiber ÷ rate × 43,560 ft². Water weighs {fmt(card.waterLbPerGal, 3)}{" "}
              lb/gal near 60 °F (CRC Handbook density table, 999.0 kg/m³ at 15.6 °C). Pace {rules.paceFt} ft.
            </SourceNote>
          </div>
        </div>
      </ResultBox>
    </>
  );
}

const shortAmount = (m: CardMaterial, t: TFunction) =>
  m.bags
    ? `${t("fm.load.bags", { count: m.bags })}${m.weighLb > 0 ? ` + ${lbText(m.weighLb)}` : ""}`
    : `${lbText(m.lb)}${m.bags === 0 ? t("fm.load.weigh") : ""}`;

/** On paper, the recipes side by side: one row per step in the company's order, one column per group of loads. */
function PrintedLoads({ card, rules }: { card: LoadCard; rules: LoadRules }) {
  const { t } = useTranslation();
  const cell = "border-2 border-ink px-2 py-1 align-top";
  const loads = card.groups.map((g) => g.load);
  const row = (label: string, values: React.ReactNode[], key = label) => (
    <tr key={key}>
      <th scope="row" className={`${cell} text-left`}>
        {label}
      </th>
      {values.map((v, n) => (
        <td key={n} className={cell}>
          {v}
        </td>
      ))}
    </tr>
  );
  const rows: React.ReactNode[] = [];
  for (const { step } of rules.order) {
    if (step === "water") {
      rows.push(
        row(
          t("fm.load.waterTo"),
          loads.map((l) => (l.fiberStartGal !== null ? `${fmt(l.fiberStartGal)} gal (${rules.fiberStartPercent} %)` : `${fmt(l.fillToGal)} gal`)),
        ),
      );
      continue;
    }
    card.loads[0].materials.forEach((m, k) => {
      if (m.kind !== step) return;
      rows.push(
        row(
          m.name,
          loads.map((l) =>
            step === "fiber" && l.fiberDoneGal !== null ? (
              <>
                <b>{shortAmount(l.materials[k], t)}</b>,{" "}
                {l.fillToGal > l.fiberDoneGal
                  ? t("fm.load.allInBy", { gal: fmt(l.fiberDoneGal), fill: fmt(l.fillToGal) })
                  : t("fm.load.allInStops", { gal: fmt(l.fillToGal) })}
              </>
            ) : (
              <b>{shortAmount(l.materials[k], t)}</b>
            ),
          ),
          `${step}-${k}`,
        ),
      );
    });
  }
  if (loads.every((l) => l.fiberStartGal === null))
    rows.push(
      row(
        t("fm.load.fillTo"),
        loads.map((l) => `${fmt(l.fillToGal)} gal`),
      ),
    );
  rows.push(
    row(
      t("fm.load.coversRow"),
      loads.map((l) =>
        l.stripFt !== null ? t("fm.load.stripCell", { sqft: fmt(l.areaSqFt), ft: fmt(l.stripFt), paces: fmt(l.stripPaces ?? 0) }) : `${fmt(l.areaSqFt)} ft²`,
      ),
    ),
  );
  rows.push(
    row(
      t("fm.load.weightRow"),
      loads.map((l) =>
        l.overRatingLb !== null ? <b>{t("fm.load.overCell", { lb: fmt(l.weightLb), over: fmt(l.overRatingLb) })}</b> : `${fmt(l.weightLb)} lb`,
      ),
    ),
  );
  return (
    <table className="mt-3 hidden w-full border-collapse text-left print:table" data-testid="printed-loads">
      <caption className="caption-top pb-1 text-left font-bold">{t("fm.load.tableCaption")}</caption>
      <thead>
        <tr>
          <td className={cell} />
          {card.groups.map((g) => (
            <th key={g.numbers[0]} scope="col" className={`${cell} text-left`}>
              {t(g.numbers.length === 1 ? "fm.load.load" : "fm.load.loads", { n: loadNumbers(g.numbers) })}
            </th>
          ))}
        </tr>
      </thead>
      <tbody>{rows}</tbody>
    </table>
  );
}

/** One recipe of the card: which loads take it, the steps in order with amounts, what it covers and weighs. */
function LoadGroup({
  numbers,
  load,
  card,
  rules,
  carrierRatingLb,
}: {
  numbers: number[];
  load: CardLoad;
  card: LoadCard;
  rules: LoadRules;
  carrierRatingLb: number | null;
}) {
  const { t } = useTranslation();
  const say = useSay();
  const steps = loadSteps(load, rules);
  const materialsLb = load.materials.reduce((s, m) => s + m.lb, 0);
  return (
    <section className="mt-3 break-inside-avoid border-t-4 border-ink pt-2" aria-label={t("fm.load.load", { n: loadNumbers(numbers) })}>
      <h2 className="text-xl font-bold">
        {t(numbers.length === 1 ? "fm.load.load" : "fm.load.loads", { n: loadNumbers(numbers) })}
        {numbers.length === 1 && numbers[0] === card.sheet.loads && card.sheet.loads > 1 ? t("fm.load.last") : ""}
      </h2>
      <ol className="mt-1 list-decimal space-y-1 pl-6 text-lg print:text-base">
        {steps.map((s) => (
          <li key={s.step}>
            <span className="font-bold">{say(s.text)}</span>
            <span className="block text-sm print:hidden">{say(s.reason)}</span>
          </li>
        ))}
      </ol>
      {load.raisedForFiber ? <p className="font-bold">{t("fm.load.raised", { pct: rules.fiberStartPercent })}</p> : null}
      <p className="mt-1">
        {load.stripFt !== null ? (
          <Trans
            i18nKey="fm.load.coversStrip"
            values={{ sqft: fmt(load.areaSqFt), ac: fmt(load.acres, 3), ft: fmt(load.stripFt), paces: fmt(load.stripPaces ?? 0) }}
            components={{ b: <span className="font-bold" /> }}
          />
        ) : (
          t("fm.load.covers", { sqft: fmt(load.areaSqFt), ac: fmt(load.acres, 3) })
        )}
      </p>
      <p className={load.overRatingLb !== null ? "font-bold text-stop" : undefined}>
        {t(carrierRatingLb === null ? "fm.load.weight" : load.overRatingLb !== null ? "fm.load.weightOver" : "fm.load.weightOf", {
          lb: fmt(load.weightLb),
          water: fmt(load.fillToGal * card.waterLbPerGal),
          materials: fmt(materialsLb),
          rating: fmt(carrierRatingLb ?? 0),
          over: fmt(load.overRatingLb ?? 0),
        })}
      </p>
    </section>
  );
}
