import { z } from "zod";
import { ANSWERS, CLOSE_OUTCOMES } from "../vocabulary";
import { hourMeterReading } from "../rigs/service-forms";

const uuid = z.string().uuid("must be a UUID");
const isoTime = z.iso.datetime({ offset: true, message: "must be an ISO 8601 time, like 2026-06-01T14:05:00Z" });

export { MAX_PHOTO_BYTES } from "./limits";

/** How long a start made on a phone with no signal may wait to be sent. */
export const LATE_START_DAYS = 7;

export const startCaseSchema = z.strictObject({
  id: uuid.optional(),
  rigCode: z.string({ error: "rigCode is required" }).trim().min(1, "rigCode is required").max(16),
  guideSlug: z.string({ error: "guideSlug is required" }).trim().min(1, "guideSlug is required").max(80),
  /** When the phone opened the case (a start made with no signal, sent later). */
  openedAt: isoTime.optional(),
  /** The guide version the phone walked (it may have been replaced or retired since). */
  guideVersionId: z.number({ error: "guideVersionId must be a number" }).int().positive("guideVersionId must be a version's id").optional(),
  /** A rig card's hour-meter reading at its start (required for a card on a rig with a meter). */
  engineHours: z
    .number({ error: "engineHours must be a number" })
    .min(0, "engine hours cannot be negative")
    .max(100_000, "engine hours over 100,000 are not plausible")
    .optional(),
  /** The card this fix was opened from (a card item that opens a guide). */
  fromCaseId: uuid.optional(),
});

export const caseEventSchema = z.strictObject({
  id: uuid,
  seq: z.number({ error: "seq must be a number" }).int().min(1, "seq starts at 1").max(10_000),
  stepId: z.string().min(1).max(80),
  answer: z.enum(ANSWERS, { error: `answer must be one of ${ANSWERS.join(", ")}` }),
  at: isoTime,
  note: z.string().max(2000, "keep a note under 2,000 characters").optional(),
});

export const eventBatchSchema = z.strictObject({
  events: z.array(caseEventSchema).min(1, "send at least one event").max(500, "send at most 500 events at once"),
});

export const closeCaseSchema = z.strictObject({
  outcome: z.enum(CLOSE_OUTCOMES, { error: `outcome must be one of ${CLOSE_OUTCOMES.join(", ")}` }),
  finalStep: z.string().min(1).max(80).optional(),
  engineHours: z.number().min(0, "engine hours cannot be negative").max(100_000, "engine hours over 100,000 are not plausible").optional(),
  note: z.string().max(2000).optional(),
  at: isoTime.optional(),
});

export type StartCaseInput = z.infer<typeof startCaseSchema>;
export type CaseEventInput = z.infer<typeof caseEventSchema>;
export type CloseCaseInput = z.infer<typeof closeCaseSchema>;

/** The cards page: which card, the phone-made case id, and the hour meter as the card starts. */
export const cardStartFormSchema = z.object({
  cardSlug: z.string({ error: "Pick a card." }).trim().min(1, "Pick a card.").max(80),
  caseId: uuid.optional(),
  engineHours: hourMeterReading,
});
