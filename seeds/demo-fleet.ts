/**
 * The demo fleet: each invented rig's specs and how it behaves over two seasons. Every figure here
 * is invented for the demo unless a comment names where it comes from; the rates are chosen so the
 * board reads like a working fleet (see each field), not measured from any real fleet. A rig's
 * `engineHours` is its meter today: the history runs its days backwards from it.
 */
import type { z } from "zod";
import type { rigInputSchema } from "../app/lib/rigs/schema";

export type CompanySlug = "cedar-flats" | "blue-mesa";

export interface RigBehaviour {
  /** Share of the company's busy days this rig works (invented; sets its engine hours per season). */
  use: number;
  /**
   * Faults per 100 engine hours before care and site (invented). Hydroseeding rigs in fair shape
   * see a few faults per hundred hours (common practice: more than a handful and the rig is in the
   * shop); the old truck is kept clearly worse so the board has something to find.
   */
  per100h: number;
  /** Bought before the second season: it works that season only. */
  boughtInSecondSeason?: boolean;
  /** Guides it tends to need, weighted. */
  favourites: [string, number][];
  /** A cause it keeps coming back with: [guide, end step, share of that guide's faults]. */
  repeatEnd?: [string, string, number];
  /** Chance on a worked day of a pre-start, of its grease item left undone, of the shut-down card, of the Monday service (invented habits). */
  care: { preStart: number; greaseSkip: number; shutDown: number; weekly: number };
}

export interface DemoRig {
  spec: z.input<typeof rigInputSchema>;
  behaviour: RigBehaviour;
}

const tips = (...t: [string, number, number][]) => t.map(([name, reachFt, widthFt]) => ({ name, reachFt, widthFt }));

/** Cedar Flats: a valley outfit (yard at 2,740 ft) with nine rigs of mixed sizes and ages, and a little winter work in dry spells. */
const CEDAR_FLATS: DemoRig[] = [
  {
    spec: {
      code: "CF-01",
      name: "Skid One",
      mount: "trailer",
      tankGal: 300,
      pumpKind: "Centrifugal 1.5 in, belt clutch",
      agitatorMixes: "forward",
      pumpRatedGpm: 80,
      pumpRatedPsi: 70,
      pumpNpshrFt: 7,
      carrierRatingLb: 5200,
      hasHourMeter: true,
      engineHours: 2280,
      hoseLengthFt: 150,
      hoseDiameterIn: 1.25,
      yardElevationFt: 2740,
      nozzleTips: tips(["Wide fan", 30, 8]),
      notes: "Small jobs and touch-ups; lawns and ditches.",
    },
    behaviour: {
      use: 0.45,
      per100h: 2.6,
      favourites: [
        ["plugging", 3],
        ["pump-not-turning", 2],
      ],
      care: { preStart: 0.9, greaseSkip: 0.05, shutDown: 0.85, weekly: 0.8 },
    },
  },
  {
    spec: {
      code: "CF-02",
      name: "Little Red",
      mount: "trailer",
      tankGal: 600,
      pumpKind: "Centrifugal 2 in, manual clutch",
      agitatorMixes: "forward",
      pumpRatedGpm: 140,
      pumpRatedPsi: 75,
      pumpNpshrFt: 8,
      carrierRatingLb: 9800,
      hasHourMeter: true,
      engineHours: 4415,
      hoseLengthFt: 200,
      hoseDiameterIn: 1.5,
      yardElevationFt: 2740,
      nozzleTips: tips(["Wide fan", 35, 10], ["Narrow fan", 60, 5]),
    },
    behaviour: {
      use: 0.55,
      per100h: 3.0,
      favourites: [
        ["vibration", 2],
        ["leaks", 2],
        ["agitator-stall", 1],
      ],
      care: { preStart: 0.86, greaseSkip: 0.06, shutDown: 0.85, weekly: 0.8 },
    },
  },
  {
    spec: {
      code: "CF-03",
      name: "Old Blue",
      mount: "truck",
      tankGal: 800,
      pumpKind: "Centrifugal 2 in, belt clutch",
      agitatorMixes: "forward",
      pumpRatedGpm: 150,
      pumpRatedPsi: 80,
      pumpNpshrFt: 8,
      carrierRatingLb: 14000,
      hasHourMeter: true,
      engineHours: 4120,
      hoseLengthFt: 200,
      hoseDiameterIn: 1.5,
      yardElevationFt: 2740,
      nozzleTips: tips(["Wide fan", 40, 12], ["Narrow fan", 70, 6]),
      torqueSpecs: [
        { part: "Agitator bearing flange bolts", ftLb: 25 },
        { part: "Pump mount bolts", ftLb: 45 },
      ],
      notes: "Suction clamp on this one has been replaced twice.",
    },
    behaviour: {
      use: 0.75,
      per100h: 4.8,
      favourites: [
        ["lost-prime", 5],
        ["leaks", 3],
        ["plugging", 2],
      ],
      repeatEnd: ["lost-prime", "fixed-air-leak", 0.55],
      care: { preStart: 0.55, greaseSkip: 0.2, shutDown: 0.75, weekly: 0.6 },
    },
  },
  {
    spec: {
      code: "CF-05",
      name: "Fiver",
      mount: "truck",
      tankGal: 1000,
      pumpKind: "Centrifugal 3 in, electric clutch",
      agitatorMixes: "forward",
      pumpRatedGpm: 200,
      pumpRatedPsi: 90,
      pumpNpshrFt: 9,
      carrierRatingLb: 17500,
      hasHourMeter: true,
      engineHours: 3610,
      hoseLengthFt: 250,
      hoseDiameterIn: 1.5,
      yardElevationFt: 2740,
      nozzleTips: tips(["Wide fan", 45, 14], ["Narrow fan", 75, 7]),
    },
    behaviour: {
      use: 0.8,
      per100h: 2.8,
      favourites: [
        ["short-throw", 2],
        ["plugging", 2],
        ["foaming", 1],
      ],
      care: { preStart: 0.88, greaseSkip: 0.06, shutDown: 0.9, weekly: 0.85 },
    },
  },
  {
    spec: {
      code: "CF-07",
      name: "Trailer Seven",
      mount: "trailer",
      tankGal: 1500,
      pumpKind: "Centrifugal 3 in, electric clutch",
      agitatorMixes: "reverse",
      pumpRatedGpm: 250,
      pumpRatedPsi: 100,
      pumpNpshrFt: 10,
      carrierRatingLb: 21000,
      hasHourMeter: true,
      engineHours: 2310.5,
      hoseLengthFt: 300,
      hoseDiameterIn: 1.5,
      yardElevationFt: 2740,
      nozzleTips: tips(["Wide fan", 50, 15], ["Narrow fan", 90, 8], ["Long range", 150, 4]),
      torqueSpecs: [
        { part: "Agitator bearing flange bolts", ftLb: 25 },
        { part: "Pump mount bolts", ftLb: 50 },
        { part: "Tank hold-down bolts", ftLb: 75 },
      ],
    },
    behaviour: {
      use: 0.85,
      per100h: 3.0,
      favourites: [
        ["short-throw", 3],
        ["plugging", 2],
        ["slurry-too-thick", 2],
      ],
      care: { preStart: 0.88, greaseSkip: 0.06, shutDown: 0.9, weekly: 0.85 },
    },
  },
  {
    spec: {
      code: "CF-08",
      name: "Eight Ball",
      mount: "truck",
      tankGal: 1500,
      pumpKind: "Centrifugal 3 in, hydraulic drive",
      agitatorMixes: "reverse",
      pumpRatedGpm: 250,
      pumpRatedPsi: 100,
      pumpNpshrFt: 10,
      carrierRatingLb: 23500,
      hasHourMeter: true,
      engineHours: 3290,
      hoseLengthFt: 300,
      hoseDiameterIn: 1.5,
      yardElevationFt: 2740,
      nozzleTips: tips(["Wide fan", 50, 15], ["Narrow fan", 90, 8]),
    },
    behaviour: {
      use: 0.85,
      per100h: 2.5,
      favourites: [
        ["hydraulic-drive", 2],
        ["short-throw", 2],
        ["foaming", 1],
      ],
      care: { preStart: 0.9, greaseSkip: 0.05, shutDown: 0.9, weekly: 0.85 },
    },
  },
  {
    spec: {
      code: "CF-09",
      name: "Niner",
      mount: "truck",
      tankGal: 2000,
      pumpKind: "Centrifugal 4 in, electric clutch",
      agitatorMixes: "reverse",
      pumpRatedGpm: 320,
      pumpRatedPsi: 110,
      pumpNpshrFt: 11,
      carrierRatingLb: 28000,
      hasHourMeter: true,
      engineHours: 2385,
      hoseLengthFt: 350,
      hoseDiameterIn: 2,
      yardElevationFt: 2740,
      nozzleTips: tips(["Wide fan", 55, 16], ["Long range", 170, 5]),
    },
    behaviour: {
      use: 0.8,
      per100h: 2.2,
      favourites: [
        ["plugging", 2],
        ["agitator-stall", 1],
        ["short-throw", 1],
      ],
      care: { preStart: 0.92, greaseSkip: 0.04, shutDown: 0.92, weekly: 0.9 },
    },
  },
  {
    spec: {
      code: "CF-11",
      name: "Big Cedar",
      mount: "truck",
      tankGal: 3000,
      pumpKind: "Centrifugal 4 in, electric clutch",
      agitatorMixes: "reverse",
      pumpRatedGpm: 400,
      pumpRatedPsi: 120,
      pumpNpshrFt: 12,
      carrierRatingLb: 33000,
      hasHourMeter: true,
      engineHours: 1650,
      hoseLengthFt: 400,
      hoseDiameterIn: 2,
      yardElevationFt: 2740,
      nozzleTips: tips(["Wide fan", 60, 18], ["Long range", 200, 5]),
    },
    behaviour: {
      use: 0.8,
      per100h: 1.6,
      favourites: [
        ["foaming", 2],
        ["short-throw", 2],
      ],
      care: { preStart: 0.96, greaseSkip: 0.02, shutDown: 0.95, weekly: 0.95 },
    },
  },
  {
    spec: {
      code: "CF-12",
      name: "New Cedar",
      mount: "truck",
      tankGal: 3300,
      pumpKind: "Centrifugal 4 in, electric clutch",
      agitatorMixes: "reverse",
      pumpRatedGpm: 450,
      pumpRatedPsi: 125,
      pumpNpshrFt: 12,
      carrierRatingLb: 36000,
      hasHourMeter: true,
      engineHours: 640,
      hoseLengthFt: 400,
      hoseDiameterIn: 2,
      yardElevationFt: 2740,
      nozzleTips: tips(["Wide fan", 60, 18], ["Long range", 210, 5]),
      notes: "Bought this spring.",
    },
    behaviour: {
      use: 0.62,
      per100h: 1.5,
      boughtInSecondSeason: true,
      favourites: [
        ["foaming", 2],
        ["valve-trouble", 1],
      ],
      care: { preStart: 0.95, greaseSkip: 0.02, shutDown: 0.95, weekly: 0.9 },
    },
  },
];

/** Blue Mesa: a high-desert outfit (yard at 6,100 ft) with four rigs, idle through the winter. */
const BLUE_MESA: DemoRig[] = [
  {
    spec: {
      code: "BM-01",
      name: "Mesa One",
      mount: "truck",
      tankGal: 1200,
      pumpKind: "Centrifugal 3 in, electric clutch",
      agitatorMixes: "forward",
      pumpRatedGpm: 250,
      pumpRatedPsi: 100,
      pumpNpshrFt: 10,
      carrierRatingLb: 24000,
      hasHourMeter: true,
      engineHours: 3050,
      hoseLengthFt: 300,
      hoseDiameterIn: 1.5,
      yardElevationFt: 6100,
      nozzleTips: tips(["Wide fan", 45, 14], ["Narrow fan", 80, 7]),
    },
    behaviour: {
      use: 0.9,
      per100h: 4.8,
      favourites: [
        ["foaming", 4],
        ["agitator-stall", 2],
        ["lost-prime", 2],
      ],
      care: { preStart: 0.82, greaseSkip: 0.08, shutDown: 0.85, weekly: 0.8 },
    },
  },
  {
    spec: {
      code: "BM-02",
      name: "Mesa Two",
      mount: "trailer",
      tankGal: 600,
      pumpKind: "Centrifugal 2 in, manual clutch",
      agitatorMixes: "forward",
      pumpRatedGpm: 140,
      pumpRatedPsi: 75,
      pumpNpshrFt: 8,
      hasHourMeter: false,
      engineHours: 0,
      hoseLengthFt: 150,
      hoseDiameterIn: 1.25,
      yardElevationFt: 6100,
      nozzleTips: tips(["Wide fan", 35, 10]),
    },
    behaviour: {
      use: 0.6,
      per100h: 3.0,
      favourites: [
        ["vibration", 3],
        ["leaks", 2],
      ],
      care: { preStart: 0.9, greaseSkip: 0.05, shutDown: 0.9, weekly: 0.85 },
    },
  },
  {
    spec: {
      code: "BM-03",
      name: "Mesa Three",
      mount: "trailer",
      tankGal: 900,
      pumpKind: "Centrifugal 2 in, electric clutch",
      agitatorMixes: "forward",
      pumpRatedGpm: 160,
      pumpRatedPsi: 85,
      pumpNpshrFt: 8,
      carrierRatingLb: 15000,
      hasHourMeter: true,
      engineHours: 2960,
      hoseLengthFt: 200,
      hoseDiameterIn: 1.5,
      yardElevationFt: 6100,
      nozzleTips: tips(["Wide fan", 40, 12], ["Narrow fan", 70, 6]),
    },
    behaviour: {
      use: 0.7,
      per100h: 2.5,
      favourites: [
        ["plugging", 2],
        ["lost-prime", 2],
      ],
      care: { preStart: 0.88, greaseSkip: 0.05, shutDown: 0.88, weekly: 0.85 },
    },
  },
  {
    spec: {
      code: "BM-04",
      name: "Mesa Four",
      mount: "truck",
      tankGal: 1800,
      pumpKind: "Centrifugal 3 in, hydraulic drive",
      agitatorMixes: "reverse",
      pumpRatedGpm: 300,
      pumpRatedPsi: 110,
      pumpNpshrFt: 11,
      carrierRatingLb: 27000,
      hasHourMeter: true,
      engineHours: 1710,
      hoseLengthFt: 300,
      hoseDiameterIn: 2,
      yardElevationFt: 6100,
      nozzleTips: tips(["Wide fan", 55, 16], ["Long range", 160, 5]),
    },
    behaviour: {
      use: 0.85,
      per100h: 2.0,
      favourites: [
        ["hydraulic-drive", 2],
        ["short-throw", 2],
      ],
      care: { preStart: 0.93, greaseSkip: 0.03, shutDown: 0.92, weekly: 0.9 },
    },
  },
];

export const FLEET: Record<CompanySlug, DemoRig[]> = { "cedar-flats": CEDAR_FLATS, "blue-mesa": BLUE_MESA };
export const behaviourOf = (code: string) => [...CEDAR_FLATS, ...BLUE_MESA].find((r) => r.spec.code === code)?.behaviour;
