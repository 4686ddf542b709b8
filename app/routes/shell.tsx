import { Form, Link, NavLink, Outlet, useRouteLoaderData } from "react-router";
import { ErrorPanel } from "~/components/error-panel";
import { navFor } from "~/lib/navigation";
import { ROLE_LABELS } from "~/lib/people/roles";
import { hiddenSections } from "~/services/env.server";
import { requireUser } from "~/services/guards.server";
import type { Route } from "./+types/shell";

export async function loader({ request, context }: Route.LoaderArgs) {
  const user = await requireUser({ request, context });
  return { user, hidden: hiddenSections() };
}

export default function Shell({ loaderData }: Route.ComponentProps) {
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
  return (
    <div className="min-h-dvh">
      <header className="no-print bg-go text-white">
        <div className="mx-auto flex max-w-3xl items-center justify-between gap-2 px-3 pt-2">
          <a href="/" className="text-xl font-bold text-white no-underline">
            Tankside
          </a>
          <p className="truncate text-right text-sm leading-tight">
            <Link to="/account" className="font-bold text-white underline" aria-label={`Your account: ${user.name}`}>
              {user.name}
            </Link>{" "}
            · {ROLE_LABELS[user.role]}
            <span className="sr-only"> at </span>
            <span className="block">{user.companyName}</span>
          </p>
        </div>
        <nav aria-label="Main" className="mx-auto max-w-3xl px-1 pb-1">
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
                    {item.label}
                  </NavLink>
                </li>
              ))}
            <li className="ml-auto">
              <Form method="post" action="/logout">
                <button type="submit" className="min-h-12 rounded-md px-2 font-bold underline">
                  Sign out
                </button>
              </Form>
            </li>
          </ul>
        </nav>
      </header>
      <main className="mx-auto max-w-3xl px-3 py-4">{children}</main>
    </div>
  );
}
