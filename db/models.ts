import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";
import { AGITATOR_DIRECTIONS, type AgitatorDirection } from "../app/lib/rigs/schema";

import type { Guide } from "../app/lib/guides/schema";
import { ROLES, type Role } from "../app/lib/people/roles";
import { ANSWERS, CASE_KINDS, OUTCOMES, VERSION_STATUSES, type Answer, type CaseKind, type Outcome, type VersionStatus } from "../app/lib/vocabulary";
import type { ServiceTask } from "../app/lib/guides/kinds";
import type { JobMaterial } from "../app/lib/jobs/schema";

export { ROLES, type Role };

export interface NozzleTip {
  name: string;
  reachFt: number;
  widthFt: number;
}

export interface TorqueSpec {
  part: string;
  ftLb: number;
}

export class Company extends Model<InferAttributes<Company>, InferCreationAttributes<Company>> {
  declare id: CreationOptional<number>;
  declare name: string;
  declare slug: string;
  /** IANA zone the company works in: screens, mail and the digest show its local times. */
  declare timeZone: CreationOptional<string>;
  /** The company's loading rules for the load card; null until an admin sets them (the defaults apply). */
  declare loadRules: CreationOptional<Record<string, unknown> | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export class User extends Model<InferAttributes<User>, InferCreationAttributes<User>> {
  declare id: CreationOptional<number>;
  declare companyId: ForeignKey<Company["id"]>;
  declare email: string;
  declare name: string;
  declare passwordHash: string;
  declare role: Role;
  /** Set when an admin turns the person's sign-in off. */
  declare accessRemovedAt: CreationOptional<Date | null>;
  /** The person's own walking pace, for strips paced out on a slope; null takes the company's. */
  declare paceFt: CreationOptional<number | null>;
  /** "en" or "es"; null until the first sign-in takes it from the browser. */
  declare language: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

/** A signed-in device: the cookie holds the id, this row only its hash. */
export class SessionRecord extends Model<InferAttributes<SessionRecord>, InferCreationAttributes<SessionRecord>> {
  declare idHash: string;
  declare userId: number;
  declare userAgent: string | null;
  declare createdAt: Date;
  declare lastSeenAt: Date;
  declare expiresAt: Date;
}

export class PasswordReset extends Model<InferAttributes<PasswordReset>, InferCreationAttributes<PasswordReset>> {
  declare id: CreationOptional<number>;
  declare userId: ForeignKey<User["id"]>;
  declare tokenHash: string;
  declare expiresAt: Date;
  declare usedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export class Invite extends Model<InferAttributes<Invite>, InferCreationAttributes<Invite>> {
  declare id: CreationOptional<number>;
  declare companyId: ForeignKey<Company["id"]>;
  declare email: string;
  declare name: string;
  declare role: Role;
  declare tokenHash: string;
  declare invitedBy: number | null;
  declare expiresAt: Date;
  declare acceptedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export class Rig extends Model<InferAttributes<Rig>, InferCreationAttributes<Rig>> {
  declare id: CreationOptional<number>;
  declare companyId: ForeignKey<Company["id"]>;
  declare code: string;
  declare name: string;
  declare mount: "truck" | "trailer";
  declare tankGal: number;
  declare pumpKind: string;
  declare hasHourMeter: CreationOptional<boolean>;
  declare engineHours: CreationOptional<number>;
  declare hoseLengthFt: number;
  declare hoseDiameterIn: number;
  declare yardElevationFt: CreationOptional<number>;
  declare agitatorMixes: CreationOptional<AgitatorDirection>;
  declare pumpRatedGpm: number | null;
  declare pumpRatedPsi: number | null;
  declare pumpNpshrFt: number | null;
  declare carrierRatingLb: number | null;
  declare nozzleTips: NozzleTip[];
  declare torqueSpecs: CreationOptional<TorqueSpec[]>;
  declare notes: string | null;
  declare retired: CreationOptional<boolean>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export type GuideStatus = VersionStatus;

/** A guide's identity: built-in (companyId null) or a company's own. Its steps live in versions. */
export class GuideRecord extends Model<InferAttributes<GuideRecord>, InferCreationAttributes<GuideRecord>> {
  declare id: CreationOptional<number>;
  declare companyId: number | null;
  declare scope: string;
  declare slug: string;
  declare title: string;
  declare publishedVersion: number | null;
  declare basedOnGuideId: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

/** One numbered version of a guide; a published one is never changed, only retired. */
export class GuideVersion extends Model<InferAttributes<GuideVersion>, InferCreationAttributes<GuideVersion>> {
  declare id: CreationOptional<number>;
  declare guideId: ForeignKey<GuideRecord["id"]>;
  declare number: number;
  declare status: GuideStatus;
  declare definition: Guide;
  declare sourceHash: string;
  declare authorId: number | null;
  declare reviewerId: number | null;
  declare changeNote: string | null;
  declare reviewComment: string | null;
  declare publishedAt: Date | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export type CaseOutcome = Outcome;

/** One walk-through on one rig; it keeps the guide version it started with. */
export class Case extends Model<InferAttributes<Case>, InferCreationAttributes<Case>> {
  declare id: string;
  declare companyId: number;
  declare rigId: number;
  declare guideVersionId: number;
  declare openedBy: number | null;
  declare openedAt: Date;
  declare closedAt: Date | null;
  declare engineHours: number | null;
  declare outcome: CreationOptional<CaseOutcome>;
  declare finalStep: string | null;
  declare causeCode: string | null;
  declare safetyAckAt: Date | null;
  declare note: string | null;
  declare handoffResolvedAt: CreationOptional<Date | null>;
  declare handoffResolvedBy: CreationOptional<number | null>;
  declare handoffResolvedNote: CreationOptional<string | null>;
  /** When the hand-off mail left and to whom (names): set once, so the mail goes once. */
  declare handoffMailedAt: CreationOptional<Date | null>;
  declare handoffMailedTo: CreationOptional<string | null>;
  /** A fix (a guide walked for a fault) or a rig card (a routine walked); only fixes count as faults. */
  declare kind: CreationOptional<CaseKind>;
  /** The card a fix was opened from (an item answered "no" that opens a guide). */
  declare fromCaseId: CreationOptional<string | null>;
  /** On a closed card: items on its path answered "can't do it" (0: complete). */
  declare cardGaps: CreationOptional<number | null>;
  /** The job its rig was on that day (the company's calendar), if any. */
  declare jobId: CreationOptional<number | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

/** One answer in a walk-through; `seq` orders them, the phone-made id makes resends harmless. */
export class CaseEvent extends Model<InferAttributes<CaseEvent>, InferCreationAttributes<CaseEvent>> {
  declare id: string;
  declare caseId: string;
  declare seq: number;
  declare stepId: string;
  declare answer: Answer;
  declare at: Date;
  declare note: string | null;
  declare createdAt: CreationOptional<Date>;
}

export class CasePhoto extends Model<InferAttributes<CasePhoto>, InferCreationAttributes<CasePhoto>> {
  declare id: CreationOptional<number>;
  declare caseId: string;
  declare stepId: string | null;
  declare storageKey: string;
  declare contentType: string;
  declare bytes: number;
  declare uploadedBy: number | null;
  /** The phone's name for the photo, so a resend is stored once (null for older photos). */
  declare phoneId: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export const guideScope = (companyId: number | null) => (companyId === null ? "builtin" : `c${companyId}`);

const id = { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true };
const timestamps = { createdAt: DataTypes.DATE, updatedAt: DataTypes.DATE };
// DECIMAL columns arrive from the driver as strings; the app wants numbers.
const decimal = (precision: number, scale: number, field: string) => ({
  type: DataTypes.DECIMAL(precision, scale),
  get(this: Model) {
    const raw = this.getDataValue(field as never) as unknown;
    return raw === null || raw === undefined ? raw : Number(raw);
  },
});

/** A rig's routine service rule: every so many engine hours, days, or whichever comes first. */
export class ServiceRule extends Model<InferAttributes<ServiceRule>, InferCreationAttributes<ServiceRule>> {
  declare id: CreationOptional<number>;
  declare companyId: number;
  declare rigId: number;
  declare name: string;
  declare everyHours: number | null;
  declare everyDays: number | null;
  /** The card task that records this service when done on a card (null: recorded by hand only). */
  declare task: CreationOptional<ServiceTask | null>;
  declare retired: CreationOptional<boolean>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

/** One time a service was done, with the hour meter as read then (null on a rig with no meter). */
export class ServiceRecord extends Model<InferAttributes<ServiceRecord>, InferCreationAttributes<ServiceRecord>> {
  declare id: CreationOptional<number>;
  declare companyId: number;
  declare rigId: number;
  declare ruleId: number;
  declare doneAt: Date;
  declare engineHours: number | null;
  declare doneBy: number | null;
  declare note: string | null;
  /** The card it was recorded on, if any. */
  declare caseId: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
}

/** A job: a site, its customer and spec, and its dates; rigs and people are put on it by day (JobDay). */
export class Job extends Model<InferAttributes<Job>, InferCreationAttributes<Job>> {
  declare id: CreationOptional<number>;
  declare companyId: number;
  declare name: string;
  declare customer: string;
  declare address: string | null;
  declare latitude: number | null;
  declare longitude: number | null;
  declare elevationFt: number | null;
  declare areaAcres: number;
  declare passes: number;
  declare waterGalPerAcre: number | null;
  declare materials: JobMaterial[];
  /** Calendar days in the company's zone (YYYY-MM-DD). */
  declare startsOn: string;
  declare endsOn: string | null;
  declare closedAt: CreationOptional<Date | null>;
  declare notes: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

/** One rig or one person on a job on one day (at most one job per rig, and per person, per day). */
export class JobDay extends Model<InferAttributes<JobDay>, InferCreationAttributes<JobDay>> {
  declare id: CreationOptional<number>;
  declare companyId: number;
  declare jobId: number;
  declare day: string;
  declare rigId: number | null;
  declare userId: number | null;
}

/** One load sprayed on a job; the phone's own id makes a resend harmless. */
export class JobLoad extends Model<InferAttributes<JobLoad>, InferCreationAttributes<JobLoad>> {
  declare id: string;
  declare companyId: number;
  declare jobId: number;
  declare rigId: number | null;
  declare sprayedBy: number | null;
  declare sprayedAt: Date;
  declare areaSqFt: number;
  declare waterGal: number;
  declare createdAt: CreationOptional<Date>;
}

/** Binds every model to the one Sequelize instance. Called once, by db/index.ts. */
export function initModels(sequelize: Sequelize) {
  Company.init(
    {
      id,
      name: DataTypes.STRING(120),
      slug: DataTypes.STRING(60),
      timeZone: { type: DataTypes.STRING(64), defaultValue: "America/Denver" },
      loadRules: DataTypes.JSON,
      ...timestamps,
    },
    { sequelize, tableName: "companies" },
  );
  User.init(
    {
      id,
      email: DataTypes.STRING(254),
      name: DataTypes.STRING(120),
      passwordHash: DataTypes.STRING(100),
      role: DataTypes.ENUM(...ROLES),
      accessRemovedAt: DataTypes.DATE,
      paceFt: decimal(3, 1, "paceFt"),
      language: DataTypes.STRING(5),
      ...timestamps,
    },
    { sequelize, tableName: "users" },
  );
  SessionRecord.init(
    {
      idHash: { type: DataTypes.CHAR(64), primaryKey: true },
      userId: DataTypes.INTEGER.UNSIGNED,
      userAgent: DataTypes.STRING(200),
      createdAt: DataTypes.DATE(3),
      lastSeenAt: DataTypes.DATE(3),
      expiresAt: DataTypes.DATE(3),
    },
    { sequelize, tableName: "sessions", timestamps: false },
  );
  PasswordReset.init(
    { id, tokenHash: DataTypes.CHAR(64), expiresAt: DataTypes.DATE, usedAt: DataTypes.DATE, ...timestamps },
    { sequelize, tableName: "password_resets" },
  );
  Invite.init(
    {
      id,
      email: DataTypes.STRING(254),
      name: DataTypes.STRING(120),
      role: DataTypes.ENUM(...ROLES),
      tokenHash: DataTypes.CHAR(64),
      invitedBy: DataTypes.INTEGER.UNSIGNED,
      expiresAt: DataTypes.DATE,
      acceptedAt: DataTypes.DATE,
      ...timestamps,
    },
    { sequelize, tableName: "invites" },
  );
  Rig.init(
    {
      id,
      code: DataTypes.STRING(16),
      name: DataTypes.STRING(120),
      mount: DataTypes.ENUM("truck", "trailer"),
      tankGal: DataTypes.INTEGER.UNSIGNED,
      pumpKind: DataTypes.STRING(120),
      hasHourMeter: { type: DataTypes.BOOLEAN, defaultValue: true },
      engineHours: { ...decimal(8, 1, "engineHours"), defaultValue: 0 },
      hoseLengthFt: DataTypes.INTEGER.UNSIGNED,
      hoseDiameterIn: decimal(4, 2, "hoseDiameterIn"),
      yardElevationFt: { type: DataTypes.INTEGER, defaultValue: 0 },
      agitatorMixes: { type: DataTypes.ENUM(...AGITATOR_DIRECTIONS), defaultValue: "forward" },
      pumpRatedGpm: decimal(6, 1, "pumpRatedGpm"),
      pumpRatedPsi: decimal(5, 1, "pumpRatedPsi"),
      pumpNpshrFt: decimal(4, 1, "pumpNpshrFt"),
      carrierRatingLb: DataTypes.INTEGER.UNSIGNED,
      nozzleTips: DataTypes.JSON,
      torqueSpecs: { type: DataTypes.JSON, defaultValue: [] },
      notes: DataTypes.TEXT,
      retired: { type: DataTypes.BOOLEAN, defaultValue: false },
      ...timestamps,
    },
    { sequelize, tableName: "rigs" },
  );

  GuideRecord.init(
    {
      id,
      companyId: DataTypes.INTEGER.UNSIGNED,
      scope: DataTypes.STRING(20),
      slug: DataTypes.STRING(80),
      title: DataTypes.STRING(120),
      publishedVersion: DataTypes.INTEGER.UNSIGNED,
      basedOnGuideId: DataTypes.INTEGER.UNSIGNED,
      ...timestamps,
    },
    { sequelize, tableName: "guides" },
  );
  GuideVersion.init(
    {
      id,
      number: DataTypes.INTEGER.UNSIGNED,
      status: DataTypes.ENUM(...VERSION_STATUSES),
      definition: DataTypes.JSON,
      sourceHash: DataTypes.CHAR(64),
      authorId: DataTypes.INTEGER.UNSIGNED,
      reviewerId: DataTypes.INTEGER.UNSIGNED,
      changeNote: DataTypes.TEXT,
      reviewComment: DataTypes.TEXT,
      publishedAt: DataTypes.DATE,
      ...timestamps,
    },
    { sequelize, tableName: "guide_versions" },
  );

  Case.init(
    {
      id: { type: DataTypes.CHAR(36), primaryKey: true },
      companyId: DataTypes.INTEGER.UNSIGNED,
      rigId: DataTypes.INTEGER.UNSIGNED,
      guideVersionId: DataTypes.INTEGER.UNSIGNED,
      openedBy: DataTypes.INTEGER.UNSIGNED,
      openedAt: DataTypes.DATE(3),
      closedAt: DataTypes.DATE(3),
      engineHours: decimal(8, 1, "engineHours"),
      outcome: { type: DataTypes.ENUM(...OUTCOMES), defaultValue: "open" },
      finalStep: DataTypes.STRING(80),
      causeCode: DataTypes.STRING(60),
      safetyAckAt: DataTypes.DATE(3),
      note: DataTypes.TEXT,
      handoffResolvedAt: DataTypes.DATE(3),
      handoffResolvedBy: DataTypes.INTEGER.UNSIGNED,
      handoffResolvedNote: DataTypes.STRING(1000),
      handoffMailedAt: DataTypes.DATE(3),
      handoffMailedTo: DataTypes.STRING(1000),
      kind: { type: DataTypes.ENUM(...CASE_KINDS), defaultValue: "fix" },
      fromCaseId: DataTypes.CHAR(36),
      cardGaps: DataTypes.TINYINT.UNSIGNED,
      jobId: DataTypes.INTEGER.UNSIGNED,
      ...timestamps,
    },
    { sequelize, tableName: "cases" },
  );
  CaseEvent.init(
    {
      id: { type: DataTypes.CHAR(36), primaryKey: true },
      caseId: DataTypes.CHAR(36),
      seq: DataTypes.INTEGER.UNSIGNED,
      stepId: DataTypes.STRING(80),
      answer: DataTypes.ENUM(...ANSWERS),
      at: DataTypes.DATE(3),
      note: DataTypes.TEXT,
      createdAt: DataTypes.DATE,
    },
    { sequelize, tableName: "case_events", updatedAt: false },
  );
  CasePhoto.init(
    {
      id,
      caseId: DataTypes.CHAR(36),
      stepId: DataTypes.STRING(80),
      storageKey: DataTypes.STRING(255),
      contentType: DataTypes.STRING(60),
      bytes: DataTypes.INTEGER.UNSIGNED,
      uploadedBy: DataTypes.INTEGER.UNSIGNED,
      phoneId: DataTypes.CHAR(36),
      ...timestamps,
    },
    { sequelize, tableName: "case_photos" },
  );

  ServiceRule.init(
    {
      id,
      companyId: DataTypes.INTEGER.UNSIGNED,
      rigId: DataTypes.INTEGER.UNSIGNED,
      name: DataTypes.STRING(80),
      everyHours: decimal(6, 1, "everyHours"),
      everyDays: DataTypes.INTEGER.UNSIGNED,
      task: DataTypes.STRING(40),
      retired: { type: DataTypes.BOOLEAN, defaultValue: false },
      ...timestamps,
    },
    { sequelize, tableName: "service_rules" },
  );
  ServiceRecord.init(
    {
      id,
      companyId: DataTypes.INTEGER.UNSIGNED,
      rigId: DataTypes.INTEGER.UNSIGNED,
      ruleId: DataTypes.INTEGER.UNSIGNED,
      doneAt: DataTypes.DATE(3),
      engineHours: decimal(8, 1, "engineHours"),
      doneBy: DataTypes.INTEGER.UNSIGNED,
      note: DataTypes.STRING(500),
      caseId: DataTypes.CHAR(36),
      createdAt: DataTypes.DATE,
    },
    { sequelize, tableName: "service_records", updatedAt: false },
  );

  Job.init(
    {
      id,
      companyId: DataTypes.INTEGER.UNSIGNED,
      name: DataTypes.STRING(120),
      customer: DataTypes.STRING(120),
      address: DataTypes.STRING(300),
      latitude: decimal(9, 6, "latitude"),
      longitude: decimal(9, 6, "longitude"),
      elevationFt: DataTypes.INTEGER,
      areaAcres: decimal(8, 2, "areaAcres"),
      passes: { type: DataTypes.TINYINT.UNSIGNED, defaultValue: 1 },
      waterGalPerAcre: decimal(7, 1, "waterGalPerAcre"),
      materials: DataTypes.JSON,
      startsOn: DataTypes.DATEONLY,
      endsOn: DataTypes.DATEONLY,
      closedAt: DataTypes.DATE(3),
      notes: DataTypes.STRING(1000),
      ...timestamps,
    },
    { sequelize, tableName: "jobs" },
  );
  JobDay.init(
    {
      id,
      companyId: DataTypes.INTEGER.UNSIGNED,
      jobId: DataTypes.INTEGER.UNSIGNED,
      day: DataTypes.DATEONLY,
      rigId: DataTypes.INTEGER.UNSIGNED,
      userId: DataTypes.INTEGER.UNSIGNED,
    },
    { sequelize, tableName: "job_days", timestamps: false },
  );
  JobLoad.init(
    {
      id: { type: DataTypes.CHAR(36), primaryKey: true },
      companyId: DataTypes.INTEGER.UNSIGNED,
      jobId: DataTypes.INTEGER.UNSIGNED,
      rigId: DataTypes.INTEGER.UNSIGNED,
      sprayedBy: DataTypes.INTEGER.UNSIGNED,
      sprayedAt: DataTypes.DATE(3),
      areaSqFt: decimal(12, 1, "areaSqFt"),
      waterGal: decimal(8, 1, "waterGal"),
      createdAt: DataTypes.DATE,
    },
    { sequelize, tableName: "job_loads", updatedAt: false },
  );

  Company.hasMany(User, { foreignKey: "companyId" });
  User.belongsTo(Company, { foreignKey: "companyId" });
  Company.hasMany(Rig, { foreignKey: "companyId" });
  Rig.belongsTo(Company, { foreignKey: "companyId" });
  Invite.belongsTo(Company, { foreignKey: "companyId" });
  PasswordReset.belongsTo(User, { foreignKey: "userId" });
  GuideRecord.hasMany(GuideVersion, { foreignKey: "guideId", as: "versions" });
  GuideVersion.belongsTo(GuideRecord, { foreignKey: "guideId", as: "guide" });
  Case.belongsTo(Rig, { foreignKey: "rigId", as: "rig" });
  Case.belongsTo(GuideVersion, { foreignKey: "guideVersionId", as: "guideVersion" });
  Case.belongsTo(User, { foreignKey: "openedBy", as: "opener" });
  Case.hasMany(CaseEvent, { foreignKey: "caseId", as: "events" });
  Case.hasMany(CasePhoto, { foreignKey: "caseId", as: "photos" });
}
