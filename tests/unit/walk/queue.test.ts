import { describe, expect, it } from "vitest";
import { appendEvent, loadRecord, markSynced, mergeServerEvents, saveRecord, unsynced, type KeyValueStore } from "~/lib/walk/queue";

const memory = (): KeyValueStore & { data: Map<string, string> } => {
  const data = new Map<string, string>();
  return { data, getItem: (k) => data.get(k) ?? null, setItem: (k, v) => void data.set(k, v) };
};

describe("walk queue", () => {
  it("numbers answers in order and keeps them across a reload", () => {
    const store = memory();
    let r = loadRecord(store, "c1");
    r = appendEvent(r, { id: "a", stepId: "s1", answer: "YES", at: "2026-01-01T00:00:00Z" });
    r = appendEvent(r, { id: "b", stepId: "s2", answer: "NO", at: "2026-01-01T00:01:00Z" });
    saveRecord(store, r);
    const again = loadRecord(store, "c1");
    expect(again.events.map((e) => [e.id, e.seq])).toEqual([
      ["a", 1],
      ["b", 2],
    ]);
    expect(unsynced(again).map((e) => e.id)).toEqual(["a", "b"]);
    expect(unsynced(markSynced(again, ["a"])).map((e) => e.id)).toEqual(["b"]);
  });

  it("merges what the server has without doubling anything", () => {
    let r = appendEvent(loadRecord(memory(), "c1"), { id: "a", stepId: "s1", answer: "YES", at: "t" });
    r = mergeServerEvents(r, [
      { id: "a", seq: 1, stepId: "s1", answer: "YES", at: "t" },
      { id: "z", seq: 2, stepId: "s2", answer: "NO", at: "t" },
    ]);
    expect(r.events.map((e) => e.id)).toEqual(["a", "z"]);
    expect(unsynced(r)).toEqual([]);
    expect(appendEvent(r, { id: "n", stepId: "s3", answer: "DONE", at: "t" }).events.at(-1)!.seq).toBe(3);
  });

  it("starts fresh from a damaged record instead of failing", () => {
    const store = memory();
    store.setItem("tankside:walk:c1", "{not json");
    expect(loadRecord(store, "c1")).toEqual({ caseId: "c1", events: [], synced: [] });
  });
});
