import { describe, expect, it } from "vitest";
import { Job, JobLoad } from "../../db/index";
import { appAndBrowserForFile, signIn } from "../helpers/app";
import { phoneSignal } from "../helpers/signal";

const harness = appAndBrowserForFile();
const signal = phoneSignal(harness);

const as = async (email: string) => {
  await harness.browser.context.clearCookies();
  const p = await harness.browser.context.newPage();
  await signIn(p, harness.app.url, email);
  return p;
};

describe("jobs at 360×640", () => {
  it("a supervisor creates a job and puts CF-07 and Dana on it today, all through the forms", async () => {
    const p = await as("mo@cedarflats.example");
    await p.getByRole("link", { name: "Jobs" }).first().click();
    await p.getByRole("link", { name: "New job" }).click();
    // Submitting with the site left empty names what is missing and saves nothing.
    await p.getByRole("button", { name: "Save job" }).click();
    await p.getByText("Name the site.").waitFor();
    expect(await Job.count()).toBe(0);
    await p.getByLabel("Site", { exact: true }).fill("Kettle Creek bench");
    await p.getByLabel("Customer").fill("Larch County Roads");
    await p.getByLabel("Site elevation (ft)").fill("6,240");
    await p.getByLabel("Area (acres)").fill("3");
    await p.getByRole("button", { name: "Save job" }).click();
    await p.getByRole("heading", { name: "Kettle Creek bench", level: 1 }).waitFor();
    await p.getByText("6,240 ft (1,902 m)").waitFor();
    expect(await p.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(360);

    await p.getByRole("checkbox", { name: /CF-07/ }).check();
    await p.getByRole("checkbox", { name: "Dana Whitlock" }).check();
    await p.getByRole("button", { name: "Save the plan for these days" }).click();
    await p.getByText("Plan saved.").waitFor();
    await p.getByText(/^Today, /).waitFor();
    await p.getByText("CF-07 · Dana Whitlock").waitFor();
    await p.close();
  });

  it("the crew member sees today's job at home, and its elevation fills the suction check for her rig", async () => {
    const p = await as("dana@cedarflats.example");
    const today = p.getByRole("region", { name: "Today's job" });
    await today.getByRole("link", { name: "Kettle Creek bench" }).waitFor();
    await today.getByText("Rigs: CF-07").waitFor();
    await p.goto(`${harness.app.url}/field-math/suction?rig=CF-07`);
    await expect.poll(() => p.getByLabel("Elevation of this site").inputValue()).toBe("6240");
    await p.getByText("1,902 m, from the job: Kettle Creek bench.").waitFor();
    // Another rig: Dana is on the job today, so it works to the job too; with "No job" the field starts empty, the yard's figure beside it.
    await p.getByLabel("Filled from rig").selectOption("CF-11");
    await p.waitForURL(/rig=CF-11/);
    await expect.poll(() => p.getByLabel("Elevation of this site").inputValue()).toBe("6240");
    await p.getByLabel("Job", { exact: true }).selectOption("No job");
    await p.waitForURL(/job=none/);
    await expect.poll(() => p.getByLabel("Elevation of this site").inputValue()).toBe("");
    await p.getByText("The yard is at 2,740 ft; this site may not be.").waitFor();
    await p.close();
  });

  it("the load card works to the job's spec and area, and loads marked sprayed reach the job once each, with and without signal", async () => {
    const p = await signal.readyPhone();
    await p.goto(`${harness.app.url}/field-math/load?rig=CF-07`);
    await p.getByText(/From the job Kettle Creek bench: its spec, and 3 acres left to spray of 3/).waitFor();
    await expect.poll(() => p.getByLabel("Area to cover").inputValue()).toBe("3");
    await p.getByRole("button", { name: /^Load 1 sprayed/ }).click();
    await p.getByText(/Load 1: .* · saved$/).waitFor();

    await signal.signalOff(p);
    await p.getByRole("button", { name: /^Load 2 sprayed/ }).click({ timeout: 5000 });
    await p.getByText(/Load 2: .* · kept on this phone, sent when there is signal$/).waitFor();
    const job = (await Job.findOne({ where: { name: "Kettle Creek bench" } }))!;
    expect(await JobLoad.count({ where: { jobId: job.id } })).toBe(1);
    await signal.signalOn(p);
    await expect.poll(() => JobLoad.count({ where: { jobId: job.id } }), { timeout: 20_000 }).toBe(2);

    await p.getByText(/Load 2: .* · saved$/).waitFor();
    // A third tap by mistake, taken back: the job counts two.
    await p.getByRole("button", { name: /^Load 3 sprayed/ }).click();
    await expect.poll(() => JobLoad.count({ where: { jobId: job.id } })).toBe(3);
    await p.getByRole("button", { name: "Marked by mistake? Take back load 3" }).click();
    await p.getByRole("button", { name: "Yes, take back load 3" }).click();
    await expect.poll(() => JobLoad.count({ where: { jobId: job.id } })).toBe(2);
    await p.getByRole("button", { name: /^Load 3 sprayed/ }).waitFor();

    await p.goto(`${harness.app.url}/jobs/${job.id}`);
    await p.getByText(/^2 loads \(/).waitFor();
    expect(await JobLoad.count({ where: { jobId: job.id } })).toBe(2);
    await p.close();
  });
});
