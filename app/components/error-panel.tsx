import { useTranslation } from "react-i18next";
import { useSay } from "~/components/ui/say";
import { isRouteErrorResponse } from "react-router";
import { isNoSignal } from "~/lib/walk/no-signal";

/** Each status in words a crew member or supervisor can act on; never a raw code or a router message. */
const SAID: Record<number, { title: string; detail: string }> = {
  400: { title: "That did not go through", detail: "Something in what was sent was not right. Go back and try again." },
  401: { title: "Sign in first", detail: "Your sign-in has ended. Sign in again to carry on." },
  403: { title: "Not for your role", detail: "Your role does not open this page. Ask your company's admin if you need it." },
  404: { title: "Not found", detail: "There is nothing here, or it belongs to another company." },
  405: { title: "That did not go through", detail: "This page does not take that. Go back and try again." },
  409: { title: "Already changed", detail: "Someone (or another phone) changed this first. Go back to see it as it is now." },
  413: { title: "Too large", detail: "That file is too large." },
  415: { title: "Wrong kind of file", detail: "That kind of file is not taken here." },
  422: { title: "That did not go through", detail: "What was sent does not fit. Go back and check it." },
  429: { title: "Too many tries", detail: "Wait a little, then try again." },
  503: { title: "Tankside is not answering", detail: "Its database is not reachable right now. Try again in a minute." },
};

const NO_SIGNAL = {
  title: "No signal",
  detail:
    "This page needs signal to open. What is kept on this phone (answers, photos, loads sprayed) is safe: it is sent when there is signal and Tankside is open. Try again when you have signal.",
};

/** The title and sentence for an error a route threw; the server's own message (`{ error }`) is used when it gave one. */
export function describeError(error: unknown): { title: string; detail: string } {
  if (isRouteErrorResponse(error)) {
    const said = SAID[error.status] ?? { title: "Something went wrong", detail: "Try again. If it keeps happening, tell your supervisor." };
    // Only our own `{ error }` messages are shown: the router's own texts are for developers.
    const message = (error.data as { error?: unknown } | null)?.error;
    return { title: said.title, detail: typeof message === "string" && message ? message : said.detail };
  }
  // A page that could not be fetched with the phone offline is a missing signal, not a fault: say so.
  if (isNoSignal(error)) return NO_SIGNAL;
  if (import.meta.env.DEV && error instanceof Error) return { title: "Something went wrong", detail: error.message };
  return { title: "Something went wrong", detail: "Try again. If it keeps happening, tell your supervisor." };
}

/** The one error screen: a page title, a heading, a plain sentence and ways back. */
export function ErrorPanel({ error }: { error: unknown }) {
  const described = describeError(error);
  const noSignal = described.title === NO_SIGNAL.title;
  const say = useSay();
  const { t } = useTranslation();
  const title = say(described.title);
  const detail = say(described.detail);
  return (
    <div role="alert" className="rounded-lg border-2 border-ink bg-paper p-5">
      <title>{`${title} · Tankside`}</title>
      <h1 className="text-2xl font-bold">{title}</h1>
      <p className="mt-2 text-lg">{detail}</p>
      <p className="mt-4 flex flex-wrap gap-x-6 gap-y-2">
        {noSignal ? (
          <button type="button" onClick={() => window.location.reload()} className="min-h-12 rounded-md bg-go px-4 text-lg font-bold text-white">
            {t("errors.tryAgain")}
          </button>
        ) : null}
        <a href="/" className="inline-flex min-h-12 items-center text-lg font-bold">
          {t("errors.start")}
        </a>
        <button type="button" onClick={() => history.back()} className="min-h-12 text-lg font-bold text-link underline">
          {t("errors.back")}
        </button>
      </p>
    </div>
  );
}
