import { beforeAll, describe, expect, it } from "vitest";
import { loader as boardLoader } from "~/routes/board";
import { loader as homeLoader } from "~/routes/home";
import { action, loader } from "~/routes/rigs.$code.service";
import { Rig, ServiceRecord, ServiceRule } from "../../db/index";
import { resetDatabase } from "../helpers/db";
import { args, requestAs, run } from "../helpers/requests";

beforeAll(() => resetDatabase());

const page = async (email: string, code = "CF-07") => run(async () => loader(args(await requestAs(email, `/rigs/${code}/service`), { code })));
const post = async (email: string, form: Record<string, string>, code = "CF-07") =>
  run(async () => action(args(await requestAs(email, `/rigs/${code}/service`, { form }), { code })));
const line = async (name: string, email = "dana@cedarflats.example") =>
  (await page(email)).data.lines.find((l: { name: string }) => l.name === name) as { ruleId: number; due: { status: string; hoursLeft: number | null } };
const grease = () => line("Grease points");

describe("rig service", () => {
  it("every demo rig keeps the demo's rules, none recorded yet", async () => {
    const res = await page("dana@cedarflats.example");
    expect(res.status).toBe(200);
    expect(res.data.lines.map((l: { name: string }) => l.name).sort()).toEqual(
      ["Grease points", "Hydraulic oil and filter", "Lubricator refill (pump shaft seal)", "Pump seal inspection"].sort(),
    );
    expect(res.data.lines.every((l: { due: { status: string } }) => l.due.status === "never")).toBe(true);
  });

  it("a crew member records grease done; the hour meter moves up", async () => {
    const ruleId = String((await grease()).ruleId);
    const done = await post("dana@cedarflats.example", { intent: "done", ruleId, engineHours: "2,400", note: "All six points" });
    expect(done.data.message).toBe("Recorded as done now at 2,400 engine hours.");
    expect((await Rig.findOne({ where: { code: "CF-07" } }))!.engineHours).toBe(2400);
    expect(await grease()).toMatchObject({ due: { status: "ok", hoursLeft: 50 } });
  });

  it("refuses a reading lower than the last, a wild jump, or none on a rig with a meter; nothing is stored", async () => {
    const ruleId = String((await grease()).ruleId);
    const before = await ServiceRecord.count();
    const cases: [string, RegExp][] = [
      ["2390", /last read 2,400 h; a reading taken now cannot be lower/],
      ["99999", /over 1,000 h above the last reading \(2,400 h\)/],
      ["", /Give the hour meter reading: this rig has one/],
    ];
    for (const [engineHours, message] of cases) {
      const res = await post("dana@cedarflats.example", { intent: "done", ruleId, engineHours });
      expect(res.status).toBe(400);
      expect(res.data.result.error.engineHours.join(" ")).toMatch(message);
    }
    expect(await ServiceRecord.count()).toBe(before);
    expect((await Rig.findOne({ where: { code: "CF-07" } }))!.engineHours).toBe(2400);
  });

  it("is due at exactly the interval and overdue past it (every 50 h from 2,400)", async () => {
    await Rig.update({ engineHours: 2450 }, { where: { code: "CF-07" } });
    expect((await grease()).due).toMatchObject({ status: "due", hoursLeft: 0 });
    await Rig.update({ engineHours: 2450.1 }, { where: { code: "CF-07" } });
    expect((await grease()).due).toMatchObject({ status: "overdue", hoursLeft: -0.1 });
  });

  it("refuses bad hours by name and stores nothing", async () => {
    const before = await ServiceRecord.count();
    const bad = await post("dana@cedarflats.example", { intent: "done", ruleId: String((await grease()).ruleId), engineHours: "-3" });
    expect(bad.status).toBe(400);
    expect(bad.data.result.error.engineHours).toEqual(["Engine hours cannot be negative."]);
    expect(await ServiceRecord.count()).toBe(before);
  });

  it("supervisors set the rules; crew may not", async () => {
    expect((await post("dana@cedarflats.example", { intent: "add-rule", name: "Tank flush", everyDays: "1" })).status).toBe(403);
    const none = await post("mo@cedarflats.example", { intent: "add-rule", name: "Tank flush" });
    expect(none.status).toBe(400);
    expect(none.data.result.error.everyHours).toEqual(["Give the engine hours, the days, or both."]);
    const added = await post("mo@cedarflats.example", { intent: "add-rule", name: "Tank flush", everyDays: "1" });
    expect(added.data.message).toBe("Saved: Tank flush.");
    // A second tap of the same form is refused, not a second copy.
    const again = await post("mo@cedarflats.example", { intent: "add-rule", name: "tank flush ", everyDays: "1" });
    expect(again.status).toBe(400);
    expect(again.data.result.error.name[0]).toMatch(/CF-07 already keeps/);
    expect(await ServiceRule.count({ where: { name: "Tank flush", retired: false } })).toBe(1);
    expect(await line("Tank flush")).toMatchObject({ due: { status: "never" } });
  });

  it("a card task records one service on a rig, and only tasks the company's cards record are offered", async () => {
    const offered = (await page("mo@cedarflats.example")).data.cardTasks as string[];
    // The shipped cards record grease points, the lubricator and freeze protection; nothing records an oil change.
    expect(offered.sort()).toEqual(["freeze-protection", "grease", "lubricator"]);
    const oil = (await line("Hydraulic oil and filter")).ruleId;
    const taken = await post("mo@cedarflats.example", {
      intent: "edit-rule",
      ruleId: String(oil),
      name: "Hydraulic oil and filter",
      everyHours: "500",
      task: "grease",
    });
    expect(taken.status).toBe(400);
    expect(taken.data.result.error.task[0]).toMatch(/“Grease points” is already recorded by that card task/);
    expect((await ServiceRule.findByPk(oil))!.task).toBeNull();
    const unknown = await post("mo@cedarflats.example", { intent: "add-rule", name: "Oil", everyDays: "30", task: "oil-change" });
    expect(unknown.data.result.error.task).toEqual(["Pick a card task from the list, or none."]);
  });

  it("what needs doing shows on the crew's home and the supervisor's board, for their company only", async () => {
    const home = await run(async () => homeLoader(args(await requestAs("dana@cedarflats.example", "/"))));
    const toDo = home.data.service.map((l: { rigCode: string; name: string }) => `${l.rigCode} ${l.name}`);
    expect(toDo).toContain("CF-07 Tank flush");
    expect(toDo).toContain("CF-07 Grease points");
    expect(toDo.every((t: string) => t.startsWith("CF-"))).toBe(true);
    const board = await run(async () => boardLoader(args(await requestAs("mo@cedarflats.example", "/board"))));
    expect(board.data.service.map((l: { name: string }) => l.name)).toContain("Tank flush");
    const other = await run(async () => homeLoader(args(await requestAs("sam@bluemesa.example", "/"))));
    expect(other.data.service.every((l: { rigCode: string }) => l.rigCode.startsWith("BM-"))).toBe(true);
  });

  it("another company's rig answers 404, and so does another company's rule on one's own rig", async () => {
    expect((await page("li@bluemesa.example")).status).toBe(404);
    expect((await post("li@bluemesa.example", { intent: "add-rule", name: "X", everyDays: "3" })).status).toBe(404);
    const cfRule = (await ServiceRule.findOne({ where: { name: "Tank flush" } }))!.id;
    expect((await post("li@bluemesa.example", { intent: "retire-rule", ruleId: String(cfRule), confirmed: "yes" }, "BM-01")).status).toBe(404);
    expect((await post("sam@bluemesa.example", { intent: "done", ruleId: String(cfRule) }, "BM-01")).status).toBe(404);
  });

  it("a retired rule leaves the list", async () => {
    const flush = await line("Tank flush");
    expect((await post("mo@cedarflats.example", { intent: "retire-rule", ruleId: String(flush.ruleId) })).status).toBe(400);
    expect(await line("Tank flush")).toBeDefined();
    await post("mo@cedarflats.example", { intent: "retire-rule", ruleId: String(flush.ruleId), confirmed: "yes" });
    expect(await line("Tank flush")).toBeUndefined();
  });
});
