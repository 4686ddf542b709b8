import { useEffect, useState } from "react";
import { useTranslation } from "react-i18next";
import { Form, redirect, useNavigation, useRouteLoaderData, useSearchParams } from "react-router";
import { z } from "zod";
import { serverOrPhoneAction, serverOrPhoneRig } from "~/components/offline/server-or-phone";
import { OpenWalks } from "~/components/walk/open-walks";
import { useGuideSearch } from "~/components/walk/use-guide-search";
import { startOnPhone, withWalksOnPhone } from "~/lib/walk/kept";
import { guideKind } from "~/lib/guides/kinds";
import type { loader as shellLoader } from "./shell";
import { openWalksOn, startCase } from "~/services/cases.server";
import { fail, requireUser } from "~/services/guards.server";
import { i18nFor, pageI18n } from "~/i18n";
import { faultGuides } from "~/services/guides.server";
import { localizeGuide } from "~/lib/guides/translations";
import { findRig } from "~/services/rigs.server";
import { readForm } from "~/services/read-request.server";
import type { Route } from "./+types/rigs.$code.fix";

export async function loader({ request, params, context }: Route.LoaderArgs) {
  const user = await requireUser({ request, context });
  const rig = await findRig(user, params.code);
  const [guides, openWalks] = await Promise.all([faultGuides(user), openWalksOn(user, rig.id)]);
  const lang = user.language ?? "en";
  return {
    rig: { code: rig.code, name: rig.name, retired: rig.retired },
    openWalks: openWalks.map((w) => ({ ...w, onPhoneOnly: false })),
    // Titles and the first symptom in the reader's language (English where a guide has none yet).
    tiles: guides
      .map((g) => {
        const { guide } = localizeGuide(g.definition, lang);
        return { slug: g.slug, title: lang === "en" ? g.title : guide.title, hint: guide.symptoms[0] };
      })
      .sort((a, b) => a.title.localeCompare(b.title, lang)),
    // Made with the page, so even a tap before the scripts load (or a double tap) starts one case.
    caseId: crypto.randomUUID(),
  };
}

/**
 * With no signal, the rig and the guides come from what the phone keeps. Either way the walks
 * started on this phone and not yet sent are offered to carry on.
 */
export async function clientLoader({ params, serverLoader }: Route.ClientLoaderArgs) {
  const code = params.code.toUpperCase();
  const page = await serverOrPhoneRig(serverLoader, code, (rig, kit) => ({
    rig: { code: rig.code, name: rig.name, retired: false },
    openWalks: [],
    tiles: kit.guides.filter((g) => guideKind(g.definition) === "guide").map((g) => ({ slug: g.slug, title: g.title, hint: g.symptoms[0] })),
    caseId: crypto.randomUUID(),
  }));
  return { ...page, openWalks: withWalksOnPhone(window.localStorage, code, page.openWalks) };
}

const optionalId = z
  .string()
  .uuid()
  .optional()
  .or(z.literal("").transform(() => undefined));
const startForm = z.object({
  guideSlug: z.string().min(1).max(80),
  caseId: optionalId,
  /** A card item that opens this guide: the fix links back to the card. */
  fromCaseId: optionalId,
});

export async function action({ request, params, context }: Route.ActionArgs) {
  const user = await requireUser({ request, context });
  const parsed = startForm.safeParse(Object.fromEntries(await readForm(request)));
  if (!parsed.success) fail(400, i18nFor(user.language ?? "en").t("fix.pickGuide"));
  const { id } = await startCase(user, { id: parsed.data.caseId, rigCode: params.code, guideSlug: parsed.data.guideSlug, fromCaseId: parsed.data.fromCaseId });
  return redirect(`/cases/${id}/walk`);
}

/** With no signal the phone starts the fix itself: it names the case and the time, and sends the start later. */
export function clientAction({ request, params, serverAction }: Route.ClientActionArgs) {
  const noKit = { problem: pageI18n().t("fix.noKit") };
  return serverOrPhoneAction(
    request,
    serverAction,
    (kit, form) => {
      const fromCaseId = String(form.get("fromCaseId") ?? "");
      const started = startOnPhone(window.localStorage, kit, {
        caseId: String(form.get("caseId") ?? "") || crypto.randomUUID(),
        rigCode: params.code,
        guideSlug: String(form.get("guideSlug") ?? ""),
        now: new Date(),
        fromCard: fromCaseId ? { caseId: fromCaseId, title: String(form.get("fromTitle") ?? "the card") } : undefined,
      });
      if (!started.ok) return { problem: started.problem };
      return redirect(`/cases/${started.caseId}/walk`);
    },
    noKit,
  );
}

interface Hit {
  slug: string;
  title: string;
  score: number;
}

export default function StartFix({ loaderData, actionData }: Route.ComponentProps) {
  const { rig, tiles, openWalks } = loaderData;
  const personId = useRouteLoaderData<typeof shellLoader>("routes/shell")?.user.id ?? 0;
  const [query, setQuery] = useState("");
  const search = useGuideSearch(query, personId);
  // A page kept on the phone carries the id made when it was kept: once running, every visit gets its own.
  const [caseId, setCaseId] = useState(loaderData.caseId);
  useEffect(() => setCaseId(crypto.randomUUID()), [loaderData]);
  const navigation = useNavigation();
  // The tapped guide shows at once that it was taken, before the server answers on a slow link.
  const opening = navigation.state !== "idle" ? (navigation.formData?.get("guideSlug")?.toString() ?? "") : null;
  const { t } = useTranslation();
  // Scanned from a printed guide: that guide is offered first.
  const [params] = useSearchParams();
  const fromPaper = tiles.find((tile) => tile.slug === params.get("guide"));

  return (
    <>
      <h1 className="text-3xl font-bold">{t("fix.title", { code: rig.code })}</h1>
      <p className="mt-1 text-lg">{rig.name}</p>
      {actionData && "problem" in actionData ? (
        <p role="alert" className="mt-3 rounded-md border-2 border-stop bg-paper px-3 py-2 text-lg font-bold text-stop">
          {actionData.problem}
        </p>
      ) : null}
      <OpenWalks walks={openWalks} />
      {fromPaper && !rig.retired ? (
        <section aria-labelledby="paper-h" className="mt-4 rounded-lg border-4 border-go bg-paper p-3">
          <h2 id="paper-h" className="text-lg font-bold">
            {t("fix.fromPaper")}
          </h2>
          <div className="mt-2">
            <StartGuideButton {...fromPaper} opening={opening} caseId={caseId} />
          </div>
        </section>
      ) : null}
      {rig.retired ? (
        <p className="mt-2 font-bold text-stop">{t("fix.retired")}</p>
      ) : (
        <FixChooser
          query={query}
          setQuery={setQuery}
          hits={search.hits}
          searching={search.searching}
          searched={search.searched}
          tiles={tiles}
          opening={opening}
          caseId={caseId}
        />
      )}
      <PaperGuides rigCode={rig.code} tiles={tiles} />
    </>
  );
}

/** Any guide on one printed page, in the reader's language, for the clipboard in the truck. */
function PaperGuides({ rigCode, tiles }: { rigCode: string; tiles: Tile[] }) {
  const { t } = useTranslation();
  return (
    <details className="mt-8 rounded-lg border-2 border-ink bg-paper p-3">
      <summary className="flex min-h-12 cursor-pointer items-center text-lg font-bold">{t("fix.paper")}</summary>
      <p className="mt-1">{t("fix.paperLead")}</p>
      <ul className="mt-2 space-y-1">
        {tiles.map((tile) => (
          <li key={tile.slug}>
            <a href={`/guides/${tile.slug}/print?rig=${encodeURIComponent(rigCode)}`} className="flex min-h-12 items-center font-bold">
              {t("fix.print", { title: tile.title })}
            </a>
          </li>
        ))}
      </ul>
    </details>
  );
}

interface Tile {
  slug: string;
  title: string;
  hint?: string;
}

/** A guide to start: the phone-made case id goes with it, so a double press on a slow signal makes one case. */
function StartGuideButton({ slug, title, hint, opening, caseId }: Tile & { opening: string | null; caseId: string }) {
  const mine = opening === slug;
  const { t } = useTranslation();
  return (
    <Form method="post">
      <input type="hidden" name="guideSlug" value={slug} />
      <input type="hidden" name="caseId" value={caseId} />
      <button
        type="submit"
        disabled={opening !== null}
        aria-busy={mine}
        className={`flex min-h-16 w-full flex-col items-start justify-center rounded-lg border-2 px-4 py-2 text-left ${
          mine ? "border-4 border-go bg-caution text-ink" : "border-ink bg-paper"
        }`}
      >
        <span className="text-xl font-bold">{mine ? t("fix.opening", { title }) : title}</span>
        {mine ? <span className="text-base">{t("fix.taken")}</span> : hint ? <span className="text-base">“{hint}”</span> : null}
      </button>
    </Form>
  );
}

/** Say it in your own words, or tap a symptom tile. */
function FixChooser({
  query,
  setQuery,
  hits,
  searching,
  searched,
  tiles,
  opening,
  caseId,
}: {
  query: string;
  setQuery: (q: string) => void;
  hits: Hit[];
  searching: boolean;
  searched: boolean;
  tiles: Tile[];
  opening: string | null;
  caseId: string;
}) {
  const { t } = useTranslation();
  return (
    <>
      <label htmlFor="symptom" className="mt-5 block text-lg font-bold">
        {t("fix.ownWords")}
      </label>
      <input
        id="symptom"
        type="search"
        value={query}
        onChange={(e) => setQuery(e.target.value)}
        placeholder={t("fix.placeholder")}
        autoComplete="off"
        className="mt-1 block min-h-14 w-full rounded-md border-2 border-ink bg-paper px-3 text-lg"
      />
      {hits.length ? (
        <section aria-label={t("fix.matching")} className="mt-3 space-y-2">
          {hits.slice(0, 3).map((h) => (
            <StartGuideButton key={h.slug} slug={h.slug} title={h.title} opening={opening} caseId={caseId} />
          ))}
        </section>
      ) : query.trim().length >= 2 && !searching && searched ? (
        <p className="mt-2">{t("fix.noMatch")}</p>
      ) : null}
      <h2 className="mt-6 text-xl font-bold">{t("fix.orTap")}</h2>
      <ul className="mt-2 grid gap-2 sm:grid-cols-2">
        {tiles.map((tile) => (
          <li key={tile.slug}>
            <StartGuideButton {...tile} opening={opening} caseId={caseId} />
          </li>
        ))}
      </ul>
    </>
  );
}

export const meta: Route.MetaFunction = ({ data }) => [{ title: `Fix ${data?.rig.code ?? ""} · Tankside` }];
