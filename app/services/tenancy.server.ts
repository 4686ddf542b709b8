import { Op, type WhereOptions } from "sequelize";
import type { SessionUser } from "./guards.server";

/**
 * Company scoping, written once. Every query of company data builds its where clause here,
 * so a new query is scoped by construction and another company's ids simply are not found (404).
 */
type Tenant = Pick<SessionUser, "companyId">;

/** Rows the person's company owns, with any further conditions. */
export function ownedBy<W extends object>(user: Tenant, where?: W): W & { companyId: number } {
  return { ...(where as W), companyId: user.companyId };
}

/** Guides the company may use: the built-in library (no company) and its own. */
export function usableBy<W extends object>(user: Tenant, where?: W): WhereOptions {
  return { ...(where as W), [Op.or]: [{ companyId: null }, { companyId: user.companyId }] };
}

/** The same rule for raw SQL on the guides table under `alias`, with `:company` bound to the company's id. */
export const usableGuideSql = (alias: string) => `(${alias}.company_id IS NULL OR ${alias}.company_id = :company)`;

interface GuideRow {
  id: number;
  companyId: number | null;
  slug: string;
  basedOnGuideId: number | null;
  publishedVersion: number | null;
}

/**
 * The built-in guides a company has replaced: those its own published copy was made from, or whose
 * slug its own published guide took. Until the copy is published the crews keep the built-in.
 */
export function replacedBuiltIns(guides: GuideRow[]): Set<number> {
  const own = guides.filter((g) => g.companyId !== null && g.publishedVersion !== null);
  const basedOn = new Set(own.map((g) => g.basedOnGuideId));
  const slugs = new Set(own.map((g) => g.slug));
  return new Set(guides.filter((g) => g.companyId === null && (basedOn.has(g.id) || slugs.has(g.slug))).map((g) => g.id));
}
