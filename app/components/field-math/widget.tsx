import { useEffect, useState } from "react";
import { FiberCheckMath } from "./fiber-check";
import { HoseMath } from "./hose";
import { LoadCardMath } from "./load-card";
import { SuctionMath } from "./suction";
import { TipMath } from "./tip";
import { TorqueMath } from "./torque";
import type { LoadRules } from "~/lib/field-math/load-rules";
import type { RigSpecs } from "~/lib/rigs/specs";
import { loadKit } from "~/lib/walk/kept";

/** The load card inside a guide works to the company's rules as the phone keeps them (the defaults until it has them). */
function LoadCardWidget({ rig, compact }: { rig: RigSpecs; compact?: boolean }) {
  const [rules, setRules] = useState<LoadRules | undefined>();
  useEffect(() => setRules(loadKit(localStorage)?.loadRules), []);
  return <LoadCardMath key={rules ? "company" : "defaults"} rig={rig} rules={rules} compact={compact} />;
}

const WIDGETS = {
  "hose-friction": { title: "Hose friction for this rig", Screen: HoseMath },
  "suction-head": { title: "Suction check for this rig", Screen: SuctionMath },
  "load-sheet": { title: "Load card for this rig", Screen: LoadCardWidget },
  "fiber-check": { title: "What went into this load", Screen: FiberCheckMath },
  torque: { title: "Torque figures for this rig", Screen: TorqueMath },
  "tip-choice": { title: "Tips on this rig for the distance", Screen: TipMath },
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
