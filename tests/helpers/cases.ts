import { randomUUID } from "node:crypto";
import type { CreationAttributes } from "sequelize";
import type { Case } from "../../db/index";

type Required = "companyId" | "rigId" | "guideVersionId" | "openedBy" | "openedAt";

/** A case row for a fixture: what the test names, everything else as a freshly opened case has it. */
export const caseRow = (c: Pick<CreationAttributes<Case>, Required> & Partial<CreationAttributes<Case>>): CreationAttributes<Case> => ({
  id: randomUUID(),
  closedAt: null,
  engineHours: null,
  finalStep: null,
  causeCode: null,
  safetyAckAt: null,
  note: null,
  ...c,
});
