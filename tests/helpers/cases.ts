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
  walk: { rigCode: string; guideSlug: string; answers: [string, string][]; outcome: "fixed" | "handoff"; finalStep: string },
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
  const at = new Date().toISOString();
  await start(args(await post("/api/cases", { id, rigCode: walk.rigCode, guideSlug: walk.guideSlug })));
  const answers = walk.answers.map(([stepId, answer], i) => ({ id: randomUUID(), seq: i + 1, stepId, answer, at }));
  await events(args(await post(`/api/cases/${id}/events`, { events: answers }), { id }));
  const closed = (await close(args(await post(`/api/cases/${id}/close`, { outcome: walk.outcome, finalStep: walk.finalStep }), { id }))) as Response;
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
