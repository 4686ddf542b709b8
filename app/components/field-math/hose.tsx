import { useState } from "react";
import { useTranslation } from "react-i18next";
import { useSay } from "~/components/ui/say";
import { hoseFriction, reachByHoseLength } from "~/lib/field-math/hose";
import { FRICTION_TABLES, HAZEN_WILLIAMS, tableFor } from "~/lib/field-math/hose-tables";
import { fmt, ftToM, psiToKpa } from "~/lib/field-math/units";
import { NumberField, ResultBox, SourceNote, toNumber, tryFieldMath } from "./kit";
import type { RigSpecs } from "~/lib/rigs/specs";

/** The ways to work friction out, in words a crew reads (the sources stay in the details line). */
const METHOD_WORDS = {
  "rohnert-park": "fm.hose.methodTable",
  ifsta: "fm.hose.methodIfsta",
  [HAZEN_WILLIAMS.id]: "fm.hose.methodPipe",
} as Record<string, "fm.hose.methodTable" | "fm.hose.methodIfsta" | "fm.hose.methodPipe">;
const sizes = (id: string) => {
  const t = FRICTION_TABLES.find((x) => x.id === id);
  return t
    ? ` — ${Object.keys(t.coefficients)
        .map(Number)
        .sort((a, b) => a - b)
        .join(", ")} in`
    : "";
};

/**
 * Hose friction for a flow, and what each 50 ft of hose costs in reach at the pump's pressure. Starts from
 * the rig's hose and pump figures, but says nothing about the run until the flow is confirmed or typed:
 * a default flow presented as fact would give a verdict about a pump nobody measured.
 */
export function HoseMath({ rig, compact = false }: { rig?: RigSpecs; compact?: boolean }) {
  const { t } = useTranslation();
  const say = useSay();
  const length = rig?.hoseLengthFt ?? 300;
  const [hundreds, setHundreds] = useState(String(Math.floor(length / 100)));
  const [fifties, setFifties] = useState(String(Math.round((length % 100) / 50)));
  const [diameter, setDiameter] = useState(String(rig?.hoseDiameterIn ?? 1.5));
  const rated = rig?.pumpRatedGpm ?? null;
  const [flow, setFlow] = useState("");
  const [flowConfirmed, setFlowConfirmed] = useState(false);
  const [rise, setRise] = useState("0");
  const [pump, setPump] = useState(rig?.pumpRatedPsi != null ? String(rig.pumpRatedPsi) : "100");
  const [tip, setTip] = useState("0.75");
  const [table, setTable] = useState(tableFor(rig?.hoseDiameterIn ?? 1.5)?.id ?? HAZEN_WILLIAMS.id);

  const lengthFt = 100 * toNumber(hundreds) + 50 * toNumber(fifties);
  // A hose table that does not list this size gives way to the formula, rather than an error.
  const usable = table === HAZEN_WILLIAMS.id || tableFor(toNumber(diameter), table)?.id === table ? table : undefined;
  const friction = tryFieldMath(hoseFriction, {
    flowGpm: toNumber(flow),
    lengthFt,
    diameterIn: toNumber(diameter),
    table: usable,
    elevationFt: toNumber(rise),
  });
  const reach = tryFieldMath(reachByHoseLength, {
    pumpPsi: toNumber(pump),
    tipIn: toNumber(tip),
    diameterIn: toNumber(diameter),
    table: usable,
    elevationFt: toNumber(rise),
    maxLengthFt: Math.max(100, Math.min(1000, lengthFt || 300)),
  });
  const r = flowConfirmed ? friction.result : null;
  const pumpPsi = toNumber(pump);
  const share = r && pumpPsi > 0 ? r.totalLossPsi / pumpPsi : null;

  return (
    <div className="space-y-3">
      <div className="grid grid-cols-2 gap-3">
        <NumberField id="hose-100" label={t("fm.hose.hundreds")} value={hundreds} onChange={setHundreds} unit="×100 ft" />
        <NumberField id="hose-50" label={t("fm.hose.fifties")} value={fifties} onChange={setFifties} unit="×50 ft" />
      </div>
      <p>
        {t("fm.hose.run")} <strong>{Number.isFinite(lengthFt) ? `${fmt(lengthFt)} ft (${fmt(ftToM(lengthFt))} m)` : "—"}</strong>
      </p>
      {friction.errors.lengthFt ? <p className="font-bold text-stop">{say(friction.errors.lengthFt)}</p> : null}
      <NumberField id="hose-diameter" label={t("fm.hose.diameter")} value={diameter} onChange={setDiameter} unit="in" error={friction.errors.diameterIn} />
      {compact ? null : (
        <label className="block font-bold">
          {t("fm.hose.how")}
          <select
            value={table}
            onChange={(e) => setTable(e.target.value)}
            className="mt-1 block min-h-14 w-full rounded-md border-2 border-ink bg-paper px-3 text-lg"
          >
            {Object.keys(METHOD_WORDS).map((id) => (
              <option key={id} value={id}>
                {t(METHOD_WORDS[id])}
                {sizes(id)}
              </option>
            ))}
          </select>
        </label>
      )}
      <NumberField
        id="hose-flow"
        label={t("fm.hose.flow")}
        value={flow}
        onChange={(v) => {
          setFlow(v);
          setFlowConfirmed(true);
        }}
        unit="gpm"
        beside={rated !== null ? t("fm.hose.rated", { gpm: fmt(rated) }) : t("fm.hose.typeFlow")}
        error={flowConfirmed ? friction.errors.flowGpm : undefined}
      />
      {!flowConfirmed ? (
        rated !== null ? (
          <button
            type="button"
            onClick={() => {
              setFlow(String(rated));
              setFlowConfirmed(true);
            }}
            className="min-h-14 w-full rounded-md border-2 border-ink bg-paper px-3 text-lg font-bold"
          >
            {t("fm.hose.useRated", { gpm: fmt(rated) })}
          </button>
        ) : (
          <p className="font-bold">{t("fm.hose.typeToSee")}</p>
        )
      ) : null}
      {compact ? null : <NumberField id="hose-rise" label={t("fm.hose.rise")} value={rise} onChange={setRise} unit="ft" error={friction.errors.elevationFt} />}
      <NumberField id="hose-pump" label={t("fm.hose.pump")} value={pump} onChange={setPump} unit="psi" error={reach.errors.pumpPsi} />
      {r ? (
        <ResultBox tone={share !== null && share > 0.5 ? "warn" : "plain"}>
          <p className="text-xl font-bold">{t("fm.hose.friction", { psi: fmt(r.frictionLossPsi, 1), kpa: fmt(psiToKpa(r.frictionLossPsi)) })}</p>
          {r.elevationPsi ? <p>{t("fm.hose.risePsi", { psi: fmt(r.elevationPsi, 1) })}</p> : null}
          {share !== null ? (
            <p className="text-lg">
              {share > 1
                ? t("fm.hose.tooMuch", { psi: fmt(pumpPsi) })
                : t(share > 0.5 ? "fm.hose.shareBig" : "fm.hose.share", { pct: fmt(share * 100), psi: fmt(pumpPsi) })}
            </p>
          ) : null}
          <p className="mt-1">{t("fm.hose.slurry")}</p>
          <SourceNote>
            {r.table === HAZEN_WILLIAMS.id ? `${r.source}.` : `C = ${r.coefficient} for ${diameter} in hose (FL = C·Q²·L), from ${r.source}.`} {r.note}
          </SourceNote>
        </ResultBox>
      ) : null}
      {compact ? null : <NumberField id="hose-tip" label={t("fm.hose.tip")} value={tip} onChange={setTip} unit="in" error={reach.errors.tipIn} />}
      {reach.result && !compact ? (
        <table className="w-full border-collapse text-left">
          <caption className="text-left font-bold">{t("fm.hose.reachCaption", { psi: pump, tip })}</caption>
          <thead>
            <tr className="border-b-2 border-ink">
              <th scope="col">{t("fm.hose.colHose")}</th>
              <th scope="col">{t("fm.hose.colFlow")}</th>
              <th scope="col">{t("fm.hose.colNozzle")}</th>
              <th scope="col">{t("fm.hose.colReach")}</th>
            </tr>
          </thead>
          <tbody>
            {reach.result.rows.map((row) => (
              <tr key={row.lengthFt} className={`border-b border-rule ${row.lengthFt === lengthFt ? "bg-caution font-bold" : ""}`}>
                <td>{row.lengthFt} ft</td>
                <td>{fmt(row.flowGpm)} gpm</td>
                <td>{fmt(row.nozzlePsi)} psi</td>
                <td>{row.reachFt === null ? t("fm.hose.under30") : `${fmt(row.reachFt)} ft`}</td>
              </tr>
            ))}
          </tbody>
        </table>
      ) : null}
      {reach.result && !compact ? (
        <SourceNote>
          Reach: S = NP/2 + 26 ft for a ¾ in tip, +5 ft per ⅛ in larger (Fire Engineering, Aug 1960). Flow: 29.7·d²·√NP. Water figures; slurry reaches less.
        </SourceNote>
      ) : null}
    </div>
  );
}
