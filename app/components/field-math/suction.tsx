import { useState } from "react";
import { suctionCheck } from "~/lib/field-math/suction";
import { fmt, ftToM } from "~/lib/field-math/units";
import { NumberField, ResultBox, SourceNote, toNumber, tryFieldMath } from "./kit";
import type { RigSpecs } from "~/lib/rigs/specs";

/**
 * Will the pump hold prime drafting from here? The suction it gets (NPSH available) against what it
 * needs from its curve (NPSH required). Starts from the rig's own figure and its job's site elevation;
 * the water and the lift are typed for this site — no verdict from figures nobody measured.
 */
export function SuctionMath({ rig }: { rig?: RigSpecs; compact?: boolean }) {
  // The job's site elevation when the rig is on a job with one recorded: the yard's is often far off.
  const site = rig?.job?.elevationFt != null ? rig.job : null;
  const [altitude, setAltitude] = useState(site ? String(site.elevationFt) : "");
  const [temp, setTemp] = useState("");
  const [lift, setLift] = useState("");
  const [loss, setLoss] = useState("");
  const [required, setRequired] = useState(rig?.pumpNpshrFt != null ? String(rig.pumpNpshrFt) : "");
  const typed = [altitude, temp, lift, loss, required].every((v) => v.trim() !== "");
  const checked = tryFieldMath(suctionCheck, {
    altitudeFt: toNumber(altitude),
    waterTempF: toNumber(temp),
    liftFt: toNumber(lift),
    suctionLossFt: toNumber(loss),
    npshRequiredFt: toNumber(required),
  });
  const r = typed ? checked.result : null;
  // A field's message only once something is typed in it: an empty form is not wrong, only unfinished.
  const errorIf = (value: string, message: string | undefined) => (value.trim() === "" ? undefined : message);
  const errors = checked.errors;
  const tone = r?.verdict === "enough" ? "good" : r?.verdict === "marginal" ? "warn" : "bad";
  const altFt = toNumber(altitude);
  const tF = toNumber(temp);
  return (
    <div className="space-y-3">
      <NumberField
        id="suction-altitude"
        label="Elevation of this site"
        value={altitude}
        onChange={setAltitude}
        unit="ft"
        beside={
          site && altFt === site.elevationFt
            ? `${fmt(ftToM(altFt))} m, from the job: ${site.name}.`
            : Number.isFinite(altFt)
              ? `${fmt(ftToM(altFt))} m`
              : rig
                ? `The yard is at ${fmt(rig.yardElevationFt)} ft; this site may not be.`
                : undefined
        }
        error={errorIf(altitude, errors.altitudeFt)}
      />
      <NumberField
        id="suction-temp"
        label="Water temperature"
        value={temp}
        onChange={setTemp}
        unit="°F"
        beside={Number.isFinite(tF) ? `${fmt(((tF - 32) * 5) / 9, 1)} °C` : "Warm water boils off sooner in the suction line."}
        error={errorIf(temp, errors.waterTempF)}
      />
      <NumberField
        id="suction-lift"
        label="Lift: water surface below the pump inlet (negative if above)"
        value={lift}
        onChange={setLift}
        unit="ft"
        error={errorIf(lift, errors.liftFt)}
      />
      <NumberField
        id="suction-loss"
        label="Loss in the suction hose and strainer"
        value={loss}
        onChange={setLoss}
        unit="ft"
        beside="About 2 ft for a short hose and a clean strainer (common practice)."
        error={errorIf(loss, errors.suctionLossFt)}
      />
      <NumberField
        id="suction-required"
        label="How much suction the pump needs (from its curve)"
        value={required}
        onChange={setRequired}
        unit="ft"
        beside={rig?.pumpNpshrFt != null ? `From ${rig.code}'s record.` : "Read it off the pump's curve at your flow, or ask the shop."}
        error={errorIf(required, errors.npshRequiredFt)}
      />
      {!typed ? <p className="font-bold">Fill in every figure for this site to see whether the pump will hold prime.</p> : null}
      {r ? (
        <ResultBox tone={tone}>
          <p className="text-xl font-bold">
            {r.verdict === "enough" ? "Enough suction head" : r.verdict === "marginal" ? "Marginal: little to spare" : "Will cavitate or lose prime"}
          </p>
          <p className="text-lg">
            The pump gets {fmt(r.npshAvailableFt, 1)} ft ({fmt(ftToM(r.npshAvailableFt), 1)} m) of suction; it needs {fmt(r.npshRequiredFt, 1)} ft plus{" "}
            {fmt(r.marginFt)} ft to spare.
          </p>
          <p>
            Air pressure {fmt(r.atmosphereFt, 1)} ft − vapor {fmt(r.vapourFt, 2)} ft − lift {lift} ft − loss {loss} ft.
          </p>
          {r.advice.length ? (
            <ul className="mt-2 list-disc pl-6 text-lg">
              {r.advice.map((a) => (
                <li key={a}>{a}</li>
              ))}
            </ul>
          ) : null}
          {r.liftNote ? <p className="mt-2 font-bold">{r.liftNote}</p> : null}
          <SourceNote>
            Atmosphere: U.S. Standard Atmosphere 1976. Vapor pressure: {r.vapourSource}. The pump's need is its NPSH required (ANSI/HI 9.6.1). Heads: 2.31 ft of
            water per psi (NDSU AE1057). The 3 ft margin is common practice.
          </SourceNote>
        </ResultBox>
      ) : null}
    </div>
  );
}
