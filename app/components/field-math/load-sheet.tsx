import { useState } from "react";
import { DEFAULT_FIBER_CEILING_LB_PER_100_GAL, loadSheet } from "~/lib/field-math/load-sheet";
import { acresToSqFt, fmt, galToL, lbPerAcreToKgPerHa, lbToKg, sqFtToAcres, sqMToSqFt } from "~/lib/field-math/units";
import { NumberField, ResultBox, SourceNote, toNumber, tryFieldMath } from "./kit";
import type { RigSpecs } from "~/lib/rigs/specs";

interface Row {
  key: number;
  name: string;
  rate: string;
  fiber: boolean;
  bag: string;
}

// A one-pass mulch, seed and fertilizer job at WSDOE BMP C120/C121 rates, as a starting point.
const STARTER: Row[] = [
  { key: 1, name: "Wood fiber mulch", rate: "1500", fiber: true, bag: "50" },
  { key: 2, name: "Seed mix", rate: "120", fiber: false, bag: "50" },
  { key: 3, name: "Fertilizer 10-4-6", rate: "90", fiber: false, bag: "50" },
];

const AREA_UNITS = { sqft: "ft²", acres: "acres", sqm: "m²" } as const;

/** Tank loads for an area at the job's spec rates; printable for the clipboard. */
export function LoadSheetMath({ rig, compact = false }: { rig?: RigSpecs; compact?: boolean }) {
  const [area, setArea] = useState("1");
  const [areaUnit, setAreaUnit] = useState<keyof typeof AREA_UNITS>("acres");
  const [tank, setTank] = useState(String(rig?.tankGal ?? 1000));
  const [ceiling, setCeiling] = useState(String(DEFAULT_FIBER_CEILING_LB_PER_100_GAL));
  const [rows, setRows] = useState<Row[]>(STARTER);
  const setRow = (key: number, change: Partial<Row>) => setRows(rows.map((r) => (r.key === key ? { ...r, ...change } : r)));

  const a = toNumber(area);
  const areaSqFt = areaUnit === "acres" ? acresToSqFt(a) : areaUnit === "sqm" ? sqMToSqFt(a) : a;
  const { result: r, errors } = tryFieldMath(loadSheet, {
    areaSqFt,
    tankGal: toNumber(tank),
    maxFiberLbPer100Gal: toNumber(ceiling),
    materials: rows.map((row) => ({
      name: row.name,
      lbPerAcre: toNumber(row.rate),
      fiber: row.fiber,
      ...(row.bag.trim() ? { bagLb: toNumber(row.bag) } : {}),
    })),
  });

  return (
    <div className="space-y-3">
      <div className="no-print space-y-3">
        <div className="grid grid-cols-[1fr_auto] items-end gap-2">
          <NumberField id="load-area" label="Area to cover" value={area} onChange={setArea} unit="" error={errors.areaSqFt} />
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
          beside={`${fmt(galToL(toNumber(tank) || 0))} L`}
          error={errors.tankGal}
        />
        <NumberField
          id="load-ceiling"
          label="Most fiber per 100 gal of water"
          value={ceiling}
          onChange={setCeiling}
          unit="lb"
          beside="50 lb is common practice; use your product's figure."
          error={errors.maxFiberLbPer100Gal}
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
                <label className="flex min-h-12 items-center gap-2 font-bold">
                  <input type="checkbox" checked={row.fiber} onChange={(e) => setRow(row.key, { fiber: e.target.checked })} className="h-6 w-6" /> Fiber mulch
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
              onClick={() => setRows([...rows, { key: Date.now(), name: "Tackifier", rate: "100", fiber: false, bag: "" }])}
              className="min-h-12 rounded-md border-2 border-ink bg-paper px-3 font-bold"
            >
              Add a material
            </button>
          </fieldset>
        )}
      </div>
      {r ? (
        <ResultBox>
          <p className="text-2xl font-bold" data-testid="load-count">
            {r.loads} tank load{r.loads === 1 ? "" : "s"}
          </p>
          <p>
            Each full load carries {fmt(r.fiberPerFullLoadLb)} lb of fiber and covers {fmt(r.perLoad[0].areaSqFt)} ft² ({fmt(r.perLoad[0].acres, 3)} ac).
          </p>
          <table className="mt-2 w-full border-collapse text-left">
            <caption className="sr-only">Per load</caption>
            <thead>
              <tr className="border-b-2 border-ink">
                <th scope="col">Load</th>
                <th scope="col">Water</th>
                <th scope="col">Covers</th>
                <th scope="col">Materials</th>
              </tr>
            </thead>
            <tbody>
              {r.perLoad.slice(0, 30).map((l) => (
                <tr key={l.number} className="border-b border-rule align-top">
                  <td className="font-bold">{l.number}</td>
                  <td>{fmt(l.waterGal)} gal</td>
                  <td>
                    {fmt(l.areaSqFt)} ft²
                    <br />
                    {fmt(l.acres, 3)} ac
                  </td>
                  <td>
                    {l.materials.map((m) => (
                      <div key={m.name}>
                        {m.name}: {fmt(m.lb)} lb{m.bags !== undefined ? ` (${fmt(m.bags, 1)} bags)` : ""}
                      </div>
                    ))}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
          <p className="mt-2">
            Totals: {fmt(r.totals.waterGal)} gal water ({fmt(galToL(r.totals.waterGal))} L);{" "}
            {r.totals.materials.map((m) => `${m.name} ${fmt(m.lb)} lb (${fmt(lbToKg(m.lb))} kg)`).join("; ")}.
          </p>
          {compact ? null : (
            <p className="text-sm">Rates in metric: {rows.map((row) => `${row.name} ${fmt(lbPerAcreToKgPerHa(toNumber(row.rate) || 0))} kg/ha`).join("; ")}.</p>
          )}
          <h2 className="mt-3 font-bold">Loading order</h2>
          <ol className="list-decimal pl-6">
            {r.loadingOrder.map((step) => (
              <li key={step}>{step}</li>
            ))}
          </ol>
          <SourceNote>
            Order and the {r.seedInTankMinutes}-minute seed limit: USDA NRCS Wyoming hydroseeding fact sheet. Area per load = fiber ÷ rate × 43,560 ft². Fiber
            ceiling: common practice.
          </SourceNote>
        </ResultBox>
      ) : null}
    </div>
  );
}
