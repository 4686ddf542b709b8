import { useTranslation } from "react-i18next";
import { useSay } from "~/components/ui/say";
import { pageI18n } from "~/i18n";
import { localizeGuide } from "~/lib/guides/translations";
import { useEffect, useState } from "react";
import { data, Form, Link, redirect, useNavigation } from "react-router";
import { serverOrPhoneAction, serverOrPhoneRig } from "~/components/offline/server-or-phone";
import { OpenWalks } from "~/components/walk/open-walks";
import { useTimes } from "~/components/use-time-zone";
import { cardStartFormSchema } from "~/lib/cases/schema";
import { parseForm } from "~/lib/forms/parse";
import { guideKind, inDayOrder } from "~/lib/guides/kinds";
import { readingProblem } from "~/lib/rigs/service";
import { cardsOnPhone, lastHoursOnPhone, loadKit, startOnPhone, withWalksOnPhone } from "~/lib/walk/kept";
import { startOfTodayIn } from "~/lib/format";

import { cardsOnRig, startOfToday, type CardDone } from "~/services/cards.server";
import { openWalksOn, startCase } from "~/services/cases.server";
import { requireUser } from "~/services/guards.server";
import { rigCards } from "~/services/guides.server";
import { readForm } from "~/services/read-request.server";
import { findRig } from "~/services/rigs.server";
import type { Route } from "./+types/rigs.$code.cards";

export async function loader({ request, params, context }: Route.LoaderArgs) {
  const user = await requireUser({ request, context });
  const rig = await findRig(user, params.code);
  const [cards, today, openWalks] = await Promise.all([rigCards(user), cardsOnRig(user, rig.id, { since: startOfToday(user) }), openWalksOn(user, rig.id)]);
  const lang = user.language ?? "en";
  return {
    rig: { code: rig.code, name: rig.name, retired: rig.retired, hasHourMeter: rig.hasHourMeter, engineHours: rig.engineHours },
    // The title matches today's cards (stored as the guide names them); the label is in the reader's language.
    cards: inDayOrder(
      cards.map((c) => {
        const shown = localizeGuide(c.definition, lang).guide;
        return { slug: c.slug, title: c.title, label: lang === "en" ? c.title : shown.title, summary: shown.summary };
      }),
    ),
    today,
    openWalks: openWalks.map((w) => ({ ...w, onPhoneOnly: false })),
    fromPhone: false,
    // Made with the page, so a double tap on a slow signal starts one card.
    caseId: crypto.randomUUID(),
  };
}

/** With no signal the cards come from what the phone keeps; what was done today waits for signal. */
export async function clientLoader({ params, serverLoader }: Route.ClientLoaderArgs) {
  const code = params.code.toUpperCase();
  const page = await serverOrPhoneRig(serverLoader, code, (rig, kit) => ({
    rig: { code: rig.code, name: rig.name, retired: false, hasHourMeter: rig.hasHourMeter, engineHours: rig.engineHours },
    cards: inDayOrder(
      kit.guides.filter((g) => guideKind(g.definition) === "card").map((g) => ({ slug: g.slug, title: g.title, label: g.title, summary: g.summary })),
    ),
    today: [] as CardDone[],
    openWalks: [],
    fromPhone: true,
    caseId: crypto.randomUUID(),
  }));
  // The newest reading this phone knows (a card or fix finished here with no signal counts).
  const engineHours = Math.max(page.rig.engineHours, lastHoursOnPhone(window.localStorage, code) ?? 0);
  // Cards walked on this phone today count at once, sent or not (the server's list may not have them yet).
  const kit = loadKit(window.localStorage);
  const since = startOfTodayIn(kit?.person.timeZone ?? "UTC").toISOString();
  const known = new Set(page.today.map((c) => c.id));
  const mine = cardsOnPhone(window.localStorage, code, since, kit?.person.name ?? null).filter((c) => !known.has(c.id));
  const today = [...mine, ...page.today].sort((a, b) => b.openedAt.localeCompare(a.openedAt));
  return { ...page, today, rig: { ...page.rig, engineHours }, openWalks: withWalksOnPhone(window.localStorage, code, page.openWalks) };
}

export async function action({ request, params, context }: Route.ActionArgs) {
  const user = await requireUser({ request, context });
  const rig = await findRig(user, params.code);
  const submission = parseForm(await readForm(request), cardStartFormSchema);
  if (submission.status !== "success") return data({ result: submission.reply(), problem: null }, { status: 400 });
  const problem = readingProblem(submission.value.engineHours, rig);
  if (problem) return data({ result: submission.reply({ fieldErrors: { engineHours: [problem] } }), problem: null }, { status: 400 });
  const { id } = await startCase(user, {
    id: submission.value.caseId,
    rigCode: rig.code,
    guideSlug: submission.value.cardSlug,
    engineHours: submission.value.engineHours ?? undefined,
  });
  return redirect(`/cases/${id}/walk`);
}

/** With no signal the phone starts the card itself, with the reading, and sends it later. */
export function clientAction({ request, params, serverAction }: Route.ClientActionArgs) {
  const noKit = { result: null, problem: pageI18n().t("cards.noKit") };
  return serverOrPhoneAction(
    request,
    serverAction,
    (kit, form) => {
      const submission = parseForm(form, cardStartFormSchema);
      if (submission.status !== "success") return { result: submission.reply(), problem: null };
      const code = params.code.toUpperCase();
      const kept = kit.rigs.find((r) => r.code === code);
      // The kit's reading, raised by any entered on this phone since.
      const last = lastHoursOnPhone(window.localStorage, code) ?? 0;
      const problem = kept ? readingProblem(submission.value.engineHours, { hasHourMeter: kept.hasHourMeter, engineHours: last }) : null;
      if (problem) return { result: submission.reply({ fieldErrors: { engineHours: [problem] } }), problem: null };
      const started = startOnPhone(window.localStorage, kit, {
        caseId: submission.value.caseId ?? crypto.randomUUID(),
        rigCode: code,
        guideSlug: submission.value.cardSlug,
        now: new Date(),
        engineHours: submission.value.engineHours ?? undefined,
      });
      if (!started.ok) return { result: null, problem: started.problem };
      return redirect(`/cases/${started.caseId}/walk`);
    },
    noKit,
  );
}

export default function RigCards({ loaderData, actionData }: Route.ComponentProps) {
  const { rig, cards, today, openWalks, fromPhone } = loaderData;
  // Each card's state today, said on its button (a complete one first: a later stopped one does not hide it),
  // and one under way is carried on rather than started twice.
  const lastToday = new Map<string, CardDone>();
  for (const c of [...today].reverse())
    if (c.outcome !== "open" && (c.outcome === "fixed" || lastToday.get(c.title)?.outcome !== "fixed")) lastToday.set(c.title, c);
  const underWay = new Map(openWalks.map((w) => [w.guideTitle, w]));
  const times = useTimes();
  const [caseId, setCaseId] = useState(loaderData.caseId);
  useEffect(() => setCaseId(crypto.randomUUID()), [loaderData]);
  const navigation = useNavigation();
  const opening = navigation.state !== "idle" ? (navigation.formData?.get("cardSlug")?.toString() ?? "") : null;
  const hoursError = actionData?.result?.error?.engineHours?.[0];
  const { t } = useTranslation();
  const say = useSay();
  const label = new Map(cards.map((c) => [c.title, c.label]));
  const state = (outcome: CardDone["outcome"], gaps: number | null) =>
    outcome === "fixed" && gaps ? t("cards.gaps", { count: gaps }) : t(`cardOutcomes.${outcome}`);
  const problem = actionData?.problem ?? actionData?.result?.error?.cardSlug?.[0] ?? null;

  return (
    <>
      <h1 className="text-3xl font-bold">{t("cards.title", { code: rig.code })}</h1>
      <p className="mt-1 text-lg">{t("cards.lead", { name: rig.name })}</p>
      {problem ? (
        <p role="alert" className="mt-3 rounded-md border-2 border-stop bg-paper px-3 py-2 text-lg font-bold text-stop">
          {say(problem)}
        </p>
      ) : null}
      <OpenWalks walks={openWalks} />
      {rig.retired ? (
        <p className="mt-3 font-bold text-stop">{t("cards.retired")}</p>
      ) : (
        <Form method="post" className="mt-4 space-y-4">
          <input type="hidden" name="caseId" value={caseId} />
          {rig.hasHourMeter ? (
            <label className="block text-lg font-bold">
              {t("cards.hours")}
              <span className="block text-base font-normal">{t("cards.hoursLead", { h: times.number(rig.engineHours, 1) })}</span>
              <input
                name="engineHours"
                inputMode="decimal"
                autoComplete="off"
                required
                aria-invalid={hoursError ? true : undefined}
                aria-describedby={hoursError ? "hours-error" : undefined}
                className="mt-1 block min-h-14 w-full rounded-md border-2 border-ink bg-paper px-3 text-xl"
              />
              {hoursError ? (
                <span id="hours-error" role="alert" className="mt-1 block font-bold text-stop">
                  {say(hoursError)}
                </span>
              ) : null}
            </label>
          ) : (
            <p className="text-lg">{t("cards.noMeter")}</p>
          )}
          <ul className="grid gap-2 sm:grid-cols-2">
            {cards.map((c) => {
              const mine = opening === c.slug;
              const done = lastToday.get(c.title);
              const open = underWay.get(c.title);
              const note = done ? (
                <span className="text-base font-bold">
                  {t(done.by ? "cards.todayNoteBy" : "cards.todayNote", {
                    state: state(done.outcome, done.gaps).toLowerCase(),
                    time: times.time(done.openedAt),
                    by: done.by,
                  })}
                </span>
              ) : null;
              return (
                <li key={c.slug}>
                  {open ? (
                    <Link
                      to={`/cases/${open.id}/walk`}
                      className="flex min-h-16 w-full flex-col items-start justify-center rounded-lg border-4 border-go bg-paper px-4 py-2 text-left text-ink no-underline"
                    >
                      <span className="text-xl font-bold">{t("cards.carryOn", { title: c.label })}</span>
                      <span className="text-base">{t("cards.underWay", { time: times.time(open.openedAt) })}</span>
                      {note}
                    </Link>
                  ) : (
                    <button
                      type="submit"
                      name="cardSlug"
                      value={c.slug}
                      disabled={opening !== null}
                      aria-busy={mine}
                      className={`flex min-h-16 w-full flex-col items-start justify-center rounded-lg border-2 px-4 py-2 text-left ${
                        mine ? "border-4 border-go bg-caution text-ink" : "border-ink bg-paper"
                      }`}
                    >
                      <span className="text-xl font-bold">{mine ? t("cards.opening", { title: c.label }) : c.label}</span>
                      {note}
                      <span className="text-base">{c.summary}</span>
                    </button>
                  )}
                </li>
              );
            })}
          </ul>
        </Form>
      )}
      <section aria-labelledby="today-h" className="mt-6 rounded-lg border-2 border-ink bg-paper p-4">
        <h2 id="today-h" className="text-xl font-bold">
          {t("cards.onRigToday", { code: rig.code })}
        </h2>
        {fromPhone ? <p className="mt-2 text-lg">{t("cards.noSignal")}</p> : null}
        {today.length ? (
          <ul className="mt-2 space-y-1 text-lg">
            {today.map((c) => (
              <li key={c.id}>
                <strong>{label.get(c.title) ?? c.title}</strong>: {state(c.outcome, c.gaps)} · {times.time(c.openedAt)}
                {c.by ? ` · ${c.by}` : ""}
                {c.engineHours !== null ? ` · ${times.number(c.engineHours, 1)} h` : ""}
              </li>
            ))}
          </ul>
        ) : fromPhone ? null : (
          <p className="mt-2 text-lg">{t("cards.none", { code: rig.code })}</p>
        )}
      </section>
    </>
  );
}

export const meta: Route.MetaFunction = ({ data }) => [{ title: `Cards ${data?.rig.code ?? ""} · Tankside` }];
