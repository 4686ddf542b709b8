import { isRouteErrorResponse, Links, Meta, Outlet, Scripts, ScrollRestoration } from "react-router";
import type { Route } from "./+types/root";
import "./app.css";

export function Layout({ children }: { children: React.ReactNode }) {
  return (
    <html lang="en">
      <head>
        <meta charSet="utf-8" />
        <meta name="viewport" content="width=device-width, initial-scale=1" />
        <meta name="theme-color" content="#0f4a2c" />
        <link rel="icon" href="/favicon.svg" type="image/svg+xml" />
        <Meta />
        <Links />
      </head>
      <body>
        {children}
        <ScrollRestoration />
        <Scripts />
      </body>
    </html>
  );
}

export default function App() {
  return <Outlet />;
}

export function ErrorBoundary({ error }: Route.ErrorBoundaryProps) {
  return <ErrorPanel error={error} />;
}

/** The one error screen: status in words, the server's message, a way home. */
export function ErrorPanel({ error }: { error: unknown }) {
  let title = "Something went wrong";
  let detail = "Try again. If it keeps happening, tell your supervisor.";
  if (isRouteErrorResponse(error)) {
    title = error.status === 404 ? "Not found" : error.status === 403 ? "Not allowed" : `Error ${error.status}`;
    const message = typeof error.data === "string" ? error.data : (error.data as { error?: unknown } | null)?.error;
    if (typeof message === "string" && message) detail = message;
    else if (error.status === 404) detail = "There is nothing here, or it belongs to another company.";
  } else if (import.meta.env.DEV && error instanceof Error) {
    detail = error.message;
  }
  return (
    <main className="mx-auto max-w-xl p-4">
      <div role="alert" className="rounded-lg border-2 border-ink bg-paper p-5">
        <h1 className="text-2xl font-bold">{title}</h1>
        <p className="mt-2 text-lg">{detail}</p>
        <p className="mt-4">
          <a href="/">Back to the start</a>
        </p>
      </div>
    </main>
  );
}
