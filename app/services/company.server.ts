import { DEFAULT_LOAD_RULES, loadRulesOf, type LoadRules } from "~/lib/field-math/load-rules";
import type { CompanySettings } from "~/lib/people/company-schema";
import { Company, User } from "./db.server";
import { reportsChanged } from "./report-cache.server";
import type { SessionUser } from "./guards.server";

export async function companySettings(user: SessionUser) {
  const company = await Company.findByPk(user.companyId, { attributes: ["name", "timeZone", "loadRules"] });
  return { name: company!.name, timeZone: company!.timeZone, loadRules: loadRulesOf(company!.loadRules ?? DEFAULT_LOAD_RULES) };
}

export async function saveCompanySettings(user: SessionUser, settings: CompanySettings) {
  await Company.update({ timeZone: settings.timeZone }, { where: { id: user.companyId } });
  await reportsChanged(user.companyId);
}

export async function saveLoadRules(user: SessionUser, rules: LoadRules) {
  await Company.update({ loadRules: rules }, { where: { id: user.companyId } });
}

/** The rules the load card works to for this person: the company's, with the person's own pace when they set one. */
export async function loadRulesFor(user: SessionUser): Promise<LoadRules> {
  return (await paceAndRules(user)).rules;
}

/** The same, saying whether the pace is the person's own (their account page offers to change it). */
export async function paceAndRules(user: SessionUser): Promise<{ rules: LoadRules; ownPace: boolean }> {
  const [company, person] = await Promise.all([
    Company.findByPk(user.companyId, { attributes: ["loadRules"] }),
    User.findByPk(user.id, { attributes: ["paceFt"] }),
  ]);
  const rules = loadRulesOf(company?.loadRules ?? null);
  return person?.paceFt ? { rules: { ...rules, paceFt: person.paceFt }, ownPace: true } : { rules, ownPace: false };
}

/** A person's own pace, or null to go back to the company's. */
export async function savePace(user: SessionUser, paceFt: number | null) {
  await User.update({ paceFt }, { where: { id: user.id } });
}
