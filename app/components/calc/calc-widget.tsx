import { HoseCalc } from "./hose-calc";
import { LoadSheetCalc } from "./load-sheet-calc";
import { SuctionCalc } from "./suction-calc";
import { TorqueCalc } from "./torque-calc";
import type { RigSpecs } from "~/lib/rig-specs";

const WIDGETS = {
  "hose-friction": { title: "Hose friction for this rig", Calc: HoseCalc },
  "suction-head": { title: "Suction check for this rig", Calc: SuctionCalc },
  "load-sheet": { title: "Load sheet for this rig", Calc: LoadSheetCalc },
  torque: { title: "Torque figures for this rig", Calc: TorqueCalc },
} as const;

/** A field-math calculator inside a guide step, filled from the case's rig. */
export function CalcWidget({ calc, rig }: { calc: string; rig: RigSpecs }) {
  const widget = WIDGETS[calc as keyof typeof WIDGETS];
  if (!widget) return null;
  const { Calc, title } = widget;
  return (
    <section aria-label={title} className="rounded-lg border-2 border-ink bg-field p-3">
      <h2 className="mb-2 text-lg font-bold">{title}</h2>
      <Calc rig={rig} compact />
    </section>
  );
}
