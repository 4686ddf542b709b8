/**
 * The demo scenario: two invented companies, their people and rigs. Runs only on an empty
 * database, so a second `npm start` keeps whatever was changed since.
 */
import { seedServiceRules } from "./demo-service";
import { db, Company, Rig, User } from "../db/index";
import { hashPassword } from "../app/services/password.server";
import type { z } from "zod";
import { rigInputSchema } from "../app/lib/rigs/schema";
import { DEMO_PASSWORD, DEMO_PEOPLE } from "./demo-people";

const COMPANIES = [
  { slug: "cedar-flats", name: "Cedar Flats Erosion Control" },
  { slug: "blue-mesa", name: "Blue Mesa Land Works" },
] as const;

const RIGS: Record<(typeof COMPANIES)[number]["slug"], z.input<typeof rigInputSchema>[]> = {
  "cedar-flats": [
    {
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
      yardElevationFt: 420,
      nozzleTips: [
        { name: "Wide fan", reachFt: 40, widthFt: 12 },
        { name: "Narrow fan", reachFt: 70, widthFt: 6 },
      ],
      torqueSpecs: [
        { part: "Agitator bearing flange bolts", ftLb: 25 },
        { part: "Pump mount bolts", ftLb: 45 },
      ],
      notes: "Suction clamp on this one has been replaced twice.",
    },
    {
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
      yardElevationFt: 420,
      nozzleTips: [
        { name: "Wide fan", reachFt: 50, widthFt: 15 },
        { name: "Narrow fan", reachFt: 90, widthFt: 8 },
        { name: "Long range", reachFt: 150, widthFt: 4 },
      ],
      torqueSpecs: [
        { part: "Agitator bearing flange bolts", ftLb: 25 },
        { part: "Pump mount bolts", ftLb: 50 },
        { part: "Tank hold-down bolts", ftLb: 75 },
      ],
    },
    {
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
      engineHours: 980,
      hoseLengthFt: 400,
      hoseDiameterIn: 2,
      yardElevationFt: 420,
      nozzleTips: [
        { name: "Wide fan", reachFt: 60, widthFt: 18 },
        { name: "Long range", reachFt: 200, widthFt: 5 },
      ],
    },
  ],
  "blue-mesa": [
    {
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
      nozzleTips: [
        { name: "Wide fan", reachFt: 45, widthFt: 14 },
        { name: "Narrow fan", reachFt: 80, widthFt: 7 },
      ],
    },
    {
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
      nozzleTips: [{ name: "Wide fan", reachFt: 35, widthFt: 10 }],
    },
  ],
};

export async function seedDemo(log: (line: string) => void = console.log): Promise<boolean> {
  const sequelize = db();
  if ((await Company.count()) > 0) return false;
  const hash = await hashPassword(DEMO_PASSWORD);
  await sequelize.transaction(async (transaction) => {
    for (const c of COMPANIES) {
      const company = await Company.create({ ...c }, { transaction });
      const people = DEMO_PEOPLE.filter((p) => p.company === c.slug);
      await User.bulkCreate(
        people.map((p) => ({ companyId: company.id, email: p.email, name: p.name, role: p.role, passwordHash: hash })),
        { transaction },
      );
      for (const rig of RIGS[c.slug]) {
        const input = rigInputSchema.parse(rig);
        await Rig.create({ ...input, notes: input.notes ?? null, companyId: company.id }, { transaction });
      }
      await seedServiceRules(company.id, transaction);
    }
  });
  log(`Seeded the demo: ${COMPANIES.length} companies, ${DEMO_PEOPLE.length} people.`);
  return true;
}
