import { lowestRole } from "~/lib/permissions";
import { User } from "./db.server";

/**
 * Who is told about a company's hand-offs and digests: the people whose role first takes hand-offs
 * (supervisors), or the company's admins when it has none. Signed-off people get nothing.
 */
export async function supervisorsOf(companyId: number): Promise<{ name: string; email: string }[]> {
  const find = (role: "supervisor" | "admin") => User.findAll({ where: { companyId, role, accessRemovedAt: null }, attributes: ["name", "email"] });
  const people = await find(lowestRole("resolve-handoffs") as "supervisor");
  return (people.length ? people : await find("admin")).map((p) => ({ name: p.name, email: p.email }));
}
