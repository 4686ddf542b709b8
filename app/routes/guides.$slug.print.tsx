import QRCode from "qrcode";
import { useLayoutEffect, useRef, useState } from "react";
import { Form } from "react-router";
import { z } from "zod";
import { i18nFor } from "~/i18n";
import { formatDate } from "~/lib/format";
import { guideKind } from "~/lib/guides/kinds";
import { printFlow } from "~/lib/guides/print-flow";
import { localizeGuide } from "~/lib/guides/translations";
import { LANGUAGE_NAMES, LANGUAGES, LOCALES } from "~/lib/i18n/languages";
import type { StepAnswer } from "~/lib/vocabulary";
import { env } from "~/services/env.server";
import { fail, requireUser } from "~/services/guards.server";
import { causeNames, printableGuide } from "~/services/guides.server";
import { findRig, listRigs } from "~/services/rigs.server";
import type { Route } from "./+types/guides.$slug.print";

// A choice left blank ("No rig", the language the person reads) arrives as "" and means "not chosen".
const blank = (v: unknown) => (v === "" ? undefined : v);
const printQuery = z.object({
  lang: z.preprocess(blank, z.enum(LANGUAGES, { error: "lang must be en or es" }).optional()),
  rig: z.preprocess(blank, z.string().max(20, "rig must be a rig code").optional()),
  v: z.preprocess(blank, z.coerce.number({ error: "v must be a version number" }).int().positive("v must be a version number").optional()),
  g: z.preprocess(blank, z.coerce.number({ error: "g must be a guide number" }).int().positive("g must be a guide number").optional()),
});

/**
 * A guide (or rig card) as one printed Letter page for the clipboard in the truck: numbered boxes in
 * reading order with where each answer goes, every shut-down stop as a black band with its checklist
 * to tick, each end with its cause, the version and its date, and a QR code back to the live guide.
 * Everyone signed in at the company may print; a trainer may print any version (the desk's print).
 */
export async function loader({ request, params, context }: Route.LoaderArgs) {
  const user = await requireUser({ request, context });
  const query = printQuery.safeParse(Object.fromEntries(new URL(request.url).searchParams));
  if (!query.success) fail(400, query.error.issues.map((i) => i.message).join("; "));
  const lang = query.data.lang ?? user.language ?? "en";
  const [guide, rig, rigs] = await Promise.all([
    printableGuide(user, params.slug, query.data.v, query.data.g),
    query.data.rig ? findRig(user, query.data.rig) : null,
    listRigs(user),
  ]);
  const { t } = i18nFor(lang);
  const { guide: text, inEnglish } = localizeGuide(guide.definition, lang);
  const card = guideKind(guide.definition) === "card";
  const url = rig
    ? `${env().APP_URL}/rigs/${encodeURIComponent(rig.code)}/fix?guide=${encodeURIComponent(guide.slug)}`
    : `${env().APP_URL}/guides/${encodeURIComponent(guide.slug)}/print?lang=${lang}`;
  const qr = await QRCode.toString(url, { type: "svg", errorCorrectionLevel: "M", margin: 0, color: { dark: "#000000", light: "#ffffff" } });
  const day = (iso: string | Date) => formatDate(iso, user.timeZone, LOCALES[lang]);
  const answerWord = (a: StepAnswer) => t(`answers.${a}`);
  return {
    lang,
    slug: guide.slug,
    title: text.title,
    card,
    line: [
      t("print.version", { n: guide.number }),
      guide.status === "published"
        ? t("print.published", { date: day(guide.dated) })
        : t("print.unpublished", { status: t(`statuses.${guide.status}`), date: day(guide.dated) }),
      t("print.printed", { date: day(new Date()) }),
      rig ? t("print.rig", { code: rig.code }) : t("print.anyRig"),
      LANGUAGE_NAMES[lang],
    ].join(" · "),
    // Not what crews use: said across the top of the page, so it never reaches a truck unnoticed.
    draft: guide.status === "published" ? null : t("print.draft", { status: t(`statuses.${guide.status}`) }),
    boxes: printFlow(text, causeNames(lang), rig ?? undefined, lang).map((b) => ({
      ...b,
      inEnglish: inEnglish.includes(b.id),
      answers: b.answers.map((a) => ({ ...a, word: answerWord(a.answer) })),
      timing: [b.minutes ? t("print.minutes", { m: b.minutes < 1 ? "½" : b.minutes }) : "", b.handsOn ? t("print.handsOn") : ""].filter(Boolean).join(", "),
      checklist: b.checklist.map((item) => t(`checklistShort.${item}`)),
    })),
    words: {
      howTo: t("print.howTo"),
      cautionTitle: t("print.cautionTitle"),
      caution: t("print.caution"),
      stop: t("print.stop"),
      check: t("print.check"),
      task: t("print.task"),
      fixed: card ? t("print.cardFixed") : t("print.fixed"),
      handoff: card ? t("print.cardHandoff") : t("print.handoff"),
      cause: t("print.cause"),
      suspected: t("print.suspected"),
      qr: rig ? t("print.qrRig", { code: rig.code }) : t("print.qr"),
      controls: t("print.controls"),
      language: t("print.language"),
      rigLabel: t("print.rigLabel"),
      noRig: t("print.noRig"),
      show: t("print.show"),
      print: t("print.print"),
      tooLong: t("print.tooLong"),
      inEnglish: t("print.inEnglish"),
    },
    qr,
    url,
    chosen: { rig: rig?.code ?? "", v: query.data.v ?? null, g: query.data.g ?? null },
    rigs: rigs.map((r) => r.code),
  };
}

type Data = Awaited<ReturnType<typeof loader>>;

// Type sizes tried, largest first, until the flow fits the page (px at 96 per inch, as printed).
const LARGEST = 15;
const SMALLEST = 6;

export default function PrintGuide({ loaderData: d }: Route.ComponentProps) {
  const sheet = useRef<HTMLDivElement>(null);
  const flow = useRef<HTMLDivElement>(null);
  const [fit, setFit] = useState<"fitting" | "yes" | "no">("fitting");
  // Shrinks the type until every box is inside the page: the flow fills columns top to bottom and
  // spills sideways past the third when too long, which is what is measured.
  useLayoutEffect(() => {
    const page = sheet.current;
    const boxes = flow.current;
    if (!page || !boxes) return;
    const over = () => boxes.scrollWidth > boxes.clientWidth + 1 || page.scrollHeight > page.clientHeight + 1;
    let size = LARGEST;
    page.style.fontSize = `${size}px`;
    while (over() && size > SMALLEST) {
      size -= 0.25;
      page.style.fontSize = `${size}px`;
    }
    setFit(over() ? "no" : "yes");
  }, [d]);

  return (
    <main lang={d.lang} className="bg-white text-black">
      <Form method="get" className="no-print mx-auto max-w-3xl space-y-2 p-3" aria-label={d.words.controls}>
        <h1 className="text-2xl font-bold">{d.title}</h1>
        <div className="grid gap-2 sm:grid-cols-3">
          <label className="block font-bold">
            {d.words.language}
            <select name="lang" defaultValue={d.lang} className="mt-1 block min-h-12 w-full rounded-md border-2 border-ink bg-paper px-2">
              {LANGUAGES.map((l) => (
                <option key={l} value={l}>
                  {LANGUAGE_NAMES[l]}
                </option>
              ))}
            </select>
          </label>
          <label className="block font-bold">
            {d.words.rigLabel}
            <select name="rig" defaultValue={d.chosen.rig} className="mt-1 block min-h-12 w-full rounded-md border-2 border-ink bg-paper px-2">
              <option value="">{d.words.noRig}</option>
              {d.rigs.map((code) => (
                <option key={code} value={code}>
                  {code}
                </option>
              ))}
            </select>
          </label>
          {d.chosen.v ? <input type="hidden" name="v" value={d.chosen.v} /> : null}
          {d.chosen.g ? <input type="hidden" name="g" value={d.chosen.g} /> : null}
          <div className="flex items-end gap-2">
            <button type="submit" className="min-h-12 flex-1 rounded-md border-2 border-ink bg-paper px-3 font-bold">
              {d.words.show}
            </button>
            <button type="button" onClick={() => window.print()} className="min-h-12 flex-1 rounded-md bg-go px-3 font-bold text-white">
              {d.words.print}
            </button>
          </div>
        </div>
        {fit === "no" ? (
          <p role="alert" className="font-bold text-stop">
            {d.words.tooLong}
          </p>
        ) : null}
      </Form>
      {/* The page itself: Letter less the 0.4 in margins, on screen as on paper. */}
      <div className="overflow-x-auto print:overflow-visible">
        <div
          ref={sheet}
          data-testid="printed-guide"
          data-fits={fit}
          className="mx-auto flex h-[10.2in] w-[7.7in] flex-col overflow-hidden bg-white leading-tight text-black [print-color-adjust:exact]"
        >
          <header className="flex items-start gap-[0.8em]">
            <div className="min-w-0 flex-1">
              <p className="text-[1.9em] leading-none font-bold">{d.title}</p>
              <p className="mt-[0.3em]">{d.line}</p>
              <p className="mt-[0.3em] font-bold">{d.words.howTo}</p>
            </div>
            <figure className="w-[0.95in] shrink-0 text-center text-[0.75em]">
              {/* The SVG comes from the QR library, built from our own URL; no user text is in it. */}
              <div className="[&_svg]:block [&_svg]:h-auto [&_svg]:w-full" role="img" aria-label={d.url} dangerouslySetInnerHTML={{ __html: d.qr }} />
              <figcaption className="mt-[0.2em] leading-tight">{d.words.qr}</figcaption>
            </figure>
          </header>
          {d.draft ? (
            <p role="alert" className="mt-[0.4em] border-[0.3em] border-black px-[0.4em] text-center text-[1.6em] font-bold">
              {d.draft}
            </p>
          ) : null}
          <p role="note" className="mt-[0.5em] border-[0.25em] border-black bg-caution px-[0.5em] py-[0.3em]">
            <strong>{d.words.cautionTitle}</strong> {d.words.caution}
          </p>
          <div ref={flow} className="mt-[0.5em] min-h-0 flex-1 [column-count:3] [column-fill:auto] [column-gap:0.7em]" data-testid="print-flow">
            {d.boxes.map((b) => (
              <FlowBox key={b.id} box={b} words={d.words} />
            ))}
          </div>
        </div>
      </div>
    </main>
  );
}

function FlowBox({ box, words }: { box: Data["boxes"][number]; words: Data["words"] }) {
  const n = <span className="mr-[0.3em] inline-block min-w-[1.6em] bg-black px-[0.2em] text-center font-bold text-white">{box.n}</span>;
  const arrows = box.answers.length ? (
    <p className="mt-[0.15em] font-bold">
      {box.answers.map((a, i) => (
        <span key={a.answer}>
          {i ? " · " : ""}
          {a.word}&nbsp;→&nbsp;{a.to}
        </span>
      ))}
    </p>
  ) : null;
  if (box.kind === "safety")
    return (
      <section data-kind="safety" className="mb-[0.4em] break-inside-avoid border-[0.25em] border-black">
        <p className="bg-black px-[0.3em] py-[0.1em] font-bold text-white">
          {box.n} ■ {words.stop}
        </p>
        <div className="bg-caution px-[0.3em] py-[0.2em]">
          <p lang={box.inEnglish ? "en" : undefined}>
            {box.inEnglish ? <InEnglish words={words} /> : null}
            {box.text}
          </p>
          <ul className="mt-[0.15em]">
            {box.checklist.map((line) => (
              <li key={line} className="font-bold">
                ☐ {line}
              </li>
            ))}
          </ul>
          {arrows}
        </div>
      </section>
    );
  if (box.kind === "fixed" || box.kind === "handoff")
    return (
      <section data-kind={box.kind} className="mb-[0.4em] break-inside-avoid border-[0.2em] border-double border-black px-[0.3em] py-[0.2em]">
        <p className="font-bold">
          {n}
          {box.kind === "fixed" ? words.fixed : words.handoff}
        </p>
        <p lang={box.inEnglish ? "en" : undefined}>
          {box.inEnglish ? <InEnglish words={words} /> : null}
          {box.text}
        </p>
        {box.cause ? (
          <p className="font-bold">
            {box.kind === "fixed" ? words.cause : words.suspected} {box.cause}
          </p>
        ) : null}
      </section>
    );
  return (
    <section data-kind={box.kind} className="mb-[0.4em] break-inside-avoid border-[0.1em] border-black px-[0.3em] py-[0.2em]">
      <p>
        {n}
        <span className="font-bold">{box.kind === "check" ? words.check : words.task}</span>
        {box.timing ? <span> ({box.timing})</span> : null}: {box.inEnglish ? <InEnglish words={words} /> : null}
        <span lang={box.inEnglish ? "en" : undefined}>{box.text}</span>
      </p>
      {arrows}
    </section>
  );
}

/** A step printed in English because its translation is missing or older than its English. */
function InEnglish({ words }: { words: Data["words"] }) {
  return <span className="mr-[0.3em] border-[0.1em] border-black px-[0.2em] text-[0.85em] font-bold">{words.inEnglish}</span>;
}

export const meta: Route.MetaFunction = ({ data }) => [{ title: `${data?.title ?? "Guide"} · Tankside` }];
