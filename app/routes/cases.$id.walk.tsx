import { useEffect, useState } from "react";
import { FieldMathWidget } from "~/components/field-math/widget";
import { WalkScreen } from "~/components/walk/walk-screen";
import { stepsToEnd } from "~/lib/guides/graph";
import { caseDetail } from "~/services/case-detail.server";
import { requireUser } from "~/services/guards.server";
import { causeList } from "~/services/guides.server";
import type { Answer } from "~/lib/vocabulary";
import type { Route } from "./+types/cases.$id.walk";

export async function loader({ request, params, context }: Route.LoaderArgs) {
  const user = await requireUser({ request, context });
  const detail = await caseDetail(user, params.id);
  const codes = new Set(Object.values(detail.guide.definition.states).flatMap((s) => (s.meta.cause ? [s.meta.cause] : [])));
  return {
    caseId: detail.id,
    closedAs: detail.outcome === "open" ? null : detail.outcome,
    guide: detail.guide,
    rig: detail.rig,
    stepsToEnd: stepsToEnd(detail.guide.definition),
    causeNames: Object.fromEntries(
      causeList()
        .filter((c) => codes.has(c.code))
        .map((c) => [c.code, c.name]),
    ),
    events: detail.events.map((e) => ({ id: e.id, seq: e.seq, stepId: e.stepId, answer: e.answer as Answer, at: e.at, ...(e.note ? { note: e.note } : {}) })),
  };
}

export default function Walk({ loaderData }: Route.ComponentProps) {
  const d = loaderData;
  const offlineReady = useKeepForNoSignal();
  return (
    <WalkScreen
      caseId={d.caseId}
      guide={d.guide.definition}
      guideTitle={d.guide.title}
      rig={d.rig}
      stepsToEnd={d.stepsToEnd}
      causeNames={d.causeNames}
      serverEvents={d.events}
      closedAs={d.closedAs}
      offlineReady={offlineReady}
      renderFieldMath={(widget) => <FieldMathWidget widget={widget} rig={d.rig} />}
    />
  );
}

/** Keeps this page and its scripts on the phone so a reload with no signal still opens it; true once kept. */
function useKeepForNoSignal(): boolean {
  const [kept, setKept] = useState(false);
  useEffect(() => {
    if (!("serviceWorker" in navigator)) return;
    void navigator.serviceWorker
      .register("/sw.js")
      .then(async () => {
        const worker = (await navigator.serviceWorker.ready).active;
        const assets = performance
          .getEntriesByType("resource")
          .map((e) => e.name)
          .filter((u) => u.startsWith(location.origin) && new URL(u).pathname.startsWith("/assets/"));
        const channel = new MessageChannel();
        channel.port1.onmessage = (e) => setKept(e.data?.kept === true);
        worker?.postMessage({ type: "keep", urls: [location.href, ...assets] }, [channel.port2]);
      })
      .catch(() => setKept(false));
  }, []);
  return kept;
}

export const meta: Route.MetaFunction = ({ data }) => [{ title: `${data?.rig.code ?? ""} ${data?.guide.title ?? "Walk-through"} · Tankside` }];
