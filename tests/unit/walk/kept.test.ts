import { describe, expect, it } from "vitest";
import { readFileSync } from "node:fs";
import {
  cardsOnPhone,
  dayFactsOnPhone,
  lastHoursOnPhone,
  noteHoursOnPhone,
  lastRigOnPhone,
  loadKit,
  openWalksOnPhone,
  saveKit,
  startOnPhone,
  waitingPhotoBytes,
  waitingToSend,
  walkOnPhone,
  type OfflineKit,
} from "~/lib/walk/kept";
import { appendEvent, loadRecord, saveRecord } from "~/lib/walk/queue";
import { fixture, tinyGuide } from "../../helpers/guides";

/** localStorage's shape, in memory. */
const phone = () => {
  const data = new Map<string, string>();
  return {
    data,
    getItem: (k: string) => data.get(k) ?? null,
    setItem: (k: string, v: string) => void data.set(k, v),
    removeItem: (k: string) => void data.delete(k),
    get length() {
      return data.size;
    },
    key: (i: number) => [...data.keys()][i] ?? null,
  };
};

const rig = (code: string) => ({
  code,
  name: `Rig ${code}`,
  tankGal: 1500,
  hoseLengthFt: 150,
  hoseDiameterIn: 2,
  yardElevationFt: 4000,
  agitatorMixes: "forward" as const,
  pumpRatedGpm: null,
  pumpRatedPsi: null,
  pumpNpshrFt: null,
  carrierRatingLb: null,
  nozzleTips: [],
  torqueSpecs: [],
  hasHourMeter: true,
  engineHours: 812,
  mount: "trailer",
  pumpKind: "centrifugal",
});

const kit = (): OfflineKit => ({
  madeAt: "2026-12-02T08:12:00.000Z",
  person: { id: 7, name: "Dana Ortiz", email: "dana@example.test", role: "crew", companyId: 1, companyName: "Test Co", timeZone: "America/Denver" },
  hidden: [],
  rigs: [rig("CF-07"), rig("CF-11")],
  lastRigCode: "CF-11",
  guides: [{ slug: "tiny", title: "Tiny guide", summary: "s", symptoms: ["it stops"], versionId: 41, version: 3, definition: tinyGuide(), texts: {} }],
  causeNames: { "low-water": "Tank water low", "not-in-guide": "Other" },
});

const NOW = new Date("2026-12-02T09:30:00.000Z");

describe("starting a fix on the phone with no signal", () => {
  it("names the case and the opening time, follows the version the phone holds, and keeps what the walk needs", () => {
    const store = phone();
    const started = startOnPhone(store, kit(), { caseId: "case-1", rigCode: "cf-07", guideSlug: "tiny", now: NOW });
    expect(started).toEqual({ ok: true, caseId: "case-1" });
    expect(loadRecord(store, "case-1").start).toEqual({ rigCode: "CF-07", guideSlug: "tiny", guideVersionId: 41, openedAt: NOW.toISOString() });
    const walk = walkOnPhone(store, "case-1")!;
    expect(walk).toMatchObject({ caseId: "case-1", openedAt: NOW.toISOString(), closedAs: null, onPhoneOnly: true, fromPhone: true, events: [] });
    expect(walk.guide).toMatchObject({ slug: "tiny", versionId: 41 });
    expect(walk.rig).not.toHaveProperty("mount");
    expect(walk.stepsToEnd[tinyGuide().initial]).toBeGreaterThan(0);
  });

  it("opens the same case on a second tap rather than a second case", () => {
    const store = phone();
    startOnPhone(store, kit(), { caseId: "case-1", rigCode: "CF-07", guideSlug: "tiny", now: NOW });
    const later = new Date(NOW.getTime() + 5000);
    expect(startOnPhone(store, kit(), { caseId: "case-1", rigCode: "CF-07", guideSlug: "tiny", now: later })).toEqual({ ok: true, caseId: "case-1" });
    expect(loadRecord(store, "case-1").start!.openedAt).toBe(NOW.toISOString());
  });

  it("says what is missing when the phone does not hold the rig or the guide", () => {
    const store = phone();
    const noRig = startOnPhone(store, kit(), { caseId: "c", rigCode: "BM-02", guideSlug: "tiny", now: NOW });
    expect(noRig).toEqual({ ok: false, problem: expect.stringMatching(/Rig BM-02 is not on this phone's list/) });
    const noGuide = startOnPhone(store, kit(), { caseId: "c", rigCode: "CF-07", guideSlug: "nope", now: NOW });
    expect(noGuide).toEqual({ ok: false, problem: expect.stringMatching(/not kept on this phone/) });
    expect(store.data.size).toBe(0);
  });
});

describe("what the phone keeps", () => {
  it("keeps the kit per person: another person's kit is not used", () => {
    const store = phone();
    saveKit(store, kit());
    expect(loadKit(store, 7)?.rigs.map((r) => r.code)).toEqual(["CF-07", "CF-11"]);
    expect(loadKit(store, 8)).toBeNull();
    store.setItem("tankside:kit", "{broken");
    expect(loadKit(store)).toBeNull();
  });

  it("offers unfinished walks on the rig to carry on, newest first, and not closed or refused ones", () => {
    const store = phone();
    startOnPhone(store, kit(), { caseId: "old", rigCode: "CF-07", guideSlug: "tiny", now: NOW });
    startOnPhone(store, kit(), { caseId: "new", rigCode: "CF-07", guideSlug: "tiny", now: new Date(NOW.getTime() + 60_000) });
    startOnPhone(store, kit(), { caseId: "other-rig", rigCode: "CF-11", guideSlug: "tiny", now: NOW });
    startOnPhone(store, kit(), { caseId: "closed", rigCode: "CF-07", guideSlug: "tiny", now: NOW });
    saveRecord(store, { ...loadRecord(store, "closed"), close: { outcome: "abandoned", at: NOW.toISOString() } });
    startOnPhone(store, kit(), { caseId: "refused", rigCode: "CF-07", guideSlug: "tiny", now: NOW });
    saveRecord(store, { ...loadRecord(store, "refused"), rejected: "Rig CF-07 has been retired." });
    expect(openWalksOnPhone(store, "CF-07").map((w) => w.id)).toEqual(["new", "old"]);
  });

  it("knows what still waits to be sent: the start, answers, photos and the close", () => {
    const store = phone();
    startOnPhone(store, kit(), { caseId: "c", rigCode: "CF-07", guideSlug: "tiny", now: NOW });
    let r = loadRecord(store, "c");
    expect(waitingToSend(r)).toBe(true);
    r = { ...r, startSent: true };
    expect(waitingToSend(r)).toBe(false);
    r = appendEvent(r, { id: "e1", stepId: "s", answer: "YES", at: NOW.toISOString() });
    expect(waitingToSend(r)).toBe(true);
    r = { ...r, synced: ["e1"], photos: [{ id: "p1", stepId: "s", name: "a.jpg", bytes: 2_000_000 }] };
    expect(waitingToSend(r)).toBe(true);
    saveRecord(store, r);
    expect(waitingPhotoBytes(store)).toBe(2_000_000);
    r = { ...r, photos: [{ id: "p1", stepId: "s", name: "a.jpg", bytes: 2_000_000, sentAs: 9 }] };
    saveRecord(store, r);
    expect(waitingPhotoBytes(store)).toBe(0);
    expect(waitingToSend(r)).toBe(false);
    r = { ...r, close: { outcome: "fixed", at: NOW.toISOString() } };
    expect(waitingToSend(r)).toBe(true);
  });
});

describe("the last rig, with no signal", () => {
  it("is the rig of the newest walk started on the phone since the kit was made, else none", () => {
    const store = phone();
    expect(lastRigOnPhone(store, kit().madeAt)).toBeNull();
    startOnPhone(store, kit(), { caseId: "a", rigCode: "CF-11", guideSlug: "tiny", now: NOW });
    startOnPhone(store, kit(), { caseId: "b", rigCode: "CF-07", guideSlug: "tiny", now: new Date(NOW.getTime() + 60_000) });
    expect(lastRigOnPhone(store, kit().madeAt)).toBe("CF-07");
    expect(lastRigOnPhone(store, "2026-12-03T00:00:00.000Z")).toBeNull();
  });
});

describe("hour-meter readings entered with no signal", () => {
  it("offers the higher of the kit's reading and one entered on this phone since, and never lowers it", () => {
    const store = phone();
    saveKit(store, kit());
    expect(lastHoursOnPhone(store, "CF-07")).toBe(812);
    noteHoursOnPhone(store, "CF-07", 815.5);
    expect(lastHoursOnPhone(store, "CF-07")).toBe(815.5);
    noteHoursOnPhone(store, "CF-07", 813);
    expect(lastHoursOnPhone(store, "CF-07")).toBe(815.5);
    expect(lastHoursOnPhone(store, "CF-11")).toBe(812);
    expect(lastHoursOnPhone(store, "BM-02")).toBeNull();
  });
});

describe("a rig card on the phone with no signal", () => {
  const tinyCard = () => JSON.parse(readFileSync(fixture("guides", "tiny-card.json"), "utf8"));
  const cardKit = (): OfflineKit => ({
    ...kit(),
    guides: [
      ...kit().guides,
      { slug: "tiny-card", title: "Tiny card", summary: "s", symptoms: ["morning"], versionId: 77, version: 1, definition: tinyCard(), texts: {} },
    ],
  });

  it("needs the hour meter on a metered rig, keeps it with the start, and offers it as the last reading", () => {
    const store = phone();
    saveKit(store, cardKit());
    const refused = startOnPhone(store, cardKit(), { caseId: "card-1", rigCode: "CF-07", guideSlug: "tiny-card", now: NOW });
    expect(refused).toEqual({ ok: false, problem: expect.stringMatching(/hour meter reading/) });
    expect(startOnPhone(store, cardKit(), { caseId: "card-1", rigCode: "CF-07", guideSlug: "tiny-card", now: NOW, engineHours: 815.5 })).toEqual({
      ok: true,
      caseId: "card-1",
    });
    expect(loadRecord(store, "card-1").start).toMatchObject({ guideSlug: "tiny-card", engineHours: 815.5 });
    expect(walkOnPhone(store, "card-1")!.kind).toBe("card");
    expect(lastHoursOnPhone(store, "CF-07")).toBe(815.5);
  });

  it("links a fix started from a card item, and the card's answers stand as today's facts", () => {
    const store = phone();
    saveKit(store, cardKit());
    startOnPhone(store, cardKit(), { caseId: "card-1", rigCode: "CF-07", guideSlug: "tiny-card", now: NOW, engineHours: 815.5 });
    let record = loadRecord(store, "card-1");
    record = appendEvent(record, { id: "e1", stepId: "stop", answer: "ACK", at: "2026-12-02T09:31:00.000Z" });
    record = appendEvent(record, { id: "e2", stepId: "grease", answer: "DONE", at: "2026-12-02T09:33:00.000Z" });
    record = appendEvent(record, { id: "e3", stepId: "valves", answer: "NO", at: "2026-12-02T09:34:00.000Z" });
    saveRecord(store, record);
    startOnPhone(store, cardKit(), { caseId: "fix-1", rigCode: "CF-07", guideSlug: "tiny", now: NOW, fromCard: { caseId: "card-1", title: "Tiny card" } });
    expect(loadRecord(store, "fix-1").start).toMatchObject({ fromCaseId: "card-1" });
    expect(loadRecord(store, "fix-1").start).not.toHaveProperty("engineHours");
    expect(walkOnPhone(store, "fix-1")!.fromCard).toEqual({ caseId: "card-1", title: "Tiny card" });
    const facts = dayFactsOnPhone(store, "CF-07", "2026-12-02T07:00:00.000Z", "Dana Ortiz");
    expect(facts).toEqual({
      "grease-done": { value: true, at: "2026-12-02T09:33:00.000Z", by: "Dana Ortiz", card: "Tiny card" },
      "valves-free": { value: false, at: "2026-12-02T09:34:00.000Z", by: "Dana Ortiz", card: "Tiny card" },
    });
    // The cards page lists the phone's own card at once, under way.
    expect(cardsOnPhone(store, "CF-07", "2026-12-02T07:00:00.000Z", "Dana Ortiz")).toEqual([
      { id: "card-1", title: "Tiny card", outcome: "open", gaps: null, openedAt: NOW.toISOString(), engineHours: 815.5, by: "Dana Ortiz" },
    ]);
    // A card from before the day's start says nothing today; another rig's says nothing here.
    expect(dayFactsOnPhone(store, "CF-07", "2026-12-02T10:00:00.000Z", null)).toEqual({});
    expect(dayFactsOnPhone(store, "CF-11", "2026-12-02T07:00:00.000Z", null)).toEqual({});
  });
});
