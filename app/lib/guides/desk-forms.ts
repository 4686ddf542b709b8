import { z } from "zod";
import { GUIDE_KINDS } from "./kinds";

/** The desk's own small forms; the same schemas check in the browser (conform) and on the server. */
const versionNumber = z.coerce.number({ error: "number must be a version number" }).int().positive("number must be a version number");
const changeNote = z
  .string({ error: "Say what changed (at least 3 characters)." })
  .trim()
  .min(3, "Say what changed (at least 3 characters).")
  .max(1000, "Keep the note under 1,000 characters.");

export const newGuideSchema = z.object({
  intent: z.literal("new"),
  /** A fault guide or a rig card (blank: a guide). */
  kind: z
    .enum(GUIDE_KINDS, { error: "Choose a guide or a rig card." })
    .optional()
    .transform((k) => k ?? "guide"),
  title: z
    .string({ error: "Give the new guide a title of 3 to 120 characters." })
    .trim()
    .min(3, "Give the new guide a title of 3 to 120 characters.")
    .max(120, "Give the new guide a title of 3 to 120 characters."),
});

/** Sending the draft for review from the editor. */
export const submitDraftSchema = z.object({ intent: z.literal("submit", { error: "Say what to do: submit." }), changeNote });

/** What the guide's page can be asked to do with a version. */
export const versionActionSchema = z.discriminatedUnion(
  "intent",
  [
    z.object({ intent: z.literal("edit") }),
    z.object({ intent: z.literal("submit"), number: versionNumber, changeNote }),
    z.object({
      intent: z.literal("approve"),
      number: versionNumber,
      comment: z.string().trim().max(1000, "Keep the comment under 1,000 characters.").optional(),
    }),
    z.object({
      intent: z.literal("return"),
      number: versionNumber,
      comment: z.string({ error: "Say what needs changing." }).trim().min(3, "Say what needs changing.").max(1000, "Keep the comment under 1,000 characters."),
    }),
  ],
  { error: "Say what to do: edit, submit, approve or return." },
);
