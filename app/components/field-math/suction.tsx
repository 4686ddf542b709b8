import { useState } from "react";
import { useTranslation } from "react-i18next";
import { useSay } from "~/components/ui/say";
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
  const { t } = useTranslation();
  const say = useSay();
  return (
    <div className="space-y-3">
      <NumberField
        id="suction-altitude"
        label={t("fm.suction.elevation")}
        value={altitude}
        onChange={setAltitude}
        unit="ft"
        beside={
          site && altFt === site.elevationFt
            ? t("fm.suction.fromJob", { m: fmt(ftToM(altFt)), job: site.name })
            : Number.isFinite(altFt)
              ? t("fm.suction.meters", { m: fmt(ftToM(altFt)) })
              : rig
                ? t("fm.suction.yard", { ft: fmt(rig.yardElevationFt) })
                : undefined
        }
        error={errorIf(altitude, errors.altitudeFt)}
      />
      <NumberField
        id="suction-temp"
        label={t("fm.suction.temp")}
        value={temp}
        onChange={setTemp}
        unit="°F"
        beside={Number.isFinite(tF) ? t("fm.suction.celsius", { c: fmt(((tF - 32) * 5) / 9, 1) }) : t("fm.suction.warm")}
        error={errorIf(temp, errors.waterTempF)}
      />
      <NumberField id="suction-lift" label={t("fm.suction.lift")} value={lift} onChange={setLift} unit="ft" error={errorIf(lift, errors.liftFt)} />
      <NumberField
        id="suction-loss"
        label={t("fm.suction.loss")}
        value={loss}
        onChange={setLoss}
        unit="ft"
        beside={t("fm.suction.lossHint")}
        error={errorIf(loss, errors.suctionLossFt)}
      />
      <NumberField
        id="suction-required"
        label={t("fm.suction.required")}
        value={required}
        onChange={setRequired}
        unit="ft"
        beside={rig?.pumpNpshrFt != null ? t("fm.suction.fromRecord", { code: rig.code }) : t("fm.suction.readCurve")}
        error={errorIf(required, errors.npshRequiredFt)}
      />
      {!typed ? <p className="font-bold">{t("fm.suction.fillIn")}</p> : null}
      {r ? (
        <ResultBox tone={tone}>
          <p className="text-xl font-bold">
            {r.verdict === "enough" ? t("fm.suction.enough") : r.verdict === "marginal" ? t("fm.suction.marginal") : t("fm.suction.cavitate")}
          </p>
          <p className="text-lg">
            {t("fm.suction.gets", {
              ft: fmt(r.npshAvailableFt, 1),
              m: fmt(ftToM(r.npshAvailableFt), 1),
              need: fmt(r.npshRequiredFt, 1),
              margin: fmt(r.marginFt),
            })}
          </p>
          <p>{t("fm.suction.sum", { air: fmt(r.atmosphereFt, 1), vapor: fmt(r.vapourFt, 2), lift, loss })}</p>
          {r.advice.length ? (
            <ul className="mt-2 list-disc pl-6 text-lg">
              {r.advice.map((a) => (
                <li key={a}>{say(a)}</li>
              ))}
            </ul>
          ) : null}
          {r.liftNote ? <p className="mt-2 font-bold">{say(r.liftNote)}</p> : null}
          <SourceNote>
            Atmosphere: U.S. Standard Atmosphere 1976. Vapor pressure: {r.vapourSource}. The pump's need is its NPSH required (ANSI/HI 9.6.1). Heads: 2.31 ft of
            water per psi (NDSU AE1057). The 3 ft margin is common practice.
          </SourceNote>
        </ResultBox>
      ) : null}
    </div>
  );
}
