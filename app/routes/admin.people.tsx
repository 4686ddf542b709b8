import { getFormProps, getInputProps, getSelectProps } from "@conform-to/react";
import { parseForm } from "~/lib/forms/parse";
import { useCheckedForm } from "~/components/forms/use-checked-form";
import { data, Form, useNavigation } from "react-router";
import { FormField, inputClass } from "~/components/forms/form-field";
import { ConfirmAction } from "~/components/ui/confirm-action";
import { DoneNote } from "~/components/ui/done-note";
import { PageTitle } from "~/components/ui/page-title";
import { toFieldErrors } from "~/lib/forms/errors";
import { inviteSchema, personActionSchema } from "~/lib/people/schema";
import { roleDescription } from "~/lib/permissions";
import { ROLE_LABELS, ROLES } from "~/lib/people/roles";
import { requirePermission } from "~/services/guards.server";
import { actOnPerson, invitePerson, listPeople } from "~/services/people.server";
import { useTimes } from "~/components/use-time-zone";
import { readForm } from "~/services/read-request.server";
import type { Route } from "./+types/admin.people";

export async function loader({ request, context }: Route.LoaderArgs) {
  const user = await requirePermission({ request, context }, "manage-people");
  const { people, invites } = await listPeople(user);
  return {
    people: people.map((p) => ({ ...p, accessRemovedAt: p.accessRemovedAt?.toISOString() ?? null, createdAt: p.createdAt.toISOString() })),
    invites: invites.map((i) => ({ ...i, expiresAt: i.expiresAt.toISOString(), createdAt: i.createdAt.toISOString() })),
  };
}

export async function action({ request, context }: Route.ActionArgs) {
  const user = await requirePermission({ request, context }, "manage-people");
  const form = await readForm(request);
  if (form.get("intent") === "invite") {
    const submission = parseForm(form, inviteSchema);
    if (submission.status !== "success") return data({ invite: submission.reply(), message: null }, { status: 400 });
    const sent = await invitePerson(user, submission.value);
    if (!sent.ok) return data({ invite: submission.reply({ fieldErrors: toFieldErrors(sent.fieldErrors) }), message: null }, { status: 400 });
    return {
      invite: submission.reply({ resetForm: true }),
      message: sent.mailFailed
        ? `The invitation to ${sent.email} is saved, but the mail server did not take the message. Invite them again to resend it.`
        : `Invitation sent to ${sent.email}. The link works once, for a week.`,
    };
  }
  const parsed = personActionSchema.safeParse(Object.fromEntries(form));
  if (!parsed.success) return data({ invite: null, message: `Nothing changed: ${parsed.error.issues.map((i) => i.message).join(" ")}` }, { status: 400 });
  return { invite: null, message: await actOnPerson(user, parsed.data) };
}

const buttonClass = "min-h-12 rounded-md border-2 border-ink bg-paper px-4 font-bold";

export default function People({ loaderData, actionData }: Route.ComponentProps) {
  const times = useTimes();
  const busy = useNavigation().state !== "idle";
  const [form, fields] = useCheckedForm(inviteSchema, { lastResult: actionData?.invite, defaultValue: { role: "crew" } });
  const { people, invites } = loaderData;

  return (
    <>
      <PageTitle lead="Invite people by e-mail, set what each may do, and turn a sign-in off when someone leaves. Their cases stay either way.">
        People
      </PageTitle>
      <DoneNote message={actionData?.message} />

      <section aria-labelledby="invite-h" className="rounded-lg border-2 border-ink bg-paper p-4">
        <h2 id="invite-h" className="text-2xl font-bold">
          Invite someone
        </h2>
        <Form method="post" {...getFormProps(form)} className="mt-3 space-y-4">
          <input type="hidden" name="intent" value="invite" />
          <FormField field={fields.name} label="Name">
            <input {...getInputProps(fields.name, { type: "text" })} className={inputClass} autoComplete="off" />
          </FormField>
          <FormField field={fields.email} label="E-mail" hint="They get a link to choose their own password.">
            <input {...getInputProps(fields.email, { type: "email" })} className={inputClass} autoComplete="off" />
          </FormField>
          <FormField field={fields.role} label="Role">
            <select {...getSelectProps(fields.role)} className={inputClass}>
              {ROLES.map((r) => (
                <option key={r} value={r}>
                  {ROLE_LABELS[r]} — {roleDescription(r)}
                </option>
              ))}
            </select>
          </FormField>
          <button type="submit" disabled={busy} className="min-h-14 w-full rounded-md bg-go text-lg font-bold text-white sm:w-auto sm:px-6">
            Send invitation
          </button>
        </Form>
      </section>

      <section aria-labelledby="people-h" className="mt-6">
        <h2 id="people-h" className="text-2xl font-bold">
          Your people
        </h2>
        <ul className="mt-2 space-y-3">
          {people.map((p) => (
            <li key={p.id} className={`rounded-lg border-2 bg-paper p-4 ${p.accessRemovedAt ? "border-dashed border-rule" : "border-ink"}`}>
              <p className="text-lg font-bold">
                {p.name}
                {p.you ? " (you)" : ""}
              </p>
              <p className="break-all">{p.email}</p>
              <p>
                {ROLE_LABELS[p.role]}
                {p.accessRemovedAt ? ` · sign-in off since ${times.dateTime(p.accessRemovedAt)}` : ""}
              </p>
              {p.you ? (
                <p className="mt-2 text-sm">Another admin can change your role or sign-in.</p>
              ) : (
                <div className="mt-3 flex flex-wrap items-end gap-3">
                  <Form method="post" className="flex flex-wrap items-end gap-2">
                    <input type="hidden" name="personId" value={p.id} />
                    <label className="block">
                      <span className="block font-bold">Role</span>
                      <select name="role" defaultValue={p.role} className="mt-1 min-h-12 rounded-md border-2 border-ink bg-paper px-2">
                        {ROLES.map((r) => (
                          <option key={r} value={r}>
                            {ROLE_LABELS[r]}
                          </option>
                        ))}
                      </select>
                    </label>
                    <button name="intent" value="role" disabled={busy} className={buttonClass}>
                      Save role
                    </button>
                  </Form>
                  {p.accessRemovedAt ? (
                    <Form method="post">
                      <input type="hidden" name="personId" value={p.id} />
                      <button name="intent" value="restore-access" disabled={busy} className={buttonClass}>
                        Turn sign-in back on
                      </button>
                    </Form>
                  ) : (
                    <ConfirmAction
                      label="Turn sign-in off"
                      question={`${p.name} will be signed out on every device at once and cannot sign in until it is turned back on. Their cases keep their name.`}
                      confirmLabel={`Yes, turn ${p.name}'s sign-in off`}
                      intent="remove-access"
                      hidden={{ personId: String(p.id) }}
                      disabled={busy}
                    />
                  )}
                </div>
              )}
            </li>
          ))}
        </ul>
      </section>

      <section aria-labelledby="invites-h" className="mt-6">
        <h2 id="invites-h" className="text-2xl font-bold">
          Invitations not yet used
        </h2>
        {invites.length === 0 ? <p className="mt-2">None.</p> : null}
        <ul className="mt-2 space-y-3">
          {invites.map((i) => (
            <li key={i.id} className="rounded-lg border-2 border-ink bg-paper p-4">
              <p className="text-lg font-bold">{i.name}</p>
              <p className="break-all">{i.email}</p>
              <p>
                {ROLE_LABELS[i.role]} · {i.expired ? "expired — invite them again for a new link" : `link works until ${times.dateTime(i.expiresAt)}`}
              </p>
              <Form method="post" className="mt-3">
                <input type="hidden" name="inviteId" value={i.id} />
                <button name="intent" value="cancel-invite" disabled={busy} className={buttonClass}>
                  Cancel invitation
                </button>
              </Form>
            </li>
          ))}
        </ul>
      </section>
    </>
  );
}

export const meta: Route.MetaFunction = () => [{ title: "People · Tankside" }];
