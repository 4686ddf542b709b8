import { useState } from "react";
import { suctionCheck } from "~/lib/field-math/suction";
import { fmt, ftToM } from "~/lib/field-math/units";
import { NumberField, ResultBox, SourceNote, toNumber, tryFieldMath } from "./kit";
import type { RigSpecs } from "~/lib/rigs/specs";

/** Will the pump hold prime drafting from here? NPSH available against the pump's NPSH required. */
export function SuctionMath({ rig }: { rig?: RigSpecs; compact?: boolean }) {
  const [altitude, setAltitude] = useState(String(rig?.yardElevationFt ?? 0));
  const [temp, setTemp] = useState("60");
  const [lift, setLift] = useState("8");
  const [loss, setLoss] = useState("2");
  const [required, setRequired] = useState("10");
  const { result: r, errors } = tryFieldMath(suctionCheck, {
    altitudeFt: toNumber(altitude),
    waterTempF: toNumber(temp),
    liftFt: toNumber(lift),
    suctionLossFt: toNumber(loss),
    npshRequiredFt: toNumber(required),
  });
  const tone = r?.verdict === "enough" ? "good" : r?.verdict === "marginal" ? "warn" : "bad";
  const altFt = toNumber(altitude);
  const tF = toNumber(temp);
  return (
    <div className="space-y-3">
      <NumberField
        id="suction-altitude"
        label="Altitude of the pump"
        value={altitude}
        onChange={setAltitude}
        unit="ft"
        beside={Number.isFinite(altFt) ? `${fmt(ftToM(altFt))} m` : undefined}
        error={errors.altitudeFt}
      />
      <NumberField
        id="suction-temp"
        label="Water temperature"
        value={temp}
        onChange={setTemp}
        unit="°F"
        beside={Number.isFinite(tF) ? `${fmt(((tF - 32) * 5) / 9, 1)} °C` : undefined}
        error={errors.waterTempF}
      />
      <NumberField
        id="suction-lift"
        label="Lift: water surface below the pump inlet (negative if above)"
        value={lift}
        onChange={setLift}
        unit="ft"
        error={errors.liftFt}
      />
      <NumberField id="suction-loss" label="Suction hose and strainer loss" value={loss} onChange={setLoss} unit="ft" error={errors.suctionLossFt} />
      <NumberField
        id="suction-required"
        label="Pump's NPSH required (from its curve)"
        value={required}
        onChange={setRequired}
        unit="ft"
        error={errors.npshRequiredFt}
      />
      {r ? (
        <ResultBox tone={tone}>
          <p className="text-xl font-bold">
            {r.verdict === "enough" ? "Enough suction head" : r.verdict === "marginal" ? "Marginal: little to spare" : "Will cavitate or lose prime"}
          </p>
          <p className="text-lg">
            NPSH available {fmt(r.npshAvailableFt, 1)} ft ({fmt(ftToM(r.npshAvailableFt), 1)} m) against {fmt(r.npshRequiredFt, 1)} ft required +{" "}
            {fmt(r.marginFt)} ft margin.
          </p>
          <p>
            Atmosphere {fmt(r.atmosphereFt, 1)} ft − vapour {fmt(r.vapourFt, 2)} ft − lift {lift} ft − loss {loss} ft.
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
            Atmosphere: U.S. Standard Atmosphere 1976. Vapour pressure: {r.vapourSource}. Heads: 2.31 ft of water per psi (NDSU AE1057). The 3 ft margin is
            common practice.
          </SourceNote>
        </ResultBox>
      ) : null}
    </div>
  );
}
