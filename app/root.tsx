import { useEffect } from "react";
import { I18nextProvider } from "react-i18next";
import { Links, Meta, Outlet, Scripts, ScrollRestoration, useRouteLoaderData, type ShouldRevalidateFunction } from "react-router";
import { ErrorPanel } from "~/components/error-panel";
import { i18nFor } from "~/i18n";
import { languageFromHeader, type Language } from "~/lib/i18n/languages";
import { currentUser } from "~/services/guards.server";
import type { Route } from "./+types/root";
import "./app.css";
import regularFont from "@fontsource/atkinson-hyperlegible/files/atkinson-hyperlegible-latin-400-normal.woff2?url";
import boldFont from "@fontsource/atkinson-hyperlegible/files/atkinson-hyperlegible-latin-700-normal.woff2?url";

// The shipped font is fetched with the page rather than after the styles are read, so text is
// rarely drawn twice (once in the fallback, then again when the font arrives).
export const links: Route.LinksFunction = () =>
  [regularFont, boldFont].map((href) => ({ rel: "preload", href, as: "font", type: "font/woff2", crossOrigin: "anonymous" as const }));

/** The language the page is drawn in: the signed-in person's choice, else the browser's. */
export async function loader({ request, context }: Route.LoaderArgs): Promise<{ lang: Language }> {
  const user = await currentUser({ request, context });
  return { lang: user?.language ?? languageFromHeader(request.headers.get("Accept-Language")) };
}

// The language changes only with a whole-page load (signing in, the account page's language form), so
// the root never asks the server again: with no signal, a fix started on the phone must not fail on it.
export const shouldRevalidate: ShouldRevalidateFunction = () => false;

export function Layout({ children }: { children: React.ReactNode }) {
  const lang = useRouteLoaderData<typeof loader>("root")?.lang ?? "en";
  return (
    <html lang={lang}>
      <head>
        <meta charSet="utf-8" />
        <meta name="viewport" content="width=device-width, initial-scale=1" />
        <meta name="theme-color" content="#0f4a2c" />
        <link rel="icon" href="/favicon.svg" type="image/svg+xml" />
        <Meta />
        <Links />
      </head>
      <body>
        <I18nextProvider i18n={i18nFor(lang)}>{children}</I18nextProvider>
        <ScrollRestoration />
        <Scripts />
      </body>
    </html>
  );
}

export default function App() {
  // Set once the page has hydrated (the root's effect runs after every child's), so a test types only into live fields.
  useEffect(() => {
    document.documentElement.dataset.hydrated = "true";
  }, []);
  return <Outlet />;
}

export function ErrorBoundary({ error }: Route.ErrorBoundaryProps) {
  return (
    <main className="mx-auto max-w-xl p-4">
      <ErrorPanel error={error} />
    </main>
  );
}
