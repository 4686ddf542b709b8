import { randomUUID } from "node:crypto";
import type { CreationAttributes } from "sequelize";
import type { Case } from "../../db/index";

type Required = "companyId" | "rigId" | "guideVersionId" | "openedBy" | "openedAt";

/** A case row for a fixture: what the test names, everything else as a freshly opened case has it. */
export const caseRow = (c: Pick<CreationAttributes<Case>, Required> & Partial<CreationAttributes<Case>>): CreationAttributes<Case> => ({
  id: randomUUID(),
  closedAt: null,
  engineHours: null,
  finalStep: null,
  causeCode: null,
  safetyAckAt: null,
  note: null,
  ...c,
});

/**
 * A whole walk-through as the phone sends it, through the real API actions: start, the answers
 * (step → answer, in order), then the close. Returns the case id. Routes are imported when used,
 * so a test can set the environment (e.g. a replica) first.
 */
export async function walkThroughApi(
  email: string,
  walk: {
    rigCode: string;
    guideSlug: string;
    answers: [string, string][];
    outcome: "fixed" | "handoff";
    finalStep: string;
    /** A card's hour-meter reading as it starts. */
    engineHours?: number;
    /** The card a fix was opened from. */
    fromCaseId?: string;
    /** When it was walked (now by default). */
    at?: Date;
  },
): Promise<string> {
  const [{ RouterContextProvider }, { action: start }, { action: events }, { action: close }, { requestAs }] = await Promise.all([
    import("react-router"),
    import("~/routes/api.cases"),
    import("~/routes/api.cases.$id.events"),
    import("~/routes/api.cases.$id.close"),
    import("./requests"),
  ]);
  const args = (request: Request, params: Record<string, string> = {}) => ({ request, params, context: new RouterContextProvider() }) as never;
  const post = (path: string, body: unknown) =>
    requestAs(email, path, { method: "POST", body: JSON.stringify(body), headers: { "Content-Type": "application/json" } });
  const id = randomUUID();
  const at = (walk.at ?? new Date()).toISOString();
  const started = (await start(
    args(
      await post("/api/cases", {
        id,
        rigCode: walk.rigCode,
        guideSlug: walk.guideSlug,
        ...(walk.at ? { openedAt: at } : {}),
        ...(walk.engineHours !== undefined ? { engineHours: walk.engineHours } : {}),
        ...(walk.fromCaseId ? { fromCaseId: walk.fromCaseId } : {}),
      }),
    ),
  )) as Response;
  if (started.status >= 300) throw new Error(`The start was refused (${started.status})`);
  const answers = walk.answers.map(([stepId, answer], i) => ({ id: randomUUID(), seq: i + 1, stepId, answer, at }));
  await events(args(await post(`/api/cases/${id}/events`, { events: answers }), { id }));
  const closed = (await close(
    args(await post(`/api/cases/${id}/close`, { outcome: walk.outcome, finalStep: walk.finalStep, ...(walk.at ? { at } : {}) }), { id }),
  )) as Response;
  if (closed.status !== 200) throw new Error(`The close was refused (${closed.status})`);
  return id;
}

/** The shortest fixed walk of the lost-prime guide on CF-07: low water, topped up, holds. */
export const LOW_WATER_WALK = {
  rigCode: "CF-07",
  guideSlug: "lost-prime",
  answers: [
    ["water-level", "NO"],
    ["add-water", "DONE"],
    ["holds-after-water", "YES"],
  ] as [string, string][],
  outcome: "fixed" as const,
  finalStep: "fixed-low-water",
};

/** The pre-start on CF-07 with every item fine (the usual morning), and with the grease points left undone. */
export const PRE_START_ANSWERS: [string, string][] = [
  ["stop", "ACK"],
  ["drain-plug", "YES"],
  ["suction-valve", "YES"],
  ["grease", "DONE"],
  ["lubricator", "DONE"],
  ["hoses", "YES"],
  ["valves", "YES"],
  ["positions", "DONE"],
];
export const preStartWalk = (engineHours: number, opts: { skipGrease?: boolean; at?: Date } = {}) => ({
  rigCode: "CF-07",
  guideSlug: "pre-start",
  answers: PRE_START_ANSWERS.map(([s, a]): [string, string] => [s, s === "grease" && opts.skipGrease ? "CANT" : a]),
  outcome: "fixed" as const,
  finalStep: "complete",
  engineHours,
  at: opts.at,
});
