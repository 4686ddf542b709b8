import { useState } from "react";
import { Trans, useTranslation } from "react-i18next";
import { Link } from "react-router";
import { useSay } from "~/components/ui/say";
import { MAX_PASSES, tipChoice } from "~/lib/field-math/tip-choice";
import { fmt } from "~/lib/field-math/units";
import { NumberField, ResultBox, SourceNote, toNumber, tryFieldMath } from "./kit";
import type { RigSpecs } from "~/lib/rigs/specs";

/** Which of the rig's tips covers the slope, in how many passes and from where, with the hose in use. */
export function TipMath({ rig, compact = false }: { rig?: RigSpecs; compact?: boolean }) {
  const { t } = useTranslation();
  const say = useSay();
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
        <p className="font-bold">{rig ? t("fm.tip.noTips", { code: rig.code }) : t("fm.tip.chooseRig")}</p>
        {rig ? (
          <p>
            <Trans i18nKey="fm.tip.addTips" components={{ a: <Link to={`/rigs/${rig.code}`} /> }} />
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
          label={t("fm.tip.distance")}
          value={distance}
          onChange={setDistance}
          unit="ft"
          beside={t("fm.tip.distanceHint")}
          error={errors.distanceFt}
        />
        <NumberField
          id="tip-width"
          label={t("fm.tip.length")}
          value={width}
          onChange={setWidth}
          unit="ft"
          beside={t("fm.tip.lengthHint")}
          error={errors.widthFt}
        />
        <NumberField id="tip-hose" label={t("fm.tip.hose")} value={hose} onChange={setHose} unit="ft" error={errors.hoseLengthFt} />
        {compact ? null : (
          <NumberField id="tip-diameter" label={t("fm.tip.diameter")} value={diameter} onChange={setDiameter} unit="in" error={errors.diameterIn} />
        )}
        <NumberField
          id="tip-pump"
          label={t("fm.tip.pump")}
          value={pump}
          onChange={setPump}
          unit="psi"
          beside={rig?.pumpRatedPsi != null ? t("fm.tip.pumpRated") : t("fm.tip.pumpGive")}
          error={errors.pumpPsi}
        />
        <NumberField
          id="tip-flow"
          label={t("fm.tip.flow")}
          value={flow}
          onChange={setFlow}
          unit="gpm"
          beside={rig?.pumpRatedGpm != null ? t("fm.tip.flowRated") : t("fm.tip.flowGive")}
          error={errors.flowGpm}
        />
        <NumberField id="tip-rise" label={t("fm.tip.rise")} value={rise} onChange={setRise} unit="ft" beside={t("fm.tip.riseHint")} error={errors.riseFt} />
      </div>
      {r ? (
        <ResultBox tone={r.best?.reaches ? "good" : "warn"}>
          {r.best ? (
            <>
              <p className="text-2xl font-bold" data-testid="tip-choice">
                {r.best.passes === 1 ? t("fm.tip.onePass", { name: r.best.name }) : t("fm.tip.passes", { name: r.best.name, count: r.best.passes })}
              </p>
              <p>{t("fm.tip.reaches", { reach: fmt(r.best.reachFt), rated: fmt(r.best.ratedReachFt), sweeps: r.best.sweeps, width: fmt(r.best.widthFt) })}</p>
              <ol className="mt-1 list-decimal pl-6">
                {r.best.from.map((f) => (
                  <li key={f}>{say(f)}</li>
                ))}
              </ol>
            </>
          ) : r.tooLittlePressure ? (
            <p className="text-xl font-bold" data-testid="tip-choice">
              {t("fm.tip.tooLittle", { psi: fmt(r.nozzlePsi) })}
            </p>
          ) : (
            <p className="text-xl font-bold" data-testid="tip-choice">
              {t("fm.tip.noneCovers", { ft: fmt(toNumber(distance)), max: MAX_PASSES })}
            </p>
          )}
          <p className={`mt-2 ${r.tooLittlePressure ? "hidden" : ""}`}>
            {t(r.risePsi ? "fm.tip.settlesRise" : "fm.tip.settles", {
              gpm: fmt(r.flowGpm),
              psi: fmt(r.nozzlePsi),
              friction: fmt(r.frictionPsi, 1),
              rise: fmt(r.risePsi ?? 0, 1),
              loss: fmt(r.reachLossFt),
            })}
          </p>
          <table className="mt-2 w-full border-collapse text-left">
            <caption className="sr-only">{t("fm.tip.every")}</caption>
            <thead>
              <tr className="border-b-2 border-ink">
                <th scope="col">{t("fm.tip.colTip")}</th>
                <th scope="col">{t("fm.tip.colReach")}</th>
                <th scope="col">{t("fm.tip.colPasses")}</th>
              </tr>
            </thead>
            <tbody>
              {r.options.map((o) => (
                <tr key={o.name} className="border-b border-rule">
                  <td className="font-bold">{o.name}</td>
                  <td>
                    {r.tooLittlePressure ? "—" : `${fmt(o.reachFt)} ft`} <span className="text-sm">{t("fm.tip.rated", { ft: fmt(o.ratedReachFt) })}</span>
                  </td>
                  <td>{o.workable ? o.passes : t("fm.tip.wontReach")}</td>
                </tr>
              ))}
            </tbody>
          </table>
          <p className="mt-2 text-sm">{say(r.note)}</p>
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
