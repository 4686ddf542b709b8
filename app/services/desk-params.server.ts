import { fail } from "./guards.server";

/** `:guideId` and `:number` from a desk URL; anything else is a 404. */
export function deskParams(params: { guideId?: string; number?: string }) {
  const guideId = Number(params.guideId);
  const number = Number(params.number ?? 1);
  if (!Number.isInteger(guideId) || guideId < 1 || !Number.isInteger(number) || number < 1) fail(404, "That guide version was not found.");
  return { guideId, number };
}
