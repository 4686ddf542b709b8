import { PageTitle } from "~/components/ui/page-title";
import { notFound, requirePermission } from "~/services/guards.server";
import { readOutbox } from "~/services/outbox.server";
import { useTimes } from "~/components/use-time-zone";
import type { Route } from "./+types/admin.outbox";

export async function loader({ request, context }: Route.LoaderArgs) {
  const user = await requirePermission({ request, context }, "read-outbox");
  const messages = await readOutbox(user.companyId);
  if (!messages) notFound("The local outbox (the app is sending through a real mail provider)");
  return { messages };
}

export default function Outbox({ loaderData }: Route.ComponentProps) {
  const times = useTimes();
  return (
    <>
      <PageTitle lead="Mail the app sent to your people while running with the local fake mail server (development only).">Outbox</PageTitle>
      {loaderData.messages.length === 0 ? <p>No mail yet.</p> : null}
      <ul className="space-y-3">
        {loaderData.messages.map((m) => (
          <li key={m.file} className="rounded-lg border-2 border-ink bg-paper p-4">
            <p className="text-sm">
              {times.dateTime(m.receivedAt)} · to {m.to.join(", ")}
            </p>
            <p className="text-lg font-bold">{m.subject}</p>
            <details className="mt-2">
              <summary className="min-h-12 cursor-pointer py-2 font-bold">Show message</summary>
              <pre tabIndex={0} className="overflow-x-auto text-sm whitespace-pre-wrap">
                {m.text}
              </pre>
            </details>
          </li>
        ))}
      </ul>
    </>
  );
}

export const meta: Route.MetaFunction = () => [{ title: "Outbox · Tankside" }];
