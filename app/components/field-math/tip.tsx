import { useState } from "react";
import { Link } from "react-router";
import { MAX_PASSES, tipChoice } from "~/lib/field-math/tip-choice";
import { fmt } from "~/lib/field-math/units";
import { NumberField, ResultBox, SourceNote, toNumber, tryFieldMath } from "./kit";
import type { RigSpecs } from "~/lib/rigs/specs";

/** Which of the rig's tips covers the slope, in how many passes and from where, with the hose in use. */
export function TipMath({ rig, compact = false }: { rig?: RigSpecs; compact?: boolean }) {
  const [distance, setDistance] = useState("60");
  const [width, setWidth] = useState("150");
  const [hose, setHose] = useState(String(rig?.hoseLengthFt ?? 200));
  const [diameter, setDiameter] = useState(String(rig?.hoseDiameterIn ?? 1.5));
  const [flow, setFlow] = useState(rig?.pumpRatedGpm != null ? String(rig.pumpRatedGpm) : "");
  const [pump, setPump] = useState(rig?.pumpRatedPsi != null ? String(rig.pumpRatedPsi) : "");
  const [rise, setRise] = useState("0");
  const tips = rig?.nozzleTips ?? [];

  const { result: r, errors } = tryFieldMath(tipChoice, {
    tips,
    distanceFt: toNumber(distance),
    widthFt: toNumber(width),
    hoseLengthFt: toNumber(hose),
    diameterIn: toNumber(diameter),
    flowGpm: toNumber(flow),
    pumpPsi: toNumber(pump),
    riseFt: toNumber(rise),
  });

  if (!tips.length) {
    return (
      <ResultBox tone="warn">
        <p className="font-bold">{rig ? `${rig.code} has no nozzle tips recorded.` : "Choose a rig to see its tips."}</p>
        {rig ? (
          <p>
            Whoever keeps the rig records can add each tip&apos;s rated reach and pattern width on <Link to={`/rigs/${rig.code}`}>the rig&apos;s page</Link>.
          </p>
        ) : null}
      </ResultBox>
    );
  }
  return (
    <div className="space-y-3">
      <div className="no-print space-y-3">
        <NumberField
          id="tip-distance"
          label="Distance to the far edge"
          value={distance}
          onChange={setDistance}
          unit="ft"
          beside="From where the sprayer stands."
          error={errors.distanceFt}
        />
        <NumberField
          id="tip-width"
          label="Length of the strip"
          value={width}
          onChange={setWidth}
          unit="ft"
          beside="Along the edge you walk."
          error={errors.widthFt}
        />
        <NumberField id="tip-hose" label="Hose in use" value={hose} onChange={setHose} unit="ft" error={errors.hoseLengthFt} />
        {compact ? null : <NumberField id="tip-diameter" label="Hose diameter" value={diameter} onChange={setDiameter} unit="in" error={errors.diameterIn} />}
        <NumberField
          id="tip-pump"
          label="Pump pressure"
          value={pump}
          onChange={setPump}
          unit="psi"
          beside={rig?.pumpRatedPsi != null ? "The pump's rated pressure, from the rig's record." : "Give the pump's rated pressure (from its plate or curve)."}
          error={errors.pumpPsi}
        />
        <NumberField
          id="tip-flow"
          label="Flow at that pressure, no hose"
          value={flow}
          onChange={setFlow}
          unit="gpm"
          beside={
            rig?.pumpRatedGpm != null ? "The pump's rated flow; the hose cuts it, worked out below." : "Give the pump's rated flow (from its plate or curve)."
          }
          error={errors.flowGpm}
        />
        <NumberField
          id="tip-rise"
          label="Rise from pump to nozzle"
          value={rise}
          onChange={setRise}
          unit="ft"
          beside="Uphill costs pressure; 0 on level ground."
          error={errors.riseFt}
        />
      </div>
      {r ? (
        <ResultBox tone={r.best?.reaches ? "good" : "warn"}>
          {r.best ? (
            <>
              <p className="text-2xl font-bold" data-testid="tip-choice">
                {r.best.name}: {r.best.passes === 1 ? "one pass" : `${r.best.passes} passes`}
              </p>
              <p>
                Reaches about {fmt(r.best.reachFt)} ft with this hose (rated {fmt(r.best.ratedReachFt)} ft); about {r.best.sweeps} sweeps of its{" "}
                {fmt(r.best.widthFt)} ft pattern along the strip.
              </p>
              <ol className="mt-1 list-decimal pl-6">
                {r.best.from.map((f) => (
                  <li key={f}>{f}</li>
                ))}
              </ol>
            </>
          ) : r.tooLittlePressure ? (
            <p className="text-xl font-bold" data-testid="tip-choice">
              Only about {fmt(r.nozzlePsi)} psi reaches the nozzle: too little for a stream worth counting on. Take off hose you do not need or move the rig
              closer.
            </p>
          ) : (
            <p className="text-xl font-bold" data-testid="tip-choice">
              No tip on this rig covers {fmt(toNumber(distance))} ft in {MAX_PASSES} passes or fewer. Move the rig closer or spray from the far side too.
            </p>
          )}
          <p className={`mt-2 ${r.tooLittlePressure ? "hidden" : ""}`}>
            With this hose the flow settles near {fmt(r.flowGpm)} gpm and {fmt(r.nozzlePsi)} psi at the nozzle: the hose costs {fmt(r.frictionPsi, 1)} psi
            {r.risePsi ? ` and the rise ${fmt(r.risePsi, 1)} psi` : ""}, about {fmt(r.reachLossFt)} ft of reach off every tip.
          </p>
          <table className="mt-2 w-full border-collapse text-left">
            <caption className="sr-only">Every tip on this rig</caption>
            <thead>
              <tr className="border-b-2 border-ink">
                <th scope="col">Tip</th>
                <th scope="col">Reach</th>
                <th scope="col">Passes</th>
              </tr>
            </thead>
            <tbody>
              {r.options.map((o) => (
                <tr key={o.name} className="border-b border-rule">
                  <td className="font-bold">{o.name}</td>
                  <td>
                    {r.tooLittlePressure ? "—" : `${fmt(o.reachFt)} ft`} <span className="text-sm">(rated {fmt(o.ratedReachFt)})</span>
                  </td>
                  <td>{o.workable ? o.passes : "won't reach"}</td>
                </tr>
              ))}
            </tbody>
          </table>
          <p className="mt-2 text-sm">{r.note}</p>
          <SourceNote>
            Each psi lost before the nozzle costs about ½ ft of reach: the slope of S = NP/2 + 26 ft (Fire Engineering, Aug 1960, citing Fire Service Hydraulics
            p. 171). Taken as given: rated reach is the maker&apos;s figure at the pump&apos;s pressure with no hose, each tip passes about the rated flow
            there, and the pump holds its pressure as the flow drops. Friction: {r.hoseSource ?? "no hose"}; rise 0.434 psi per ft (NDSU AE1057). Fewest passes
            first, then the widest pattern.
          </SourceNote>
        </ResultBox>
      ) : null}
    </div>
  );
}
