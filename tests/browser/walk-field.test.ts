import type { Page } from "playwright-core";
import { describe, expect, it, onTestFinished } from "vitest";
import { Case, Rig } from "../../db/index";
import { loadLibrary } from "~/lib/guides/files.server";
import type { Guide } from "~/lib/guides/schema";
import { ANSWER_LABELS, type StepAnswer } from "~/lib/vocabulary";
import { appAndBrowserForFile, signIn, startCaseFromPage } from "../helpers/app";
import { root } from "../helpers/guides";

const harness = appAndBrowserForFile();
const library = loadLibrary(root);

/** The fewest answers from the guide's first step to `target`: [step, answer] pairs to give in order. */
function pathTo(guide: Guide, target: string): [string, StepAnswer][] {
  const came = new Map<string, [string, StepAnswer]>();
  const queue = [guide.initial];
  const seen = new Set(queue);
  while (queue.length) {
    const id = queue.shift()!;
    if (id === target) break;
    for (const [answer, to] of Object.entries(guide.states[id].on ?? {})) {
      if (!to || seen.has(to)) continue;
      seen.add(to);
      came.set(to, [id, answer as StepAnswer]);
      queue.push(to);
    }
  }
  const out: [string, StepAnswer][] = [];
  for (let at = target; at !== guide.initial; at = came.get(at)![0]) out.unshift(came.get(at)!);
  return out;
}

/** How long a step is on screen: a calculator makes it longest, then its help and prompt. */
const length = (guide: Guide, id: string) => {
  const m = guide.states[id].meta;
  return (m.fieldMath ? 10_000 : 0) + (m.help?.length ?? 0) + m.prompt.length;
};

async function startWalk(p: Page, guideSlug: string, rigCode = "CF-07"): Promise<string> {
  // A rig card reads the hour meter as it starts: the rig's own reading will do.
  const card = library.find((g) => g.id === guideSlug)?.kind === "card";
  const hours = card ? (await Rig.findOne({ where: { code: rigCode } }))!.engineHours : undefined;
  const id = await startCaseFromPage(p, rigCode, guideSlug, hours);
  await p.goto(`${harness.app.url}/cases/${id}/walk`);
  return id;
}

const answer = (p: Page, a: StepAnswer) => p.getByRole("button", { name: ANSWER_LABELS[a], exact: true }).click();

async function crewPage(): Promise<Page> {
  await harness.browser.context.clearCookies();
  const p = await harness.browser.context.newPage();
  await signIn(p, harness.app.url, "dana@cedarflats.example");
  return p;
}

describe("every shut-down stop opens in view (360×640)", () => {
  const stops = library.flatMap((guide) =>
    Object.entries(guide.states)
      .filter(([, s]) => s.meta.kind === "safety")
      .map(([id]) => {
        // Reached from its longest step before it: the one that leaves the page scrolled furthest
        // (none for a card that opens with its stop: it is the first step on the page).
        const before: readonly [string, StepAnswer] | undefined = Object.entries(guide.states)
          .filter(([, s]) => Object.values(s.on ?? {}).includes(id))
          .map(([from, s]) => [from, Object.entries(s.on!).find(([, to]) => to === id)![0] as StepAnswer] as const)
          .sort((a, b) => length(guide, b[0]) - length(guide, a[0]))[0];
        return { guide, stop: id, before };
      }),
  );

  it("covers every safety step of the shipped library", () => {
    expect(stops.length).toBeGreaterThanOrEqual(20);
  });

  it.each(stops.map((s) => [`${s.guide.id} › ${s.stop}`, s] as const))("%s", async (_name, { guide, before }) => {
    const p = await crewPage();
    await startWalk(p, guide.id);
    for (const [step, a] of (before ? [...pathTo(guide, before[0]), before] : []) as [string, StepAnswer][]) {
      await p.locator("#step-prompt").waitFor();
      if (step === before?.[0]) {
        // Open the help and scroll to the bottom of the long step, as a crew member reading it would.
        const more = p.getByRole("button", { name: "More about this" });
        if (await more.count()) await more.click();
        await p.evaluate(() => window.scrollTo(0, document.documentElement.scrollHeight));
      }
      await answer(p, a);
    }
    await p.getByRole("heading", { name: /^Shut-down stop/ }).waitFor();
    const box = await p.evaluate(() => {
      const h = document.querySelector("h1")!.getBoundingClientRect();
      const prompt = document.querySelector("#step-prompt")!.getBoundingClientRect();
      return { headingTop: h.top, promptTop: prompt.top, promptFirstLine: prompt.top + 30, height: window.innerHeight, focused: document.activeElement?.id };
    });
    expect(box.headingTop).toBeGreaterThanOrEqual(0);
    expect(box.promptFirstLine).toBeLessThanOrEqual(box.height);
    expect(box.promptTop).toBeGreaterThanOrEqual(0);
    // Reached by an answer, the stop also takes the focus; a walk that opens on its stop leaves focus where the page load puts it.
    if (before) expect(box.focused).toBe("step-prompt");
    await p.close();
  });
});

describe("the walk tells the truth (360×640)", () => {
  it("shows a case finished on another phone read-only, and the server refuses new answers", async () => {
    const p = await crewPage();
    const guide = library.find((g) => g.id === "foaming")!;
    const end = Object.entries(guide.states).find(([, s]) => s.meta.kind === "fixed")![0];
    const id = await startWalk(p, guide.id);
    for (const [, a] of pathTo(guide, end)) await answer(p, a);
    await p.getByRole("button", { name: "Finish" }).click();
    await p.getByText("Case closed and saved.").waitFor();
    // Another phone: nothing kept for this case.
    await p.evaluate((id) => localStorage.removeItem(`tankside:walk:${id}`), id);
    await p.reload();
    await p.getByRole("heading", { name: /This case is closed \(fixed\)/ }).waitFor();
    for (const name of ["Back one step", "Finish", "Yes", "No", "Done"]) expect(await p.getByRole("button", { name, exact: true }).count(), name).toBe(0);
    const refused = await p.evaluate(async (id) => {
      const res = await fetch(`/api/cases/${id}/events`, {
        method: "POST",
        headers: { "Content-Type": "application/json" },
        body: JSON.stringify({ events: [{ id: crypto.randomUUID(), seq: 99, stepId: "agitator-speed", answer: "BACK", at: new Date().toISOString() }] }),
      });
      return { status: res.status, body: await res.json() };
    }, id);
    expect(refused.status).toBe(409);
    expect(refused.body.error).toMatch(/closed as fixed and takes no more answers/);
    await p.close();
  });

  it("says the supervisor will be e-mailed until the server confirms, then who and when; and shows the end's advice", async () => {
    const p = await crewPage();
    const guide = library.find((g) => g.id === "lost-prime")!;
    await startWalk(p, guide.id);
    for (const [, a] of pathTo(guide, "handoff-pump")) await answer(p, a);
    await p.getByRole("heading", { name: "Handed off" }).waitFor();
    await p.getByText(/flush the tank and pump with clean water/).waitFor();
    const news = p.getByTestId("handoff-mail");
    expect(await news.textContent()).toBe("When you finish, your supervisor will be e-mailed with your answers.");
    await harness.browser.context.setOffline(true);
    onTestFinished(() => harness.browser.context.setOffline(false));
    await p.evaluate(() => window.dispatchEvent(new Event("offline")));
    await p.getByRole("button", { name: "Finish" }).click();
    await news.filter({ hasText: "Your supervisor will be e-mailed when this phone has signal." }).waitFor();
    expect(await p.content()).not.toMatch(/has been told/);
    await harness.browser.context.setOffline(false);
    await p.evaluate(() => window.dispatchEvent(new Event("online")));
    await news.filter({ hasText: /^E-mailed to Mo Brennan at \d{1,2}:\d{2}:\d{2} [AP]M M[DS]T\.$/ }).waitFor();
    await p.close();
  });

  it("says there is no signal, not that something went wrong, when a page cannot be fetched and nothing for it is kept", async () => {
    // The fix page's scripts are on the phone from an earlier visit, but the kit of rigs and guides
    // is gone (cleared by the browser): with no signal its data cannot come.
    const p = await crewPage();
    await p.goto(`${harness.app.url}/rigs/CF-03/fix`);
    await p.getByRole("link", { name: "Start a fix" }).first().click();
    await p.getByRole("link", { name: /CF-07/ }).first().waitFor();
    await expect.poll(() => p.evaluate(() => localStorage.getItem("tankside:kit") !== null), { timeout: 20_000 }).toBe(true);
    await p.evaluate(() => localStorage.removeItem("tankside:kit"));
    await harness.browser.context.setOffline(true);
    onTestFinished(() => harness.browser.context.setOffline(false));
    await p.getByRole("link", { name: /CF-07/ }).first().click();
    await p.getByRole("heading", { level: 1, name: "No signal" }).waitFor();
    expect(await p.getByRole("alert").textContent()).toMatch(
      /What is kept on this phone \(answers, photos, loads sprayed\) is safe: it is sent when there is signal/,
    );
    expect(await p.content()).not.toMatch(/Something went wrong/);
    await harness.browser.context.setOffline(false);
    await p.close();
  });

  it("gives Yes and No their own word, mark and shade, both at least 56 px tall", async () => {
    const p = await crewPage();
    await startWalk(p, "foaming");
    const look = (name: string) =>
      p.getByRole("button", { name, exact: true }).evaluate((el) => {
        const s = getComputedStyle(el);
        return { bg: s.backgroundColor, color: s.color, height: el.getBoundingClientRect().height, text: el.textContent };
      });
    const [yes, no] = [await look("Yes"), await look("No")];
    expect(yes.bg).not.toBe(no.bg);
    expect(yes.color).not.toBe(no.color);
    expect(yes.text).toBe("✓Yes");
    expect(no.text).toBe("✕No");
    expect(Math.min(yes.height, no.height)).toBeGreaterThanOrEqual(56);
    await p.close();
  });

  it("shows at once that a guide tap was taken on a slow link, and a double tap makes one case", async () => {
    const p = await crewPage();
    await p.goto(`${harness.app.url}/rigs/CF-03/fix`);
    // Hold the start for two seconds, as a weak signal does.
    await p.route("**/rigs/CF-03/fix**", async (route) => {
      if (route.request().method() === "POST") await new Promise((r) => setTimeout(r, 2000));
      await route.continue();
    });
    const before = await Case.count();
    const tile = p.getByRole("button", { name: /Foam in the tank/ });
    await tile.click();
    await p.getByRole("button", { name: /Opening Foam in the tank…/ }).waitFor({ timeout: 500 });
    await tile.click({ force: true }).catch(() => undefined);
    await p.waitForURL(/\/walk$/);
    expect(await Case.count()).toBe(before + 1);
    await p.close();
  });

  it("offers to carry on an open walk-through, and after Stop without finishing nothing more can be answered", async () => {
    const p = await crewPage();
    const id = await startWalk(p, "vibration", "CF-03");
    await answer(p, "NO");
    await p.goto(`${harness.app.url}/rigs/CF-03/fix`);
    await p
      .getByRole("link", { name: /Vibration or jumping/ })
      .first()
      .click();
    await p.waitForURL(new RegExp(`/cases/${id}/walk$`));
    await p.getByRole("button", { name: "Stop without finishing" }).click();
    await p.getByRole("button", { name: "Yes, stop it" }).click();
    await p.getByRole("heading", { name: "Stopped without finishing" }).waitFor();
    for (const name of ["Yes", "No", "Done", "Back one step"]) expect(await p.getByRole("button", { name, exact: true }).count(), name).toBe(0);
    await expect.poll(async () => (await Case.findByPk(id))!.outcome).toBe("abandoned");
    await p.goto(`${harness.app.url}/rigs/CF-03/fix`);
    await p.getByRole("heading", { name: /What is CF-03 doing/ }).waitFor();
    expect(await p.locator(`a[href="/cases/${id}/walk"]`).count()).toBe(0);
    await p.close();
  });
});
