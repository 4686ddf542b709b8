import { Link } from "react-router";
import { PageTitle } from "~/components/ui/page-title";
import { diffGuides } from "~/lib/guides/diff";
import { versionFor } from "~/services/desk.server";
import { deskParams } from "~/services/desk-params.server";
import { requirePermission } from "~/services/guards.server";
import type { Route } from "./+types/desk.$guideId.diff";

export async function loader({ request, params, context }: Route.LoaderArgs) {
  const user = await requirePermission({ request, context }, "edit-guides");
  const url = new URL(request.url);
  const a = deskParams({ guideId: params.guideId, number: url.searchParams.get("a") ?? "" });
  const b = deskParams({ guideId: params.guideId, number: url.searchParams.get("b") ?? "" });
  const [va, vb] = await Promise.all([versionFor(user, a.guideId, a.number), versionFor(user, b.guideId, b.number)]);
  const diff = diffGuides(va.version.definition, vb.version.definition);
  const before = va.version.definition.states;
  const after = vb.version.definition.states;
  return {
    guide: va.guide,
    a: a.number,
    b: b.number,
    diff,
    changed: diff.changed.map((c) => ({ ...c, before: before[c.step], after: after[c.step] })),
    added: diff.added.map((id) => ({ id, step: after[id] })),
    removed: diff.removed.map((id) => ({ id, step: before[id] })),
  };
}

export default function Diff({ loaderData: d }: Route.ComponentProps) {
  const show = (v: unknown) => (typeof v === "string" ? v : JSON.stringify(v, null, 1));
  return (
    <>
      <PageTitle lead={`Version ${d.a} → version ${d.b}`}>What changed: {d.guide.title}</PageTitle>
      <p className="mb-3">
        <Link to={`/desk/${d.guide.id}`}>Back to versions</Link>
      </p>
      {d.diff.fields.map((f) => (
        <p key={f.field}>
          <strong>{f.field}</strong>: {show(f.before)} → {show(f.after)}
        </p>
      ))}
      <h2 className="mt-4 text-xl font-bold">Steps added ({d.added.length})</h2>
      <ul className="list-disc pl-6">
        {d.added.map((s) => (
          <li key={s.id}>
            <strong>{s.id}</strong> ({s.step.meta.kind}): {s.step.meta.prompt}
          </li>
        ))}
      </ul>
      <h2 className="mt-4 text-xl font-bold">Steps removed ({d.removed.length})</h2>
      <ul className="list-disc pl-6">
        {d.removed.map((s) => (
          <li key={s.id}>
            <strong>{s.id}</strong> ({s.step.meta.kind}): {s.step.meta.prompt}
          </li>
        ))}
      </ul>
      <h2 className="mt-4 text-xl font-bold">Steps changed ({d.changed.length})</h2>
      {d.changed.map((c) => (
        <div key={c.step} className="mt-2 rounded-md border-2 border-rule bg-paper p-3">
          <p className="font-bold">
            {c.step}: {c.fields.join(", ")}
          </p>
          <div className="mt-2 grid gap-2 sm:grid-cols-2">
            <pre tabIndex={0} className="overflow-x-auto rounded bg-field p-2 text-sm whitespace-pre-wrap" aria-label={`${c.step} before`}>
              {JSON.stringify(c.before, null, 1)}
            </pre>
            <pre tabIndex={0} className="overflow-x-auto rounded bg-field p-2 text-sm whitespace-pre-wrap" aria-label={`${c.step} after`}>
              {JSON.stringify(c.after, null, 1)}
            </pre>
          </div>
        </div>
      ))}
    </>
  );
}

export const meta: Route.MetaFunction = () => [{ title: "What changed · Guide desk · Tankside" }];
