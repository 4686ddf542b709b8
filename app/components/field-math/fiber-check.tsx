import { useState } from "react";
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
  return (
    <div className="space-y-3">
      <div className="grid grid-cols-2 gap-3">
        <NumberField id="fiber-bags" label="Bags of fiber loaded" value={bags} onChange={setBags} unit="bags" error={err(bags, checked.errors.bags)} />
        <NumberField id="fiber-bag-lb" label="Each bag weighs" value={bagLb} onChange={setBagLb} unit="lb" error={err(bagLb, checked.errors.lbPerBag)} />
      </div>
      <NumberField
        id="fiber-water"
        label="Water in the tank"
        value={water}
        onChange={setWater}
        unit="gal"
        beside={rig ? `${rig.code}'s tank holds ${fmt(rig.tankGal)} gal.` : undefined}
        error={err(water, checked.errors.waterGal)}
      />
      {!typed ? <p className="font-bold">Type the bags and the water that went in.</p> : null}
      {r ? (
        <ResultBox tone={r.overFiber || r.overCarrier ? "bad" : "good"}>
          <p className="text-xl font-bold">
            {r.overFiber
              ? `Over the limit: ${fmt(r.fiberLb)} lb of fiber in water that carries ${fmt(r.limitLb)} lb.`
              : `Within the limit: ${fmt(r.fiberLb)} lb of fiber; the water carries ${fmt(r.limitLb)} lb.`}
          </p>
          {r.overFiber ? (
            <p className="text-lg">
              {rig && r.waterNeededGal > rig.tankGal
                ? `More than the ${fmt(rig.tankGal)} gal tank holds: about ${Math.ceil((r.fiberLb - r.limitLb) / toNumber(bagLb))} bags too many for this water.`
                : `It needs about ${fmt(r.waterNeededGal)} gal of water to carry that fiber.`}
            </p>
          ) : null}
          <p>
            Load weighs about {fmt(r.loadLb)} lb ({fmt(lbToKg(r.loadLb))} kg)
            {r.overCarrier === null
              ? "."
              : r.overCarrier
                ? `: more than the ${fmt(rig!.carrierRatingLb!)} lb payload the carrier is rated for.`
                : `, within the ${fmt(rig!.carrierRatingLb!)} lb payload rating.`}
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
