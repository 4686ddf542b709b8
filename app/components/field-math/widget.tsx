import { useEffect, useState } from "react";
import { useTranslation } from "react-i18next";
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
  "hose-friction": { Screen: HoseMath },
  "suction-head": { Screen: SuctionMath },
  "load-sheet": { Screen: LoadCardWidget },
  "fiber-check": { Screen: FiberCheckMath },
  torque: { Screen: TorqueMath },
  "tip-choice": { Screen: TipMath },
} as const;

/** A field-math calculator inside a guide step, filled from the case's rig. */
export function FieldMathWidget({ widget: name, rig }: { widget: string; rig: RigSpecs }) {
  const { t } = useTranslation();
  const widget = WIDGETS[name as keyof typeof WIDGETS];
  if (!widget) return null;
  const { Screen } = widget;
  const title = t(`fm.widgets.${name as keyof typeof WIDGETS}`);
  return (
    <section aria-label={title} className="rounded-lg border-2 border-ink bg-field p-3">
      <h2 className="mb-2 text-lg font-bold">{title}</h2>
      <Screen rig={rig} compact />
    </section>
  );
}
