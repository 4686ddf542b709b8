import type { Language } from "../i18n/languages";
import type { LoadRules } from "../field-math/load-rules";
import { keptJobAt, type KeptJobs } from "../jobs/today";
import type { Guide } from "../guides/schema";
import type { GuideTexts } from "../guides/text-tree";
import { stepsToEnd } from "../guides/graph";
import type { WalkRig } from "../rigs/specs";
import type { Role } from "../people/roles";
import { OUTCOME_LABELS, type CaseKind, type Outcome } from "../vocabulary";
import { guideKind } from "../guides/kinds";
import { dayFacts, type DayFacts } from "./day-facts";
import { cardGaps } from "./held-answers";
import { closePending, loadRecord, saveRecord, type KeyValueStore, type QueuedEvent, type WalkRecord } from "./queue";

/**
 * What the phone keeps so its person can start and walk a fix with no signal, and how a walk
 * is rebuilt from it. Storage is passed in (localStorage in the browser, a Map in tests).
 */

/** A rig as the phone keeps it: what the walk and field math need, and what the home list shows. */
export type KitRig = WalkRig & { mount: string; pumpKind: string };

export interface KitGuide {
  slug: string;
  title: string;
  summary: string;
  symptoms: string[];
  versionId: number;
  version: number;
  definition: Guide;
  /** Its prompts and help as element trees (the phone has no markdown parser). */
  texts: GuideTexts;
  /** In the person's language; these steps had no up-to-date translation and are in English. */
  inEnglish?: string[];
}

/** Made by the server (GET /api/offline-kit) for one person; refreshed whenever there is signal. */
export interface OfflineKit {
  /** When the server made it (the home screen shows how fresh it is). */
  madeAt: string;
  /** Whose kit it is: another person signing in on the same phone gets their own. */
  person: { id: number; name: string; email: string; role: Role; companyId: number; companyName: string; timeZone: string };
  /** Sections this installation hides from the menu. */
  hidden: string[];
  rigs: KitRig[];
  /** The rig this person last started a fix on, as the server knew when it made the kit. */
  lastRigCode: string | null;
  guides: KitGuide[];
  /** The language the guides and cause names are in (the person's). Older kits lack it: English. */
  language?: Language;
  causeNames: Record<string, string>;
  /** The company's loading rules with this person's pace, for the load card with no signal. Older kits lack it. */
  loadRules?: LoadRules;
  /** The jobs planned over the coming week: today's job with no signal. Older kits lack it. */
  jobs?: KeptJobs;
}

/** The walk-through screen's data, from the server or rebuilt on the phone. */
export interface WalkData {
  caseId: string;
  closedAs: Outcome | null;
  openedAt: string;
  guide: { slug: string; title: string; versionId: number; definition: Guide; texts: GuideTexts; inEnglish?: string[] };
  rig: WalkRig;
  stepsToEnd: Record<string, number>;
  causeNames: Record<string, string>;
  events: QueuedEvent[];
  /** True when the server has not seen this case yet (started with no signal). */
  onPhoneOnly?: boolean;
  /** Rebuilt from what the phone keeps (the answers are the phone's own). */
  fromPhone?: boolean;
  /** A fix or a rig card (older kept walks lack it: fixes). */
  kind?: CaseKind;
  /** The card this fix was opened from, to go back to at its end. */
  fromCard?: { caseId: string; title: string } | null;
  /** What today's cards on the rig say about the facts this guide asks again (the server's; the phone adds its own). */
  dayFacts?: DayFacts;
  /** On a card: the fixes its items opened, as the server has them. */
  fixesOpened?: { caseId: string; title: string; outcome: string }[];
}

/** What a walk needs besides its answers, kept once per case (a guide version can be replaced on the server meanwhile). */
export type KeptView = Omit<WalkData, "closedAs" | "events" | "stepsToEnd" | "onPhoneOnly" | "fromPhone" | "dayFacts" | "fixesOpened">;

const KIT_KEY = "tankside:kit";
const viewKey = (caseId: string) => `tankside:walk-view:${caseId}`;
const RECORD_PREFIX = "tankside:walk:";

/** Most a kit may weigh as the phone stores it (JSON characters); the README has the measured size. */
export const KIT_BUDGET_BYTES = 512 * 1024;

export function saveKit(store: KeyValueStore, kit: OfflineKit): void {
  store.setItem(KIT_KEY, JSON.stringify(kit));
}

/** The kept kit if it belongs to this person (or to whoever it belongs to when no one is named). */
export function loadKit(store: KeyValueStore, personId?: number): OfflineKit | null {
  try {
    const raw = store.getItem(KIT_KEY);
    if (!raw) return null;
    const kit = JSON.parse(raw) as OfflineKit;
    if (!kit?.person || !Array.isArray(kit.rigs) || !Array.isArray(kit.guides)) return null;
    return personId === undefined || kit.person.id === personId ? kit : null;
  } catch {
    return null;
  }
}

export function forgetKit(store: KeyValueStore & { removeItem(key: string): void }): void {
  store.removeItem(KIT_KEY);
}

export function saveView(store: KeyValueStore, view: KeptView): void {
  store.setItem(viewKey(view.caseId), JSON.stringify(view));
}

export function loadView(store: KeyValueStore, caseId: string): KeptView | null {
  try {
    const raw = store.getItem(viewKey(caseId));
    const view = raw ? (JSON.parse(raw) as KeptView) : null;
    return view?.caseId === caseId && view.guide?.definition ? view : null;
  } catch {
    return null;
  }
}

/** Case ids of every walk-through this phone keeps. */
export function keptCaseIds(store: { length: number; key(index: number): string | null }): string[] {
  const ids: string[] = [];
  for (let i = 0; i < store.length; i++) {
    const k = store.key(i);
    if (k?.startsWith(RECORD_PREFIX)) ids.push(k.slice(RECORD_PREFIX.length));
  }
  return ids;
}

export type PhoneStart = { ok: true; caseId: string } | { ok: false; problem: string };

/**
 * Starts a fix on the phone alone: the phone names the case and the opening time, and follows
 * the newest published version of the guide it holds. The start is sent before any answer
 * when there is signal again.
 */
export function startOnPhone(
  store: KeyValueStore,
  kit: OfflineKit,
  input: { caseId: string; rigCode: string; guideSlug: string; now: Date; engineHours?: number; fromCard?: { caseId: string; title: string } },
): PhoneStart {
  const rig = kit.rigs.find((r) => r.code === input.rigCode.toUpperCase());
  if (!rig) return { ok: false, problem: `Rig ${input.rigCode} is not on this phone's list. With signal, open the app once to refresh it.` };
  const guide = kit.guides.find((g) => g.slug === input.guideSlug);
  if (!guide) return { ok: false, problem: "That guide is not kept on this phone. With signal, open the app once to refresh it." };
  const existing = loadRecord(store, input.caseId);
  // A second tap on the same start (or a reload mid-start) opens the same case, never a second one.
  if (existing.start) return { ok: true, caseId: input.caseId };
  const openedAt = input.now.toISOString();
  const { mount: _mount, pumpKind: _pumpKind, ...kitRig } = rig;
  // The case records the job the server finds for its day; the phone shows the same one meanwhile.
  const walkRig = { ...kitRig, job: keptJobAt(kit.jobs, input.now, kit.person.timeZone, { rigCode: rig.code, personId: kit.person.id }) };
  const kind = guideKind(guide.definition) === "card" ? "card" : "fix";
  if (kind === "card" && rig.hasHourMeter && input.engineHours === undefined)
    return { ok: false, problem: "Give the hour meter reading: a card records it as it starts." };
  saveView(store, {
    caseId: input.caseId,
    openedAt,
    guide: {
      slug: guide.slug,
      title: guide.title,
      versionId: guide.versionId,
      definition: guide.definition,
      texts: guide.texts,
      inEnglish: guide.inEnglish ?? [],
    },
    rig: kind === "card" && input.engineHours !== undefined ? { ...walkRig, engineHours: Math.max(walkRig.engineHours, input.engineHours) } : walkRig,
    causeNames: namesFor(guide.definition, kit.causeNames),
    kind,
    fromCard: input.fromCard ?? null,
  });
  const engineHours = kind === "card" && rig.hasHourMeter ? input.engineHours : undefined;
  saveRecord(store, {
    ...existing,
    start: {
      rigCode: rig.code,
      guideSlug: guide.slug,
      guideVersionId: guide.versionId,
      openedAt,
      ...(engineHours !== undefined ? { engineHours } : {}),
      ...(input.fromCard ? { fromCaseId: input.fromCard.caseId } : {}),
    },
  });
  if (engineHours !== undefined) noteHoursOnPhone(store, rig.code, engineHours);
  return { ok: true, caseId: input.caseId };
}

/**
 * The walk as the phone has it, null when the phone holds no such walk. Its answers are not
 * listed: they are the phone's own (the walk screen reads them), and what the server has is not
 * known here — answers listed as the server's would count as sent.
 */
export function walkOnPhone(store: KeyValueStore, caseId: string): WalkData | null {
  const view = loadView(store, caseId);
  if (!view) return null;
  const record = loadRecord(store, caseId);
  return {
    ...view,
    closedAs: null,
    stepsToEnd: stepsToEnd(view.guide.definition),
    events: [],
    onPhoneOnly: !!record.start && !record.startSent,
    fromPhone: true,
  };
}

/** Keeps what the walk needs so it can open again with no signal (called whenever the server sends it). */
export function keepWalk(store: KeyValueStore, data: WalkData): void {
  saveView(store, {
    caseId: data.caseId,
    openedAt: data.openedAt,
    guide: data.guide,
    rig: data.rig,
    causeNames: data.causeNames,
    kind: data.kind,
    fromCard: data.fromCard ?? null,
  });
}

/**
 * What the cards this phone keeps for a rig, opened since `since` (the start of the company's
 * day), say about the day's facts: a pre-start done with no signal counts at once.
 */
export function dayFactsOnPhone(
  store: KeyValueStore & { length: number; key(index: number): string | null },
  rigCode: string,
  since: string,
  by: string | null,
): DayFacts {
  const cards = keptCaseIds(store).flatMap((id) => {
    const view = loadView(store, id);
    if (!view || view.rig.code !== rigCode || view.kind !== "card" || view.openedAt < since) return [];
    return [{ title: view.guide.title, definition: view.guide.definition, by, events: loadRecord(store, id).events }];
  });
  return dayFacts(cards);
}

/** The names of the causes a guide can end with. */
export function namesFor(guide: Guide, all: Record<string, string>): Record<string, string> {
  const codes = new Set(Object.values(guide.states).flatMap((s) => (s.meta.cause ? [s.meta.cause] : [])));
  return Object.fromEntries(Object.entries(all).filter(([code]) => codes.has(code)));
}

/** Whether anything of this walk still waits to be sent. */
export function waitingToSend(record: WalkRecord): boolean {
  const unsent = record.events.some((e) => !record.synced.includes(e.id));
  const photos = (record.photos ?? []).some((p) => !p.sentAs && !p.error);
  return (!!record.start && !record.startSent) || unsent || photos || closePending(record);
}

/** Most that photos waiting on the phone may take together; a photo past it is refused with this said. */
export const PHOTO_WAIT_CAP_BYTES = 60 * 1024 * 1024;

/** Bytes of photos the phone holds that are not sent yet, over every kept walk. */
export function waitingPhotoBytes(store: KeyValueStore & { length: number; key(index: number): string | null }): number {
  return keptCaseIds(store)
    .flatMap((id) => loadRecord(store, id).photos ?? [])
    .filter((p) => !p.sentAs && !p.error)
    .reduce((sum, p) => sum + p.bytes, 0);
}

/** Walks on this rig the phone holds that are not finished, newest first (for "carry on where you left off"). */
export function openWalksOnPhone(
  store: KeyValueStore & { length: number; key(index: number): string | null },
  rigCode: string,
): { id: string; guideTitle: string; openedAt: string; onPhoneOnly: boolean }[] {
  return keptCaseIds(store)
    .flatMap((id) => {
      const view = loadView(store, id);
      const record = loadRecord(store, id);
      if (!view || view.rig.code !== rigCode || record.close || record.rejected) return [];
      return [{ id, guideTitle: view.guide.title, openedAt: view.openedAt, onPhoneOnly: !!record.start && !record.startSent }];
    })
    .sort((a, b) => b.openedAt.localeCompare(a.openedAt));
}

/** The server's open walks on a rig with this phone's own first (those it has not sent, or not heard of). */
export function withWalksOnPhone<T extends { id: string }>(
  store: KeyValueStore & { length: number; key(index: number): string | null },
  rigCode: string,
  fromServer: T[],
): (T | ReturnType<typeof openWalksOnPhone>[number])[] {
  const onServer = new Set(fromServer.map((w) => w.id));
  return [...openWalksOnPhone(store, rigCode).filter((w) => !onServer.has(w.id)), ...fromServer];
}

/** The rig of the newest walk started on this phone after `since`, if any. */
export function lastRigOnPhone(store: KeyValueStore & { length: number; key(index: number): string | null }, since: string): string | null {
  const newest = keptCaseIds(store)
    .map((id) => loadView(store, id))
    .filter((v): v is KeptView => !!v && v.openedAt > since)
    .sort((a, b) => b.openedAt.localeCompare(a.openedAt))[0];
  return newest?.rig.code ?? null;
}

/**
 * The newest hour-meter reading this phone knows for a rig: the kit's, or one entered on this
 * phone since (a fix finished with no signal), whichever is higher.
 */
export function lastHoursOnPhone(store: KeyValueStore, rigCode: string): number | null {
  return loadKit(store)?.rigs.find((r) => r.code === rigCode)?.engineHours ?? null;
}

/** Keeps a reading entered on this phone, so the next fix on the rig offers it as the last one. */
export function noteHoursOnPhone(store: KeyValueStore, rigCode: string, hours: number): void {
  const kit = loadKit(store);
  const rig = kit?.rigs.find((r) => r.code === rigCode);
  if (!kit || !rig || rig.engineHours >= hours) return;
  saveKit(store, { ...kit, rigs: kit.rigs.map((r) => (r.code === rigCode ? { ...r, engineHours: hours } : r)) });
}

/** Fixes this phone started from a card's items, with where each stands on the phone. */
export function fixesFromCardOnPhone(
  store: KeyValueStore & { length: number; key(index: number): string | null },
  cardId: string,
): { caseId: string; title: string; outcome: string }[] {
  return keptCaseIds(store).flatMap((id) => {
    const view = loadView(store, id);
    if (view?.fromCard?.caseId !== cardId) return [];
    const close = loadRecord(store, id).close;
    return [{ caseId: id, title: view.guide.title, outcome: close ? OUTCOME_LABELS[close.outcome].toLowerCase() : "open" }];
  });
}

/** Cards this phone walked on a rig since `since` (the company's day start), as the cards page lists them. */
export function cardsOnPhone(
  store: KeyValueStore & { length: number; key(index: number): string | null },
  rigCode: string,
  since: string,
  by: string | null,
): { id: string; title: string; outcome: Outcome; gaps: number | null; openedAt: string; engineHours: number | null; by: string | null }[] {
  return keptCaseIds(store)
    .flatMap((id) => {
      const view = loadView(store, id);
      if (!view || view.kind !== "card" || view.rig.code !== rigCode || view.openedAt < since) return [];
      const record = loadRecord(store, id);
      const outcome: Outcome = record.close?.outcome ?? "open";
      const gaps = record.close ? cardGaps(record.events) : null;
      return [{ id, title: view.guide.title, outcome, gaps, openedAt: view.openedAt, engineHours: record.start?.engineHours ?? null, by }];
    })
    .sort((a, b) => b.openedAt.localeCompare(a.openedAt));
}
