import { FiberCheckMath } from "./fiber-check";
import { HoseMath } from "./hose";
import { LoadSheetMath } from "./load-sheet";
import { SuctionMath } from "./suction";
import { TorqueMath } from "./torque";
import type { RigSpecs } from "~/lib/rigs/specs";

const WIDGETS = {
  "hose-friction": { title: "Hose friction for this rig", Screen: HoseMath },
  "suction-head": { title: "Suction check for this rig", Screen: SuctionMath },
  "load-sheet": { title: "Load sheet for this rig", Screen: LoadSheetMath },
  "fiber-check": { title: "What went into this load", Screen: FiberCheckMath },
  torque: { title: "Torque figures for this rig", Screen: TorqueMath },
} as const;

/** A field-math calculator inside a guide step, filled from the case's rig. */
export function FieldMathWidget({ widget: name, rig }: { widget: string; rig: RigSpecs }) {
  const widget = WIDGETS[name as keyof typeof WIDGETS];
  if (!widget) return null;
  const { Screen, title } = widget;
  return (
    <section aria-label={title} className="rounded-lg border-2 border-ink bg-field p-3">
      <h2 className="mb-2 text-lg font-bold">{title}</h2>
      <Screen rig={rig} compact />
    </section>
  );
}
