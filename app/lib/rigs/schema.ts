import { z } from "zod";

/** A nozzle tip as the rig records it: rated reach and pattern width, in feet. */
export const nozzleTipSchema = z.object({
  name: z.string({ error: "Name the tip." }).trim().min(1, "Name the tip.").max(60, "Keep the tip name under 60 characters."),
  reachFt: z.number({ error: "Give the rated reach in feet." }).min(1, "Reach must be at least 1 ft.").max(300, "Reach over 300 ft is not a hydroseeding tip."),
  widthFt: z.number({ error: "Give the pattern width in feet." }).min(0.5, "Width must be at least 0.5 ft.").max(100, "Width over 100 ft is not plausible."),
});

/** A tightening figure the company uses for one part of the rig. */
export const torqueSpecSchema = z.object({
  part: z.string({ error: "Name the part." }).trim().min(1, "Name the part.").max(80, "Keep the part name under 80 characters."),
  ftLb: z.number({ error: "Give the torque in ft·lb." }).min(1, "Torque must be at least 1 ft·lb.").max(2000, "Over 2,000 ft·lb is not a rig part figure."),
});

/** Which way the agitator turns when it mixes: rigs differ, and the stall guide names this rig's directions. */
export const AGITATOR_DIRECTIONS = ["forward", "reverse"] as const;
export type AgitatorDirection = (typeof AGITATOR_DIRECTIONS)[number];

/** A figure from the pump's plate or curve that may not be known yet (blank is "not known"). */
const pumpFigure = (what: string, min: number, max: number, unit: string) =>
  z
    .number({ error: `Give the ${what} in ${unit}, or leave it blank.` })
    .min(min, `The ${what} must be at least ${min} ${unit}.`)
    .max(max, `The ${what} over ${max.toLocaleString("en-US")} ${unit} is not a hydroseeding pump.`)
    .nullable()
    .optional()
    .transform((v) => v ?? null);

/** The one definition of a rig's editable fields: forms, API and seeds all use it. */
export const rigInputSchema = z.object({
  code: z
    .string({ error: "Give the rig a unit code, like CF-07." })
    .trim()
    .toUpperCase()
    .regex(/^[A-Z0-9]{1,6}(-[A-Z0-9]{1,6})?$/, "Use letters and digits with at most one dash, like CF-07."),
  name: z.string({ error: "Name the rig." }).trim().min(1, "Name the rig.").max(120, "Keep the name under 120 characters."),
  mount: z.enum(["truck", "trailer"], { error: "Choose truck or trailer." }),
  tankGal: z
    .number({ error: "Give the tank size in US gallons." })
    .int("Tank size is a whole number of gallons.")
    .min(100, "A tank under 100 gal is not a hydroseeding rig.")
    .max(6000, "A tank over 6,000 gal is not plausible."),
  pumpKind: z.string({ error: "Say what pump it has." }).trim().min(1, "Say what pump it has.").max(120, "Keep it under 120 characters."),
  hasHourMeter: z.boolean().default(false),
  engineHours: z
    .number({ error: "Give the engine hours (0 if unknown)." })
    .min(0, "Engine hours cannot be negative.")
    .max(100_000, "Over 100,000 engine hours is not plausible."),
  hoseLengthFt: z
    .number({ error: "Give the hose carried, in feet." })
    .int("Hose length is a whole number of feet.")
    .min(0, "Hose length cannot be negative.")
    .max(2000, "Over 2,000 ft of hose is not plausible."),
  hoseDiameterIn: z
    .number({ error: "Give the hose inside diameter in inches." })
    .min(0.75, "Hose under ¾ in is not a slurry hose.")
    .max(4, "Hose over 4 in is not a slurry hose."),
  yardElevationFt: z
    .number({ error: "Give the yard elevation in feet (0 for sea level)." })
    .int("Elevation is a whole number of feet.")
    .min(-300, "Elevation below −300 ft is not plausible.")
    .max(14_000, "Elevation above 14,000 ft is not plausible."),
  agitatorMixes: z.enum(AGITATOR_DIRECTIONS, { error: "Choose which way the agitator turns when it mixes: forward or reverse." }).default("forward"),
  pumpRatedGpm: pumpFigure("pump's rated flow", 5, 2000, "gpm"),
  pumpRatedPsi: pumpFigure("pump's rated pressure", 5, 500, "psi"),
  pumpNpshrFt: pumpFigure("suction the pump needs", 0, 60, "ft"),
  carrierRatingLb: z
    .number({ error: "Give what the truck or trailer is rated to carry, in lb, or leave it blank." })
    .int("Give whole pounds.")
    .min(500, "A carrier rated under 500 lb is not plausible.")
    .max(80_000, "Over 80,000 lb is not a hydroseeding carrier.")
    .nullable()
    .optional()
    .transform((v) => v ?? null),
  nozzleTips: z.array(nozzleTipSchema).max(8, "Record at most 8 tips.").default([]),
  torqueSpecs: z.array(torqueSpecSchema).max(20, "Record at most 20 torque figures.").default([]),
  notes: z.string().trim().max(2000, "Keep notes under 2,000 characters.").optional(),
});

export type RigInput = z.infer<typeof rigInputSchema>;
export type NozzleTipInput = z.infer<typeof nozzleTipSchema>;
export type TorqueSpecInput = z.infer<typeof torqueSpecSchema>;
