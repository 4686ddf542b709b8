import { afterEach, describe, expect, it, vi } from "vitest";
import { sendKept } from "~/components/offline/send-kept";
import type { WalkRecord } from "~/lib/walk/queue";

/** A server that answers each path as told, and notes what was sent in which order. */
function server(answers: Record<string, { status: number; body?: unknown } | "offline">) {
  const sent: { path: string; body: unknown }[] = [];
  vi.stubGlobal("fetch", async (path: string, init: RequestInit) => {
    const key = Object.keys(answers).find((k) => path.endsWith(k)) ?? "";
    const answer = answers[key] ?? { status: 200, body: {} };
    if (answer === "offline") throw new TypeError("Failed to fetch");
    sent.push({ path, body: JSON.parse(String(init.body)) });
    return new Response(JSON.stringify(answer.body ?? {}), { status: answer.status, headers: { "Content-Type": "application/json" } });
  });
  return sent;
}

afterEach(() => vi.unstubAllGlobals());

const startedOffline = (): WalkRecord => ({
  caseId: "c1",
  start: { rigCode: "CF-07", guideSlug: "foaming", guideVersionId: 6, openedAt: "2026-12-02T09:00:00.000Z" },
  events: [
    { id: "e1", seq: 1, stepId: "agitator-speed", answer: "YES", at: "2026-12-02T09:01:00.000Z" },
    { id: "e2", seq: 2, stepId: "recirc-time", answer: "NO", at: "2026-12-02T09:02:00.000Z" },
  ],
  synced: [],
  close: { outcome: "abandoned", at: "2026-12-02T09:03:00.000Z" },
});

function holder(record: WalkRecord) {
  let current = record;
  return { read: () => current, update: (change: (r: WalkRecord) => WalkRecord) => void (current = change(current)), get: () => current };
}

describe("sending what the phone kept", () => {
  it("sends the start before its answers and the close last, each once", async () => {
    const sent = server({ "/close": { status: 200, body: { notified: [] } } });
    const kept = holder(startedOffline());
    expect(await sendKept(kept)).toBe("sent");
    expect(sent.map((s) => s.path)).toEqual(["/api/cases", "/api/cases/c1/events", "/api/cases/c1/close"]);
    expect(sent[0].body).toEqual({ id: "c1", rigCode: "CF-07", guideSlug: "foaming", guideVersionId: 6, openedAt: "2026-12-02T09:00:00.000Z" });
    expect(kept.get()).toMatchObject({ startSent: true, synced: ["e1", "e2"], closeResult: { notified: [] } });
    // A second round has nothing left to send.
    expect(await sendKept(kept)).toBe("sent");
    expect(sent).toHaveLength(3);
  });

  it("keeps everything when the signal drops midway, and resends only what was not acknowledged", async () => {
    let sent = server({ "/events": "offline" });
    const kept = holder(startedOffline());
    expect(await sendKept(kept)).toBe("waiting");
    expect(sent.map((s) => s.path)).toEqual(["/api/cases"]);
    expect(kept.get()).toMatchObject({ startSent: true, synced: [] });
    sent = server({ "/close": { status: 200, body: { notified: ["Mo"] } } });
    expect(await sendKept(kept)).toBe("sent");
    expect(sent.map((s) => s.path)).toEqual(["/api/cases/c1/events", "/api/cases/c1/close"]);
  });

  it("asks again when the hand-off mail was still being sent by another request, and then keeps the answer", async () => {
    let sent = server({ "/close": { status: 200, body: { notified: [], mailedAt: null, mailFailed: false, mailPending: true } } });
    const kept = holder(startedOffline());
    expect(await sendKept(kept)).toBe("sent");
    expect(kept.get().closeResult).toMatchObject({ mailPending: true });
    sent = server({ "/close": { status: 200, body: { notified: ["Mo Brennan"], mailedAt: "2026-12-02T09:04:00.000Z", mailFailed: false } } });
    expect(await sendKept(kept)).toBe("sent");
    expect(sent.map((s) => s.path)).toEqual(["/api/cases/c1/close"]);
    expect(kept.get().closeResult).toMatchObject({ notified: ["Mo Brennan"], mailPending: undefined });
    expect(await sendKept(kept)).toBe("sent");
    expect(sent).toHaveLength(1);
  });

  it("stops at a refused start and keeps the answers with the server's reason", async () => {
    const sent = server({ "/api/cases": { status: 409, body: { error: "Rig CF-07 has been retired. Tell your supervisor which rig you were working on." } } });
    const kept = holder(startedOffline());
    expect(await sendKept(kept)).toBe("refused");
    expect(sent).toHaveLength(1);
    expect(kept.get().rejected).toBe("The server did not take this fix: Rig CF-07 has been retired. Tell your supervisor which rig you were working on.");
    expect(kept.get().events).toHaveLength(2);
    expect(await sendKept(kept)).toBe("refused");
    expect(sent).toHaveLength(1);
  });

  it("waits for a new sign-in rather than refusing when the session has ended", async () => {
    server({ "/api/cases": { status: 401, body: { error: "Sign in first" } } });
    const kept = holder(startedOffline());
    expect(await sendKept(kept)).toBe("signed-out");
    expect(kept.get().rejected).toBeUndefined();
    expect(kept.get().startSent).toBeUndefined();
  });

  it("tries again later when the server is busy or down (5xx, 429)", async () => {
    server({ "/api/cases": { status: 503 } });
    const kept = holder(startedOffline());
    expect(await sendKept(kept)).toBe("waiting");
    server({ "/api/cases": { status: 429 } });
    expect(await sendKept(kept)).toBe("waiting");
    expect(kept.get().rejected).toBeUndefined();
  });
});
