import { z } from "zod";

/** What a material is, for where it goes in the loading order. */
export const MATERIAL_KINDS = ["fiber", "seed", "fertilizer", "tackifier", "other"] as const;
export type MaterialKind = (typeof MATERIAL_KINDS)[number];
export const MATERIAL_KIND_LABELS: Record<MaterialKind, string> = {
  fiber: "Fiber mulch",
  seed: "Seed",
  fertilizer: "Fertilizer",
  tackifier: "Tackifier",
  other: "Light materials (dye, additives)",
};

/** The places in the loading order: water first, then each kind of material. */
export const LOAD_STEPS = ["water", "other", "fiber", "fertilizer", "tackifier", "seed"] as const;
export type LoadStep = (typeof LOAD_STEPS)[number];
export const LOAD_STEP_LABELS: Record<LoadStep, string> = {
  water: "Water",
  other: "Light materials (dye, additives)",
  fiber: "Fiber mulch",
  fertilizer: "Fertilizer",
  tackifier: "Tackifier",
  seed: "Seed",
};

/** Seed should stay in the tank no more than 30 minutes (USDA NRCS Wyoming, Hydroseeding and Hydromulching Fact Sheet). */
export const SEED_IN_TANK_MINUTES = 30;
/** About 50 lb of wood fiber per 100 gal of water is a usual ceiling (common practice; set per company and product). */
export const DEFAULT_FIBER_CEILING_LB_PER_100_GAL = 50;
/** One walking step, heel to heel: about 2½ ft for an adult (from memory; each person sets their own on /account). */
export const DEFAULT_PACE_FT = 2.5;

/**
 * The order and reasons a company starts from: lightest first, fiber between the half and
 * three-quarter marks, fertilizer after fiber, seed last (USDA NRCS Wyoming fact sheet and the
 * working day in common practice). Tackifiers differ: the maker's sheet decides.
 */
export const DEFAULT_LOADING_ORDER: { step: LoadStep; reason: string }[] = [
  { step: "water", reason: "Water in with the agitator running: the paddles must be covered before anything else goes in." },
  { step: "other", reason: "Lightest materials next, while the water is still coming in: they wet out and spread easily." },
  { step: "fiber", reason: "Fiber only once the tank is at least at the first mark: fiber in a low tank bends paddles and plugs valves." },
  { step: "fertilizer", reason: "Fertilizer after the fiber, so the fiber has wet out first." },
  { step: "tackifier", reason: "Tackifier where its maker's sheet says: some want it early with the water, some late. Your company sets this place." },
  { step: "seed", reason: "Seed last, just before spraying: it swells in water, and the seed clock starts when it goes in." },
];

const percent = (label: string, min: number, max: number) =>
  z
    .number({ error: `Give the ${label} as a percent of the tank.` })
    .int(`Give the ${label} as a whole percent.`)
    .min(min, `The ${label} must be at least ${min} %.`)
    .max(max, `The ${label} must be at most ${max} %.`);

/** A company's rules for loading a tank: the marks for fiber, the seed limit, the fiber ceiling, pace and order. */
export const loadRulesSchema = z
  .object({
    fiberStartPercent: percent("level fiber may start at", 25, 90),
    fiberDonePercent: percent("level all fiber must be in by", 30, 100),
    seedLimitMinutes: z
      .number({ error: "Give the seed limit in minutes." })
      .int("Give whole minutes.")
      .min(5, "A seed limit under 5 minutes leaves no time to spray.")
      .max(240, "A seed limit over 4 hours is not plausible."),
    fiberCeilingLbPer100Gal: z
      .number({ error: "Give the most fiber per 100 gal of water, in lb." })
      .min(5, "A fiber ceiling under 5 lb per 100 gal is not plausible.")
      .max(150, "A fiber ceiling over 150 lb per 100 gal is not plausible."),
    paceFt: z.number({ error: "Give the pace length in feet." }).min(1, "A pace under 1 ft is not plausible.").max(6, "A pace over 6 ft is not plausible."),
    order: z
      .array(
        z.object({
          step: z.enum(LOAD_STEPS, { error: `Each place is one of: ${LOAD_STEPS.join(", ")}.` }),
          reason: z
            .string({ error: "Give the reason for this place." })
            .trim()
            .min(1, "Give the reason for this place.")
            .max(240, "Keep each reason under 240 characters."),
        }),
      )
      .length(LOAD_STEPS.length, `The order has one place for each of: ${LOAD_STEPS.map((s) => LOAD_STEP_LABELS[s]).join(", ")}.`),
  })
  .superRefine((rules, ctx) => {
    if (rules.fiberDonePercent <= rules.fiberStartPercent) {
      ctx.addIssue({ code: "custom", path: ["fiberDonePercent"], message: "All fiber must be in at a higher level than where it starts." });
    }
    const steps = rules.order.map((o) => o.step);
    if (new Set(steps).size !== steps.length) ctx.addIssue({ code: "custom", path: ["order"], message: "Each material kind appears once in the order." });
    if (steps[0] !== "water") ctx.addIssue({ code: "custom", path: ["order"], message: "Water comes first: nothing goes into an empty tank." });
  });
export type LoadRules = z.infer<typeof loadRulesSchema>;

export const DEFAULT_LOAD_RULES: LoadRules = {
  fiberStartPercent: 50,
  fiberDonePercent: 75,
  seedLimitMinutes: SEED_IN_TANK_MINUTES,
  fiberCeilingLbPer100Gal: DEFAULT_FIBER_CEILING_LB_PER_100_GAL,
  paceFt: DEFAULT_PACE_FT,
  order: DEFAULT_LOADING_ORDER,
};

/** The company's stored rules (null or out of date) read safely: anything unreadable falls back to the defaults. */
export function loadRulesOf(stored: unknown): LoadRules {
  const parsed = loadRulesSchema.safeParse(stored);
  return parsed.success ? parsed.data : DEFAULT_LOAD_RULES;
}
