import { z } from "zod";
import { STEP_ANSWERS } from "../vocabulary";
import { CHECKLIST_ITEMS, HAZARDS } from "./safety";

import { COMPONENTS, DAY_CHECK_KEYS, FIELD_MATH_WIDGETS, GUIDE_KINDS, SERVICE_TASK_KEYS, STEP_KINDS } from "./kinds";

// The plain lists live in kinds.ts, which the phone's walk-through can load without zod.
export { COMPONENTS, FIELD_MATH_WIDGETS, FINAL_KINDS, guideKind, isFinalKind, STEP_KINDS, type GuideKind, type StepKind } from "./kinds";

const slug = z.string().regex(/^[a-z][a-z0-9]*(-[a-z0-9]+)*$/, "use lower-case words joined by dashes");

export const stepMetaSchema = z.strictObject({
  kind: z.enum(STEP_KINDS),
  prompt: z.string().trim().min(1, "the prompt is empty").max(400, "keep the prompt under 400 characters; details go in help"),
  help: z.string().max(4000).optional(),
  handsOn: z.boolean().optional(),
  /** Puts energy back (engine started, clutch engaged, pump or agitator run, line pressurised): ends every stop before it. */
  energizes: z.boolean().optional(),
  /** On a safety step: what it isolates (none listed: the standard five). */
  checklist: z.array(z.enum(CHECKLIST_ITEMS)).max(CHECKLIST_ITEMS.length).optional(),
  /** On a hands-on step: what it exposes, which the stop before it must cover. */
  hazards: z.array(z.enum(HAZARDS)).max(HAZARDS.length).optional(),
  /** Tips, plugs, gaskets and guards back on, everyone clear of the stream: hands-on work is put back together. */
  returnsToService: z.boolean().optional(),
  minutes: z.number().min(0).max(240).optional(),
  fieldMath: z.enum(FIELD_MATH_WIDGETS).optional(),
  cause: z.string().optional(),
  component: z.enum(COMPONENTS).optional(),
  /** A fact of the day: on a card, this item establishes it; on a guide's check, the walk shows today's card answer. */
  dayCheck: z.enum(DAY_CHECK_KEYS).optional(),
  /** On a card: done (or yes) records this routine service on the rig's rules for the same task. */
  service: z.enum(SERVICE_TASK_KEYS).optional(),
  /** On a card's task: the guide this item opens on the spot (a valve that does not move freely opens valve trouble). */
  opensGuide: slug.optional(),
});

export const stepSchema = z.strictObject({
  type: z.literal("final").optional(),
  on: z.partialRecord(z.enum(STEP_ANSWERS), z.string()).optional(),
  meta: stepMetaSchema,
});

const fromStamp = z.string().regex(/^[0-9a-f]{8}$/, "the stamp of the English it was written from (8 hex digits)");

/** One step's text in another language (lib/guides/translations). */
export const stepTranslationSchema = z.strictObject({
  prompt: z.string().trim().min(1, "the translated prompt is empty").max(400, "keep the translated prompt under 400 characters"),
  help: z.string().max(4000).optional(),
  from: fromStamp,
});

/** A guide's text in another language: the head (title, summary, symptoms) and each step. */
export const guideTranslationSchema = z.strictObject({
  title: z.string().trim().min(1).max(120).optional(),
  summary: z.string().trim().min(1).max(600).optional(),
  symptoms: z.array(z.string().trim().min(2).max(120)).max(60).optional(),
  from: fromStamp.optional(),
  steps: z.record(slug, stepTranslationSchema).optional(),
});

/** Languages other than English a guide file may carry (English is the guide itself). */
export const translationsSchema = z.strictObject({ es: guideTranslationSchema.optional() });

/** The one definition of a guide file in content/guides (an XState machine config + our meta). */
export const guideSchema = z.strictObject({
  /** "card" for a rig card (content/cards); a guide leaves it out. */
  kind: z.enum(GUIDE_KINDS).optional(),
  id: slug,
  title: z.string().trim().min(1).max(120),
  summary: z.string().trim().min(1, "write one sentence on what it is for").max(600, "keep the summary under 600 characters"),
  symptoms: z.array(z.string().trim().min(2).max(120)).min(1, "list at least one symptom phrase"),
  initial: z.string().min(1),
  states: z.record(slug, stepSchema).refine((s) => Object.keys(s).length > 0, "a guide needs at least one step"),
  translations: translationsSchema.optional(),
});

export type Guide = z.infer<typeof guideSchema>;
export type Step = z.infer<typeof stepSchema>;
export type StepMeta = z.infer<typeof stepMetaSchema>;

/**
 * What a draft may be while a trainer is still writing it: unfinished (empty prompts, answers not yet
 * pointed anywhere) but always of the shape the editor and the diff can open, so a stored draft never
 * breaks them. The full rules are `guideSchema` and the validator's.
 */
const text = z.string().max(4000);
export const draftShapeSchema = z.object({
  kind: z.enum(GUIDE_KINDS).optional(),
  id: z.string().max(80),
  title: z.string().max(120),
  summary: z.string().max(600),
  symptoms: z.array(z.string().max(120)).max(60),
  initial: z.string().max(80),
  states: z
    .record(
      z.string().min(1).max(80),
      z.object({
        type: z.literal("final").optional(),
        on: z.record(z.string().max(8), z.string().max(80)).optional(),
        meta: z.looseObject({ kind: z.enum(STEP_KINDS), prompt: text, help: text.optional() }),
      }),
    )
    .refine((s) => Object.keys(s).length <= 200, "a guide has at most 200 steps"),
  translations: z
    .object({
      es: z
        .object({
          title: z.string().max(120).optional(),
          summary: z.string().max(600).optional(),
          symptoms: z.array(z.string().max(120)).max(60).optional(),
          from: z.string().max(16).optional(),
          steps: z.record(z.string().max(80), z.object({ prompt: text, help: text.optional(), from: z.string().max(16) })).optional(),
        })
        .optional(),
    })
    .optional(),
});

const LONE_SURROGATE = /[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/;

/** No lone surrogate anywhere in a value's text and no deep nesting (the database refuses both; neither is ever meant). */
export function wellFormedText(value: unknown, depth = 0): boolean {
  if (depth > 12) return false;
  if (typeof value === "string") return !LONE_SURROGATE.test(value);
  if (Array.isArray(value)) return value.every((v) => wellFormedText(v, depth + 1));
  if (value && typeof value === "object") return Object.entries(value).every(([k, v]) => !LONE_SURROGATE.test(k) && wellFormedText(v, depth + 1));
  return true;
}
