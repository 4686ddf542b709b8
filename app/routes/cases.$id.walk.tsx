import { lazy, Suspense, useEffect, useMemo, useState } from "react";
import { GuideTextProvider, treeRenderer } from "~/components/ui/guide-text";
import { data } from "react-router";
import { askWorker } from "~/components/offline/worker";
import { WalkScreen } from "~/components/walk/walk-screen";
import { stepsToEnd } from "~/lib/guides/graph";
import { keepWalk, namesFor, walkOnPhone, type WalkData } from "~/lib/walk/kept";
import { isNoSignal } from "~/lib/walk/no-signal";
import { ON_PHONE_CASE } from "~/lib/walk/pages";
import { outcomeLabel, type Answer } from "~/lib/vocabulary";
import { caseDetail } from "~/services/case-detail.server";
import { guideTexts } from "~/services/guide-text.server";
import { requireUser } from "~/services/guards.server";
import { causeNames } from "~/services/guides.server";
import { localizeGuide } from "~/lib/guides/translations";
import { todaysFacts } from "~/services/cards.server";
import type { Route } from "./+types/cases.$id.walk";

// One step in twenty has a calculator: its code loads only on such a step (kept on the phone all the same).
const FieldMathWidget = lazy(() => import("~/components/field-math/widget").then((m) => ({ default: m.FieldMathWidget })));

export async function loader({ request, params, context }: Route.LoaderArgs): Promise<WalkData | null> {
  const user = await requireUser({ request, context });
  // The page the phone keeps for walks started with no signal: it fills itself from the phone.
  if (params.id === ON_PHONE_CASE) return null;
  const detail = await caseDetail(user, params.id);
  // The guide in the reader's language; steps with no up-to-date translation stay in English, marked.
  const lang = user.language ?? "en";
  const { guide: definition, inEnglish } = localizeGuide(detail.guide.definition, lang);
  return {
    caseId: detail.id,
    closedAs: detail.outcome === "open" ? null : detail.outcome,
    openedAt: detail.openedAt,
    guide: {
      slug: detail.guide.slug,
      title: lang === "en" ? detail.guide.title : definition.title,
      versionId: detail.guide.versionId,
      definition,
      texts: guideTexts(detail.guide.versionId, definition, lang),
      inEnglish,
    },
    rig: detail.rig,
    stepsToEnd: stepsToEnd(detail.guide.definition),
    causeNames: namesFor(definition, causeNames(lang)),
    events: detail.events.map((e) => ({ id: e.id, seq: e.seq, stepId: e.stepId, answer: e.answer as Answer, at: e.at, ...(e.note ? { note: e.note } : {}) })),
    kind: detail.kind,
    fromCard: detail.fromCard,
    fixesOpened: detail.fixesOpened.map((f) => ({ caseId: f.caseId, title: f.title, outcome: outcomeLabel(f.outcome).toLowerCase() })),
    dayFacts: detail.outcome === "open" ? await todaysFacts(user, detail.rigId, detail.guide.definition) : {},
  };
}

/**
 * The server's walk when it has it; otherwise (no signal, or a fix started on this phone that
 * the server has not heard of yet) the walk as this phone keeps it.
 */
export async function clientLoader({ params, serverLoader }: Route.ClientLoaderArgs): Promise<WalkData | null> {
  let fromServer: WalkData | null = null;
  try {
    fromServer = await serverLoader();
  } catch (error) {
    const kept = walkOnPhone(window.localStorage, params.id);
    if (kept && (isNoSignal(error) || isMissing(error))) return kept;
    throw error;
  }
  if (fromServer && fromServer.caseId === params.id) {
    keepWalk(window.localStorage, fromServer);
    return fromServer;
  }
  const kept = walkOnPhone(window.localStorage, params.id);
  if (!kept) throw data({ error: "This walk-through is not kept on this phone, and there is no signal to fetch it." }, { status: 404 });
  return kept;
}
// Runs as the page opens too: a kept page may carry another walk's data, or none.
clientLoader.hydrate = true as const;

const isMissing = (error: unknown) => typeof error === "object" && error !== null && "status" in error && (error as { status: number }).status === 404;

export default function Walk({ loaderData }: Route.ComponentProps) {
  const d = loaderData;
  const offlineReady = useKeepForNoSignal(d?.caseId ?? null);
  const texts = useMemo(() => treeRenderer(d?.guide.texts ?? {}), [d?.guide.texts]);
  if (!d) return <OpeningFromPhone />;
  return (
    <GuideTextProvider value={texts}>
      <WalkScreen
        key={d.caseId}
        caseId={d.caseId}
        guide={d.guide.definition}
        guideTitle={d.guide.title}
        inEnglish={d.guide.inEnglish}
        rig={d.rig}
        stepsToEnd={d.stepsToEnd}
        causeNames={d.causeNames}
        serverEvents={d.events}
        closedAs={d.closedAs}
        offlineReady={offlineReady}
        fromPhone={d.fromPhone}
        kind={d.kind ?? "fix"}
        fromCard={d.fromCard ?? null}
        serverDayFacts={d.dayFacts ?? {}}
        serverFixesOpened={d.fixesOpened}
        renderFieldMath={(widget) => (
          <Suspense fallback={<p className="text-lg">Opening the calculator…</p>}>
            <FieldMathWidget widget={widget} rig={d.rig} />
          </Suspense>
        )}
      />
    </GuideTextProvider>
  );
}

function OpeningFromPhone() {
  return (
    <p role="status" className="rounded-md border-2 border-ink bg-paper p-4 text-lg font-bold">
      Opening the walk-through kept on this phone…
    </p>
  );
}

/** Keeps this walk's page on the phone so a reload with no signal opens it; true once kept. */
function useKeepForNoSignal(caseId: string | null): boolean {
  const [kept, setKept] = useState(false);
  useEffect(() => {
    if (!caseId || !navigator.onLine) return;
    void askWorker({ type: "keep", urls: [`/cases/${caseId}/walk`] }).then((reply) => setKept((reply?.kept ?? 0) > 0));
  }, [caseId]);
  return kept;
}

export const meta: Route.MetaFunction = ({ data }) => [{ title: `${data?.rig.code ?? ""} ${data?.guide.title ?? "Walk-through"} · Tankside` }];
