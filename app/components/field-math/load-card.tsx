import { useEffect, useState } from "react";
import { lbText, loadCard, loadNumbers, loadSteps, type CardLoad, type CardMaterial, type LoadCard } from "~/lib/field-math/load-card";
import { DEFAULT_LOAD_RULES, MATERIAL_KIND_LABELS, MATERIAL_KINDS, type LoadRules, type MaterialKind } from "~/lib/field-math/load-rules";
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

// A one-pass mulch, seed and fertilizer job at WSDOE BMP C120/C121 rates, as a starting point.
const STARTER: Row[] = [
  { key: 1, name: "Wood fiber mulch", rate: "1500", kind: "fiber", bag: "50" },
  { key: 2, name: "Seed mix", rate: "120", kind: "seed", bag: "50" },
  { key: 3, name: "Fertilizer 10-4-6", rate: "90", kind: "fertilizer", bag: "50" },
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
      : STARTER,
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
              Job name on the printed card
              <input
                value={job}
                onChange={(e) => setJob(e.target.value)}
                placeholder="Site or customer"
                className="mt-1 block min-h-14 w-full rounded-md border-2 border-ink bg-paper px-3 text-lg"
              />
            </label>
            <label className="block font-bold">
              Date
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
            From the job <span className="font-bold">{onJob.name}</span>: its spec, and {fmt(onJob.remainingAcres, 2)} acres left to spray of{" "}
            {fmt(onJob.areaAcres * onJob.passes, 2)}.{" "}
            {onJob.remainingAcres > MAX_CARD_ACRES
              ? `The card plans up to ${MAX_CARD_ACRES} acres at a time: put in today's section.`
              : "Change the area to today's section if you spray less."}
          </p>
        ) : null}
        <div className="grid grid-cols-[1fr_auto] items-end gap-2">
          <NumberField
            id="load-area"
            label="Area to cover"
            value={area}
            onChange={setArea}
            unit=""
            error={
              errors.areaSqFt && areaSqFt > MAX_CARD_ACRES * 43_560
                ? `The card plans up to ${MAX_CARD_ACRES} acres (${fmt(MAX_CARD_ACRES * 43_560)} ft²) at a time: put in today's section.`
                : errors.areaSqFt
            }
          />
          <select
            aria-label="Area unit"
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
          label="Tank size"
          value={tank}
          onChange={setTank}
          unit="gal"
          beside={
            rig && toNumber(tank) > rig.tankGal
              ? `More than ${rig.code}'s ${fmt(rig.tankGal)} gal tank: check the figure.`
              : `${fmt(galToL(toNumber(tank) || 0))} L`
          }
          error={errors.tankGal}
        />
        <NumberField
          id="load-water-rate"
          label="Water per acre (optional)"
          value={waterRate}
          onChange={setWaterRate}
          unit="gal"
          beside="From the spec, if it sets one. Blank: as much as the fiber needs under the ceiling."
          error={errors.waterGalPerAcre}
        />
        <NumberField
          id="load-ceiling"
          label="Most fiber per 100 gal of water"
          value={ceiling}
          onChange={setCeiling}
          unit="lb"
          beside="Your company's figure; 50 lb is common practice. Use your product's."
          error={errors.maxFiberLbPer100Gal}
        />
        <NumberField
          id="load-slope-width"
          label="Width of the strip you spray"
          value={slopeWidth}
          onChange={setSlopeWidth}
          unit="ft"
          beside="Shows each load as a length of the slope, in feet and paces."
          error={errors.slopeWidthFt}
        />
        {compact ? null : (
          <fieldset className="space-y-3 rounded-md border-2 border-rule p-3">
            <legend className="px-1 font-bold">Materials at the spec rate</legend>
            {errors.materials ? <p className="font-bold text-stop">{errors.materials}</p> : null}
            {rows.map((row, i) => (
              <div key={row.key} className="grid grid-cols-1 gap-2 border-b border-rule pb-3 sm:grid-cols-2">
                <label className="font-bold sm:col-span-2">
                  Material {i + 1}
                  <input
                    value={row.name}
                    onChange={(e) => setRow(row.key, { name: e.target.value })}
                    className="mt-1 block min-h-14 w-full rounded-md border-2 border-ink bg-paper px-3 text-lg"
                  />
                  {errors[`materials.${i}.name`] ? <span className="text-stop">{errors[`materials.${i}.name`]}</span> : null}
                </label>
                <NumberField
                  id={`rate-${row.key}`}
                  label="Rate"
                  value={row.rate}
                  onChange={(v) => setRow(row.key, { rate: v })}
                  unit="lb/ac"
                  error={errors[`materials.${i}.lbPerAcre`]}
                />
                <NumberField
                  id={`bag-${row.key}`}
                  label="Bag size"
                  value={row.bag}
                  onChange={(v) => setRow(row.key, { bag: v })}
                  unit="lb"
                  error={errors[`materials.${i}.bagLb`]}
                />
                <label className="block font-bold">
                  What it is
                  <select
                    value={row.kind}
                    onChange={(e) => setRow(row.key, { kind: e.target.value as MaterialKind })}
                    className="mt-1 block min-h-14 w-full rounded-md border-2 border-ink bg-paper px-2 text-lg"
                  >
                    {MATERIAL_KINDS.map((k) => (
                      <option key={k} value={k}>
                        {MATERIAL_KIND_LABELS[k]}
                      </option>
                    ))}
                  </select>
                </label>
                <button
                  type="button"
                  onClick={() => setRows(rows.filter((x) => x.key !== row.key))}
                  className="min-h-12 rounded-md border-2 border-ink bg-paper font-bold"
                >
                  Remove
                </button>
              </div>
            ))}
            <button
              type="button"
              onClick={() => setRows([...rows, { key: Date.now(), name: "Tackifier", rate: "100", kind: "tackifier", bag: "" }])}
              className="min-h-12 rounded-md border-2 border-ink bg-paper px-3 font-bold"
            >
              Add a material
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
  const first = card.loads[0];
  const hasSeed = first.materials.some((m) => m.kind === "seed");
  const over = card.loads.some((l) => l.overRatingLb !== null);
  return (
    <>
      <ResultBox tone={over ? "bad" : "plain"}>
        <div className="load-card">
          <p className="hidden text-2xl font-bold print:block">
            Load card · {job.trim() || "Job not named"} · <span className="whitespace-nowrap">{date}</span> ·{" "}
            <span className="whitespace-nowrap">{rig ? `${rig.code} ${rig.name}` : "rig not chosen"}</span>
          </p>
          <p className="text-2xl font-bold" data-testid="load-count">
            {card.sheet.loads} tank load{card.sheet.loads === 1 ? "" : "s"}
          </p>
          <p>
            {card.sheet.loads === 1 ? "The load" : "A full load"}: fill to {fmt(first.fillToGal)} gal, covers {fmt(first.areaSqFt)} ft² ({fmt(first.acres, 3)}{" "}
            ac).
          </p>
          {hasSeed ? (
            <div className="mt-2">
              <SeedClock limitMinutes={rules.seedLimitMinutes} label={job.trim() || (rig ? rig.code : "this load")} />
            </div>
          ) : null}
          {card.notes.map((note) => (
            <p
              key={note}
              className={`mt-2 rounded-md border-2 p-2 font-bold ${note.startsWith("Over") ? "border-stop text-stop" : "border-ink bg-caution"}`}
              role="alert"
            >
              {note}
            </p>
          ))}
          <div className="print:hidden">
            {card.groups.map((g) => (
              <LoadGroup key={g.numbers[0]} numbers={g.numbers} load={g.load} card={card} rules={rules} carrierRatingLb={rig?.carrierRatingLb ?? null} />
            ))}
          </div>
          <PrintedLoads card={card} rules={rules} />
          <p className="mt-3">
            Totals: {fmt(card.waterGal)} gal water ({fmt(galToL(card.waterGal))} L);{" "}
            {card.totals
              .map(
                (m) =>
                  `${m.name} ${lbText(m.lb)} (${fmt(lbToKg(m.lb), m.lb < 10 ? 1 : 0)} kg)${m.bringBags !== null ? `: bring ${m.bringBags} bag${m.bringBags === 1 ? "" : "s"}` : ""}`,
              )
              .join("; ")}
            .
          </p>
          {compact ? null : (
            <p className="text-sm print:hidden">
              Rates in metric: {rates.map((row) => `${row.name} ${fmt(lbPerAcreToKgPerHa(toNumber(row.rate) || 0))} kg/ha`).join("; ")}.
            </p>
          )}
          <p className="mt-2 text-sm print:text-xs">{card.bagRule}</p>
          <p className="hidden text-lg font-bold print:block">Seed in at ______ · spray by ______ ({rules.seedLimitMinutes} minutes)</p>
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

const shortAmount = (m: CardMaterial) =>
  m.bags ? `${m.bags} bag${m.bags === 1 ? "" : "s"}${m.weighLb > 0 ? ` + ${lbText(m.weighLb)}` : ""}` : `${lbText(m.lb)}${m.bags === 0 ? " (weigh)" : ""}`;

/** On paper, the recipes side by side: one row per step in the company's order, one column per group of loads. */
function PrintedLoads({ card, rules }: { card: LoadCard; rules: LoadRules }) {
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
          "Water to",
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
                <b>{shortAmount(l.materials[k])}</b>,{" "}
                {l.fillToGal > l.fiberDoneGal
                  ? `all in by ${fmt(l.fiberDoneGal)} gal; then water to ${fmt(l.fillToGal)} gal`
                  : `all in by ${fmt(l.fillToGal)} gal, water stops`}
              </>
            ) : (
              <b>{shortAmount(l.materials[k])}</b>
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
        "Fill to",
        loads.map((l) => `${fmt(l.fillToGal)} gal`),
      ),
    );
  rows.push(
    row(
      "Covers",
      loads.map((l) => `${fmt(l.areaSqFt)} ft²${l.stripFt !== null ? ` · ${fmt(l.stripFt)} ft strip · ${fmt(l.stripPaces ?? 0)} paces` : ""}`),
    ),
  );
  rows.push(
    row(
      "Weight",
      loads.map((l) => (l.overRatingLb !== null ? <b>{`${fmt(l.weightLb)} lb: OVER rating by ${fmt(l.overRatingLb)} lb`}</b> : `${fmt(l.weightLb)} lb`)),
    ),
  );
  return (
    <table className="mt-3 hidden w-full border-collapse text-left print:table" data-testid="printed-loads">
      <caption className="caption-top pb-1 text-left font-bold">Load top to bottom, agitator running.</caption>
      <thead>
        <tr>
          <td className={cell} />
          {card.groups.map((g) => (
            <th key={g.numbers[0]} scope="col" className={`${cell} text-left`}>
              {g.numbers.length === 1 ? "Load" : "Loads"} {loadNumbers(g.numbers)}
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
  const steps = loadSteps(load, rules);
  const materialsLb = load.materials.reduce((s, m) => s + m.lb, 0);
  return (
    <section className="mt-3 break-inside-avoid border-t-4 border-ink pt-2" aria-label={`Load ${loadNumbers(numbers)}`}>
      <h2 className="text-xl font-bold">
        {numbers.length === 1 ? "Load" : "Loads"} {loadNumbers(numbers)}
        {numbers.length === 1 && numbers[0] === card.sheet.loads && card.sheet.loads > 1 ? " (last)" : ""}
      </h2>
      <ol className="mt-1 list-decimal space-y-1 pl-6 text-lg print:text-base">
        {steps.map((s) => (
          <li key={s.step}>
            <span className="font-bold">{s.text}</span>
            <span className="block text-sm print:hidden">{s.reason}</span>
          </li>
        ))}
      </ol>
      {load.raisedForFiber ? (
        <p className="font-bold">
          Water raised to the {rules.fiberStartPercent} % mark so the fiber goes in over covered paddles: this load is thinner than the rest. Spray it over the
          same area; it goes on wetter.
        </p>
      ) : null}
      <p className="mt-1">
        Covers {fmt(load.areaSqFt)} ft² ({fmt(load.acres, 3)} ac)
        {load.stripFt !== null ? (
          <>
            {" "}
            = a strip <span className="font-bold">{fmt(load.stripFt)} ft</span> long, about <span className="font-bold">{fmt(load.stripPaces ?? 0)} paces</span>
          </>
        ) : null}
        .
      </p>
      <p className={load.overRatingLb !== null ? "font-bold text-stop" : undefined}>
        Loaded weight about {fmt(load.weightLb)} lb (water {fmt(load.fillToGal * card.waterLbPerGal)} lb + materials {fmt(materialsLb)} lb)
        {carrierRatingLb !== null
          ? load.overRatingLb !== null
            ? `: over the rig's ${fmt(carrierRatingLb)} lb rating by ${fmt(load.overRatingLb)} lb.`
            : ` of the rig's ${fmt(carrierRatingLb)} lb rating.`
          : ". No carrier rating recorded for this rig."}
      </p>
    </section>
  );
}
