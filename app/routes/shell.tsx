import { lazy, Suspense, useEffect, useState } from "react";
import { useTranslation } from "react-i18next";
import { SEED_CLOCK_CHANGED, SEED_CLOCK_KEY } from "~/lib/field-math/seed-clock";
import { Form, Link, NavLink, Outlet, useLocation, useRouteLoaderData } from "react-router";
import { ErrorPanel } from "~/components/error-panel";
import { useNavText } from "~/components/ui/nav-text";
import { useKeptSync } from "~/components/offline/kept-sync";
import { forgetPhoneKit, useKitRefresh } from "~/components/offline/phone-kit";
import { useOnline } from "~/components/offline/use-online";
import { loadKit } from "~/lib/walk/kept";
import { isNoSignal } from "~/lib/walk/no-signal";
import { navFor } from "~/lib/navigation";
import { hiddenSections } from "~/services/env.server";
import { requireUser } from "~/services/guards.server";
import type { Route } from "./+types/shell";

export async function loader({ request, context }: Route.LoaderArgs) {
  const user = await requireUser({ request, context });
  return { user, hidden: hiddenSections() };
}

/** With no signal, the frame is drawn from the kit the phone keeps for this person. */
export async function clientLoader({ serverLoader }: Route.ClientLoaderArgs) {
  try {
    return await serverLoader();
  } catch (error) {
    const kit = isNoSignal(error) ? loadKit(window.localStorage) : null;
    if (!kit) throw error;
    return { user: kit.person, hidden: kit.hidden };
  }
}

export default function Shell({ loaderData }: Route.ComponentProps) {
  const { pathname } = useLocation();
  useKitRefresh(loaderData.user.id);
  // The open walk-through sends its own answers; the rest go out from here.
  useKeptSync(/^\/cases\/([^/]+)\/walk$/.exec(pathname)?.[1] ?? null);
  return (
    <ShellFrame {...loaderData}>
      <Outlet />
    </ShellFrame>
  );
}

/** An error inside the app keeps the app around it: the header and navigation, then the error. */
export function ErrorBoundary({ error }: Route.ErrorBoundaryProps) {
  const shell = useRouteLoaderData<typeof loader>("routes/shell");
  const panel = <ErrorPanel error={error} />;
  if (!shell) return <main className="mx-auto max-w-xl p-4">{panel}</main>;
  return <ShellFrame {...shell}>{panel}</ShellFrame>;
}

function ShellFrame({ user, hidden, children }: Awaited<ReturnType<typeof loader>> & { children: React.ReactNode }) {
  const { t } = useTranslation();
  const role = t(`roles.${user.role}`);
  const nav = useNavText();
  return (
    <div className="min-h-dvh">
      <header className="no-print bg-go text-white">
        <div className="mx-auto flex max-w-3xl items-center gap-2 px-3 pt-2">
          <a href="/" className="flex min-h-12 items-center text-xl font-bold text-white no-underline">
            Tankside
          </a>
          {/* The person's name is the way to their account; a target as tall as a gloved thumb. */}
          <Link
            to="/account"
            className="ml-auto flex min-h-12 min-w-0 flex-col justify-center text-right text-sm leading-tight text-white no-underline"
            aria-label={t("shell.account", { name: user.name, role, company: user.companyName })}
          >
            <span className="truncate font-bold underline">{user.name}</span>
            <span className="truncate">
              {role} · {user.companyName}
            </span>
          </Link>
          <Form method="post" action="/logout" onSubmit={() => void forgetPhoneKit()} className="shrink-0">
            <button type="submit" className="min-h-12 rounded-md border-2 border-white px-2 font-bold">
              {t("shell.signOut")}
            </button>
          </Form>
        </div>
        <nav aria-label={t("shell.main")} className="mx-auto max-w-3xl px-1 pb-1">
          {/* One row that scrolls sideways on a phone, so the menu does not push the page down. */}
          <ul className="flex items-center gap-x-1 overflow-x-auto whitespace-nowrap sm:flex-wrap">
            {navFor(user.role)
              .filter((item) => !hidden.includes(item.to))
              .map((item) => (
                <li key={item.to}>
                  <NavLink
                    to={item.to}
                    end
                    className={({ isActive }) =>
                      `flex min-h-12 items-center rounded-md px-2 font-bold text-white no-underline ${isActive ? "underline decoration-caution decoration-4 underline-offset-8" : ""}`
                    }
                  >
                    {nav.label(item)}
                  </NavLink>
                </li>
              ))}
          </ul>
        </nav>
      </header>
      <NoSignalBanner />
      <KeptSeedClock />
      <main className="mx-auto max-w-3xl px-3 py-4">{children}</main>
    </div>
  );
}

// The bar's code loads only on a phone with a clock running: most page loads never need it.
const SeedClockBar = lazy(() => import("~/components/field-math/seed-clock").then((m) => ({ default: m.SeedClockBar })));

/** A running seed clock stays in sight on every screen. */
function KeptSeedClock() {
  const [kept, setKept] = useState(false);
  useEffect(() => {
    const read = () => setKept(localStorage.getItem(SEED_CLOCK_KEY) !== null);
    read();
    window.addEventListener(SEED_CLOCK_CHANGED, read);
    window.addEventListener("storage", read);
    return () => {
      window.removeEventListener(SEED_CLOCK_CHANGED, read);
      window.removeEventListener("storage", read);
    };
  }, []);
  return kept ? (
    <Suspense fallback={null}>
      <SeedClockBar />
    </Suspense>
  ) : null;
}

/** Says, on every page, that there is no signal and what still works. */
function NoSignalBanner() {
  const online = useOnline();
  const { t } = useTranslation();
  if (online) return null;
  return (
    <p role="status" className="no-print border-b-4 border-ink bg-caution px-3 py-2 text-center text-lg font-bold text-ink" data-testid="no-signal">
      {t("shell.noSignal")}
    </p>
  );
}
