import type { CompanySettings } from "~/lib/people/company-schema";
import { Company } from "./db.server";
import type { SessionUser } from "./guards.server";

export async function companySettings(user: SessionUser) {
  const company = await Company.findByPk(user.companyId, { attributes: ["name", "timeZone"] });
  return { name: company!.name, timeZone: company!.timeZone };
}

export async function saveCompanySettings(user: SessionUser, settings: CompanySettings) {
  await Company.update({ timeZone: settings.timeZone }, { where: { id: user.companyId } });
}
