import type { BrowserContext, Page, Route } from "playwright-core";
import { onTestFinished } from "vitest";
import { signIn } from "./app";

/**
 * A phone losing and finding signal, for browser tests. Chromium's offline switch can lapse for a
 * page reloaded from the service worker, so every request the page itself makes is also cut as a
 * phone with no signal would see it.
 */
const cut = (route: Route) => route.abort("internetdisconnected");

export function phoneSignal(harness: { app: { url: string }; browser: { context: BrowserContext } }) {
  return {
    /** Signs in with signal and waits until the phone says it is ready for none. */
    async readyPhone(email = "dana@cedarflats.example"): Promise<Page> {
      await harness.browser.context.clearCookies();
      const p = await harness.browser.context.newPage();
      await signIn(p, harness.app.url, email);
      await p.getByText(/^Ready for no signal · updated \d{1,2}:\d{2}/).waitFor({ timeout: 30_000 });
      return p;
    },
    async signalOff(p: Page) {
      await harness.browser.context.setOffline(true);
      await harness.browser.context.route("**/*", cut);
      onTestFinished(async () => {
        await harness.browser.context.unroute("**/*", cut);
        await harness.browser.context.setOffline(false);
      });
      await p.evaluate(() => window.dispatchEvent(new Event("offline")));
    },
    async signalOn(p: Page) {
      await harness.browser.context.unroute("**/*", cut);
      await harness.browser.context.setOffline(false);
      await p.evaluate(() => window.dispatchEvent(new Event("online")));
    },
  };
}
