import { useState } from "react";
import { useTranslation } from "react-i18next";
import { fiberCheck } from "~/lib/field-math/fiber-check";
import { DEFAULT_FIBER_CEILING_LB_PER_100_GAL } from "~/lib/field-math/load-sheet";
import { fmt, galToL, lbToKg } from "~/lib/field-math/units";
import { NumberField, ResultBox, SourceNote, toNumber, tryFieldMath } from "./kit";
import type { RigSpecs } from "~/lib/rigs/specs";

/** What actually went into this load, against what its water can carry and what the carrier is rated for. */
export function FiberCheckMath({ rig }: { rig?: RigSpecs; compact?: boolean }) {
  const [bags, setBags] = useState("");
  const [bagLb, setBagLb] = useState("50");
  const [water, setWater] = useState("");
  const typed = bags.trim() !== "" && water.trim() !== "" && bagLb.trim() !== "";
  const checked = tryFieldMath(fiberCheck, {
    bags: toNumber(bags),
    lbPerBag: toNumber(bagLb),
    waterGal: toNumber(water),
    tankGal: rig?.tankGal ?? 6000,
    carrierRatingLb: rig?.carrierRatingLb ?? undefined,
  });
  const r = typed ? checked.result : null;
  const err = (value: string, message?: string) => (value.trim() === "" ? undefined : message);
  const { t } = useTranslation();
  return (
    <div className="space-y-3">
      <div className="grid grid-cols-2 gap-3">
        <NumberField
          id="fiber-bags"
          label={t("fm.fiber.bags")}
          value={bags}
          onChange={setBags}
          unit={t("fm.fiber.bagsUnit")}
          error={err(bags, checked.errors.bags)}
        />
        <NumberField id="fiber-bag-lb" label={t("fm.fiber.bagLb")} value={bagLb} onChange={setBagLb} unit="lb" error={err(bagLb, checked.errors.lbPerBag)} />
      </div>
      <NumberField
        id="fiber-water"
        label={t("fm.fiber.water")}
        value={water}
        onChange={setWater}
        unit="gal"
        beside={rig ? t("fm.fiber.tankHolds", { code: rig.code, gal: fmt(rig.tankGal) }) : undefined}
        error={err(water, checked.errors.waterGal)}
      />
      {!typed ? <p className="font-bold">{t("fm.fiber.typeIt")}</p> : null}
      {r ? (
        <ResultBox tone={r.overFiber || r.overCarrier ? "bad" : "good"}>
          <p className="text-xl font-bold">
            {r.overFiber
              ? t("fm.fiber.over", { fiber: fmt(r.fiberLb), limit: fmt(r.limitLb) })
              : t("fm.fiber.within", { fiber: fmt(r.fiberLb), limit: fmt(r.limitLb) })}
          </p>
          {r.overFiber ? (
            <p className="text-lg">
              {rig && r.waterNeededGal > rig.tankGal
                ? t("fm.fiber.moreThanTank", { gal: fmt(rig.tankGal), bags: Math.ceil((r.fiberLb - r.limitLb) / toNumber(bagLb)) })
                : t("fm.fiber.needsWater", { gal: fmt(r.waterNeededGal) })}
            </p>
          ) : null}
          <p>
            {t(r.overCarrier === null ? "fm.fiber.weighs" : r.overCarrier ? "fm.fiber.weighsOver" : "fm.fiber.weighsWithin", {
              lb: fmt(r.loadLb),
              kg: fmt(lbToKg(r.loadLb)),
              rating: fmt(rig?.carrierRatingLb ?? 0),
            })}
          </p>
          <SourceNote>
            Limit: {DEFAULT_FIBER_CEILING_LB_PER_100_GAL} lb of wood fiber per 100 gal of water (common practice; your company or the product may set another).
            Water {fmt(galToL(1), 3)} L per gal at 8.337 lb (CRC Handbook density at 60 °F).
          </SourceNote>
        </ResultBox>
      ) : null}
    </div>
  );
}
