import type { Page } from "playwright-core";
import { describe, expect, it } from "vitest";
import { GuideRecord, type Job, JobDay, Rig, User } from "../../db/index";
import { isoInZone } from "~/lib/format";
import { makeJob } from "../helpers/jobs";
import { appAndBrowserForFile, signIn, startCaseFromPage } from "../helpers/app";
import { axeFindings } from "../helpers/axe";

const harness = appAndBrowserForFile();
/** The job the crew's checks make; the admin's pages open it too. */
let job: Job;

/** Every page a person of this role opens, checked at 360×640: axe (AAA contrast included), a title and one level-one heading. */
async function checkPages(p: Page, paths: string[]) {
  const problems: string[] = [];
  for (const path of paths) {
    await p.goto(`${harness.app.url}${path}`);
    await p.waitForLoadState("networkidle");
    const title = await p.title();
    if (!/Tankside/.test(title)) problems.push(`${path}: page title "${title}"`);
    const h1 = await p.locator("h1").count();
    if (h1 !== 1) problems.push(`${path}: ${h1} level-one headings`);
    for (const f of await axeFindings(p)) problems.push(`${path}: ${f.rule} (${f.help}) at ${f.targets.slice(0, 3).join(", ")}`);
  }
  return problems;
}

describe("every page at 360×640 passes axe with AAA contrast, has a title and one h1", () => {
  it("signed out", async () => {
    const p = await harness.browser.context.newPage();
    await harness.browser.context.clearCookies();
    expect(await checkPages(p, ["/login", "/forgot", "/join/not-a-real-token", "/reset/not-a-real-token"])).toEqual([]);
    await p.close();
  });

  it("crew", async () => {
    const p = await harness.browser.context.newPage();
    await harness.browser.context.clearCookies();
    await signIn(p, harness.app.url, "dana@cedarflats.example");
    // A walk-through of its own, started through the API as the fix page does.
    const started = { id: await startCaseFromPage(p, "CF-07", "lost-prime") };
    // A rig card too, at its shut-down stop (read with the hour meter as it starts).
    const rig = (await Rig.findOne({ where: { code: "CF-07" } }))!;
    const card = await startCaseFromPage(p, "CF-07", "pre-start", rig.engineHours);
    // A job today for CF-07 and Dana: her home shows it, the load card and suction check work to it.
    const dana = (await User.findOne({ where: { email: "dana@cedarflats.example" } }))!;
    job = await makeJob(rig.companyId);
    const today = isoInZone(new Date(), "America/Denver").slice(0, 10);
    await JobDay.bulkCreate([
      { companyId: rig.companyId, jobId: job.id, day: today, rigId: rig.id, userId: null },
      { companyId: rig.companyId, jobId: job.id, day: today, rigId: null, userId: dana.id },
    ]);
    const pages = [
      "/jobs",
      `/jobs/${job.id}`,
      "/rigs/CF-07/cards",
      `/cases/${card}/walk`,
      "/",
      "/rigs",
      "/rigs/CF-07",
      "/rigs/CF-07/fix",
      "/rigs/CF-07/label",
      "/field-math",
      "/field-math/load",
      "/field-math/hose",
      "/field-math/suction",
      "/field-math/torque",
      "/field-math/tip",
      "/field-math/rate",
      "/account",
    ];
    expect(await checkPages(p, [...pages, `/cases/${started.id}/walk`, "/cases/00000000-0000-4000-8000-000000000000/walk"])).toEqual([]);
    await p.close();
  });

  it("trainer", async () => {
    const p = await harness.browser.context.newPage();
    await harness.browser.context.clearCookies();
    await signIn(p, harness.app.url, "ravi@cedarflats.example");
    const guide = (await GuideRecord.findOne({ where: { slug: "foaming" } }))!;
    expect(await checkPages(p, ["/desk", `/desk/${guide.id}`, `/desk/${guide.id}/v/1`, `/desk/${guide.id}/v/1/preview`, "/board"])).toEqual([]);
    await p.close();
  });

  it("supervisor and admin", async () => {
    const p = await harness.browser.context.newPage();
    await harness.browser.context.clearCookies();
    await signIn(p, harness.app.url, "june@cedarflats.example");
    expect(
      await checkPages(p, [
        "/board",
        "/cases",
        "/cases?rig=&guide=&cause=&outcome=&person=&from=&to=",
        "/admin/people",
        "/admin/outbox",
        "/admin/company",
        "/rigs/new",
        "/rigs/CF-07/edit",
        "/jobs",
        "/jobs/new",
        `/jobs/${job.id}`,
        `/jobs/${job.id}/edit`,
      ]),
    ).toEqual([]);
    await p.close();
  });
});
