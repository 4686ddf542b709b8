import { Form, NavLink, Outlet } from "react-router";
import { ErrorPanel } from "~/root";
import { navFor } from "~/lib/navigation";
import { ROLE_LABELS } from "~/lib/roles";
import { env } from "~/services/env.server";
import { requireUser } from "~/services/guards.server";
import type { Route } from "./+types/shell";

export async function loader({ request }: Route.LoaderArgs) {
  const user = await requireUser(request);
  // The outbox exists only while the app sends through the local fake mail server.
  return { user, hidden: env().MAIL_OUTBOX_DIR ? [] : ["/admin/outbox"] };
}

export default function Shell({ loaderData }: Route.ComponentProps) {
  const { user, hidden } = loaderData;
  return (
    <div className="min-h-dvh">
      <header className="no-print bg-go text-white">
        <div className="mx-auto flex max-w-3xl flex-wrap items-center justify-between gap-2 px-4 py-3">
          <a href="/" className="text-2xl font-bold text-white no-underline">
            Tankside
          </a>
          <div className="text-right text-sm leading-tight">
            <div className="font-bold">{user.name}</div>
            <div>
              {user.companyName} · {ROLE_LABELS[user.role]}
            </div>
          </div>
        </div>
        <nav aria-label="Main" className="mx-auto max-w-3xl px-2 pb-2">
          <ul className="flex flex-wrap gap-1">
            {navFor(user.role)
              .filter((item) => !hidden.includes(item.to))
              .map((item) => (
              <li key={item.to}>
                <NavLink
                  to={item.to}
                  end
                  className={({ isActive }) =>
                    `block min-h-12 rounded-md px-3 py-3 font-bold text-white no-underline ${isActive ? "bg-go-dark ring-2 ring-white" : "hover:bg-go-dark"}`
                  }
                >
                  {item.label}
                </NavLink>
              </li>
            ))}
            <li className="ml-auto">
              <Form method="post" action="/logout">
                <button type="submit" className="min-h-12 rounded-md border-2 border-white px-3 font-bold">
                  Sign out
                </button>
              </Form>
            </li>
          </ul>
        </nav>
      </header>
      <main className="mx-auto max-w-3xl px-4 py-5">
        <Outlet />
      </main>
    </div>
  );
}

export function ErrorBoundary({ error }: Route.ErrorBoundaryProps) {
  return <ErrorPanel error={error} />;
}
