import { describe, expect, it } from "vitest";
import { jobProgress, NO_TOTALS } from "~/lib/jobs/progress";
import { jobOn, keptJobAt, siteLine, type JobSummary, type PlanDay } from "~/lib/jobs/today";
import { keepLoad, keptLoads, loadsToSend, loadsToTakeBack, takeBackLoad, updateLoad } from "~/lib/jobs/kept-loads";
import { jobInputSchema, jobPlanSchema, planDays } from "~/lib/jobs/schema";
import { jobBoard } from "~/lib/stats/job-board";
import { poissonInterval } from "~/lib/stats/chi-square";

const plan: PlanDay[] = [
  { day: "2026-06-02", jobId: 1, rigCodes: ["CF-07"], people: [{ id: 5, name: "Dana" }] },
  { day: "2026-06-02", jobId: 2, rigCodes: ["CF-11"], people: [{ id: 6, name: "Ravi" }] },
  { day: "2026-06-03", jobId: 2, rigCodes: ["CF-07"], people: [] },
];

class MemoryStore {
  map = new Map<string, string>();
  getItem = (k: string) => this.map.get(k) ?? null;
  setItem = (k: string, v: string) => void this.map.set(k, v);
}

describe("today's job", () => {
  it("is the rig's job that day, else the person's; none when neither is planned", () => {
    expect(jobOn(plan, "2026-06-02", { rigCode: "CF-07" })).toBe(1);
    expect(jobOn(plan, "2026-06-03", { rigCode: "CF-07", personId: 5 })).toBe(2);
    // Dana on CF-11 (planned on job 2): the rig's plan wins.
    expect(jobOn(plan, "2026-06-02", { rigCode: "CF-11", personId: 5 })).toBe(2);
    expect(jobOn(plan, "2026-06-02", { rigCode: "CF-03", personId: 5 })).toBe(1);
    expect(jobOn(plan, "2026-06-04", { rigCode: "CF-07", personId: 5 })).toBeNull();
  });

  it("with no signal, reads the day in the company's zone: 11 pm in Denver on June 2 is still June 2", () => {
    const job = { id: 1, name: "Ridge" } as JobSummary;
    const at = new Date("2026-06-03T05:00:00Z"); // 11:00 PM MDT, June 2
    expect(keptJobAt({ jobs: [job], plan }, at, "America/Denver", { rigCode: "CF-07" })?.name).toBe("Ridge");
    expect(keptJobAt({ jobs: [job], plan }, at, "UTC", { rigCode: "CF-07" })).toBeNull();
    expect(keptJobAt(undefined, at, "UTC", { rigCode: "CF-07" })).toBeNull();
  });

  it("says where the site is: the address, else the coordinates", () => {
    expect(siteLine({ address: "CR 8", latitude: 39.1, longitude: -105 })).toBe("CR 8");
    expect(siteLine({ address: null, latitude: 39.123456, longitude: -105.5 })).toBe("39.12346, -105.50000");
    expect(siteLine({ address: null, latitude: null, longitude: null })).toBeNull();
  });
});

describe("a job's progress", () => {
  it("measures area sprayed against area × passes (1 acre = 43,560 ft², NIST Handbook 44 Appendix C)", () => {
    const p = jobProgress({ areaAcres: 2.5, passes: 2 }, { ...NO_TOTALS, areaSqFt: 43_560 * 1.25, downtimeSeconds: 5400 });
    expect(p).toMatchObject({ targetAcres: 5, sprayedAcres: 1.25, remainingAcres: 3.75, percent: 25, downtimeHours: 1.5 });
    expect(jobProgress({ areaAcres: 1, passes: 1 }, { ...NO_TOTALS, areaSqFt: 50_000 }).remainingAcres).toBe(0);
  });
});

describe("job forms", () => {
  it("plans a run of days, both ends included, at most 62", () => {
    expect(planDays("2026-02-27", "2026-03-01")).toEqual(["2026-02-27", "2026-02-28", "2026-03-01"]);
    expect(jobPlanSchema.safeParse({ from: "2026-06-01", to: "2026-05-31" }).error?.issues[0].message).toBe("The last day is before the first day.");
    expect(jobPlanSchema.safeParse({ from: "2026-01-01", to: "2026-12-31" }).error?.issues[0].message).toBe("Plan at most 62 days at once.");
    expect(jobPlanSchema.safeParse({ from: "2026-02-30" }).error?.issues[0].message).toBe("The first day is not a real date.");
  });

  it("needs fiber or a water rate to size loads", () => {
    const base = { name: "A", customer: "B", areaAcres: 1, passes: 1, startsOn: "2026-06-01", materials: [{ name: "Seed", lbPerAcre: 100, kind: "seed" }] };
    expect(jobInputSchema.safeParse(base).error?.issues[0].path).toEqual(["waterGalPerAcre"]);
    expect(jobInputSchema.safeParse({ ...base, waterGalPerAcre: 3000 }).success).toBe(true);
  });
});

describe("loads kept on the phone", () => {
  it("keeps a load once, sends what waits, keeps refusals for the person", () => {
    const store = new MemoryStore();
    const load = { id: "a", jobId: 1, number: 1, sprayedAt: new Date().toISOString(), areaSqFt: 1000, waterGal: 500 };
    keepLoad(store, load);
    keepLoad(store, load);
    expect(keptLoads(store)).toHaveLength(1);
    keepLoad(store, { ...load, id: "b", number: 2 });
    updateLoad(store, "a", { sent: true });
    updateLoad(store, "b", { refused: "Job closed." });
    expect(loadsToSend(store)).toEqual([]);
    expect(keptLoads(store).map((l) => [l.id, l.sent, l.refused ?? null])).toEqual([
      ["a", true, null],
      ["b", false, "Job closed."],
    ]);
    // A load sent more than a week ago is forgotten.
    keepLoad(store, { ...load, id: "old", sprayedAt: new Date(Date.now() - 8 * 86_400_000).toISOString() });
    updateLoad(store, "old", { sent: true });
    expect(keptLoads(store).map((l) => l.id)).toEqual(["a", "b"]);
  });

  it("takes back a load the server never had at once, and one it has when there is signal", () => {
    const store = new MemoryStore();
    const load = { id: "x", jobId: 1, number: 1, sprayedAt: new Date().toISOString(), areaSqFt: 1000, waterGal: 500 };
    keepLoad(store, load);
    takeBackLoad(store, "x");
    expect(keptLoads(store)).toEqual([]);
    keepLoad(store, { ...load, id: "y" });
    updateLoad(store, "y", { sent: true });
    takeBackLoad(store, "y");
    expect(loadsToTakeBack(store).map((l) => l.id)).toEqual(["y"]);
    expect(loadsToSend(store)).toEqual([]);
  });
});

describe("the board by job", () => {
  it("rates faults per 10 rig-days with the Garwood range, and marks a job whose range clears the others' rate", () => {
    const row = (jobId: number, rigDays: number, faults: number) => ({
      jobId,
      name: `J${jobId}`,
      startsOn: "2026-06-01",
      elevationFt: null,
      closed: false,
      rigDays,
      faults,
      downtimeSeconds: 0,
      openHandoffs: 0,
      topCause: null,
    });
    const rows = jobBoard([row(1, 100, 2), row(2, 100, 3), row(3, 40, 14)]);
    expect(rows[0].jobId).toBe(3);
    expect(rows[0].per10RigDays).toBeCloseTo(3.5, 12);
    const garwood = poissonInterval(14);
    expect(rows[0].range!.lower).toBeCloseTo((garwood.lower * 10) / 40, 12);
    expect(rows[0].othersPer10RigDays).toBeCloseTo(0.25, 12);
    expect(rows.map((r) => r.hardOnRigs)).toEqual([true, false, false]);
    expect(jobBoard([row(4, 0, 1)])[0]).toMatchObject({ per10RigDays: null, range: null, hardOnRigs: false });
  });
});
