/**
 * The demo scenario: two invented companies, their people and rigs (the fleet: demo-fleet.ts). Runs only on an empty
 * database, so a second `npm start` keeps whatever was changed since.
 */
import { seedServiceRules } from "./demo-service";
import { db, Company, Rig, User } from "../db/index";
import { hashPassword } from "../app/services/password.server";
import { rigInputSchema } from "../app/lib/rigs/schema";
import { FLEET } from "./demo-fleet";
import { DEMO_PASSWORD, DEMO_PEOPLE } from "./demo-people";

const COMPANIES = [
  { slug: "cedar-flats", name: "Cedar Flats Erosion Control" },
  { slug: "blue-mesa", name: "Blue Mesa Land Works" },
] as const;

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
      for (const { spec } of FLEET[c.slug]) {
        const input = rigInputSchema.parse(spec);
        await Rig.create({ ...input, notes: input.notes ?? null, companyId: company.id }, { transaction });
      }
      await seedServiceRules(company.id, transaction);
    }
  });
  log(`Seeded the demo: ${COMPANIES.length} companies, ${DEMO_PEOPLE.length} people.`);
  return true;
}
