import { useState } from "react";
import { hoseFriction, reachByHoseLength } from "~/lib/field-math/hose";
import { FRICTION_TABLES, HAZEN_WILLIAMS, tableFor } from "~/lib/field-math/hose-tables";
import { fmt, ftToM, psiToKpa } from "~/lib/field-math/units";
import { NumberField, ResultBox, SourceNote, toNumber, tryFieldMath } from "./kit";
import type { RigSpecs } from "~/lib/rigs/specs";

/** The ways to work friction out, in words a crew reads (the sources stay in the details line). */
const METHOD_WORDS: Record<string, string> = {
  "rohnert-park": "Hose table (most hose sizes)",
  ifsta: "Second hose table (1¾ and 2 in)",
  [HAZEN_WILLIAMS.id]: "Rigid-pipe formula (any size)",
};
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
        <NumberField id="hose-100" label="100 ft sections" value={hundreds} onChange={setHundreds} unit="×100 ft" />
        <NumberField id="hose-50" label="50 ft sections" value={fifties} onChange={setFifties} unit="×50 ft" />
      </div>
      <p>
        Hose run: <strong>{Number.isFinite(lengthFt) ? `${fmt(lengthFt)} ft (${fmt(ftToM(lengthFt))} m)` : "—"}</strong>
      </p>
      {friction.errors.lengthFt ? <p className="font-bold text-stop">{friction.errors.lengthFt}</p> : null}
      <NumberField id="hose-diameter" label="Hose inside diameter" value={diameter} onChange={setDiameter} unit="in" error={friction.errors.diameterIn} />
      {compact ? null : (
        <label className="block font-bold">
          How to work it out
          <select
            value={table}
            onChange={(e) => setTable(e.target.value)}
            className="mt-1 block min-h-14 w-full rounded-md border-2 border-ink bg-paper px-3 text-lg"
          >
            {Object.keys(METHOD_WORDS).map((id) => (
              <option key={id} value={id}>
                {METHOD_WORDS[id]}
                {sizes(id)}
              </option>
            ))}
          </select>
        </label>
      )}
      <NumberField
        id="hose-flow"
        label="Flow through the hose"
        value={flow}
        onChange={(v) => {
          setFlow(v);
          setFlowConfirmed(true);
        }}
        unit="gpm"
        beside={
          rated !== null
            ? `This rig's pump is rated ${fmt(rated)} gpm; a worn pump or a long run gives less.`
            : "Type the flow: from a flow meter, or the pump's rating."
        }
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
            Use the rated {fmt(rated)} gpm
          </button>
        ) : (
          <p className="font-bold">Type the flow to see what the hose costs.</p>
        )
      ) : null}
      {compact ? null : (
        <NumberField
          id="hose-rise"
          label="Rise from pump to nozzle (negative if downhill)"
          value={rise}
          onChange={setRise}
          unit="ft"
          error={friction.errors.elevationFt}
        />
      )}
      <NumberField id="hose-pump" label="Pump pressure" value={pump} onChange={setPump} unit="psi" error={reach.errors.pumpPsi} />
      {r ? (
        <ResultBox tone={share !== null && share > 0.5 ? "warn" : "plain"}>
          <p className="text-xl font-bold">
            Friction loss: {fmt(r.frictionLossPsi, 1)} psi ({fmt(psiToKpa(r.frictionLossPsi))} kPa)
          </p>
          {r.elevationPsi ? <p>Rise: {fmt(r.elevationPsi, 1)} psi more</p> : null}
          {share !== null ? (
            <p className="text-lg">
              {share > 1
                ? `That is more than the ${fmt(pumpPsi)} psi the pump gives: it cannot push this flow through this hose.`
                : `That is ${fmt(share * 100)} % of the pump's ${fmt(pumpPsi)} psi${share > 0.5 ? ": the hose is eating most of the pressure." : "."}`}
            </p>
          ) : null}
          <p className="mt-1">Slurry loses more than water: read this as the least you will lose.</p>
          <SourceNote>
            {r.table === HAZEN_WILLIAMS.id ? `${r.source}.` : `C = ${r.coefficient} for ${diameter} in hose (FL = C·Q²·L), from ${r.source}.`} {r.note}
          </SourceNote>
        </ResultBox>
      ) : null}
      {compact ? null : <NumberField id="hose-tip" label="Smooth-bore tip diameter" value={tip} onChange={setTip} unit="in" error={reach.errors.tipIn} />}
      {reach.result && !compact ? (
        <table className="w-full border-collapse text-left">
          <caption className="text-left font-bold">
            Reach by hose length at {pump} psi at the pump, {tip} in tip
          </caption>
          <thead>
            <tr className="border-b-2 border-ink">
              <th scope="col">Hose</th>
              <th scope="col">Flow</th>
              <th scope="col">At nozzle</th>
              <th scope="col">Reach</th>
            </tr>
          </thead>
          <tbody>
            {reach.result.rows.map((row) => (
              <tr key={row.lengthFt} className={`border-b border-rule ${row.lengthFt === lengthFt ? "bg-caution font-bold" : ""}`}>
                <td>{row.lengthFt} ft</td>
                <td>{fmt(row.flowGpm)} gpm</td>
                <td>{fmt(row.nozzlePsi)} psi</td>
                <td>{row.reachFt === null ? "under 30 psi" : `${fmt(row.reachFt)} ft`}</td>
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
