import { useTranslation } from "react-i18next";
import { data, Form, redirect } from "react-router";
import { z } from "zod";
import { ChoosePasswordForm } from "~/components/choose-password-form";
import { DoneNote } from "~/components/ui/done-note";
import { PageTitle } from "~/components/ui/page-title";
import { useTimes } from "~/components/use-time-zone";
import { deviceName } from "~/lib/people/device-name";
import { toFieldErrors } from "~/lib/forms/errors";
import { parseForm } from "~/lib/forms/parse";
import { changePasswordSchema } from "~/lib/people/schema";
import { LANGUAGE_NAMES, LANGUAGES } from "~/lib/i18n/languages";
import { changePassword, endOneSession, listSessions, setLanguage } from "~/services/account.server";
import { paceAndRules, savePace } from "~/services/company.server";
import { fail, requireUser } from "~/services/guards.server";
import { readForm } from "~/services/read-request.server";
import { ABSOLUTE_DAYS, currentSessionKey, endSessions, IDLE_DAYS } from "~/services/session.server";
import type { Route } from "./+types/account";

export async function loader({ request, context }: Route.LoaderArgs) {
  const user = await requireUser({ request, context });
  const [sessions, current, { rules, ownPace }] = await Promise.all([listSessions(user), currentSessionKey(request), paceAndRules(user)]);
  return {
    pace: { ft: rules.paceFt, own: ownPace },
    name: user.name,
    email: user.email,
    role: user.role,
    company: user.companyName,
    language: user.language ?? "en",
    // The key names a device in the form; the current one is marked, not offered for ending here.
    devices: sessions.map((s) => ({ ...s, name: deviceName(s.userAgent), current: s.key === current })),
    limits: { idleDays: IDLE_DAYS, absoluteDays: ABSOLUTE_DAYS },
    languageSaved: new URL(request.url).searchParams.get("saved") === "language",
  };
}

/** A person's pace for strips on a slope: a number of feet, or blank for the company's. */
const paceAction = z.object({
  intent: z.literal("pace"),
  paceFt: z
    .string()
    .trim()
    .transform((v) => (v === "" ? null : Number(v.replace(",", "."))))
    .pipe(
      z
        .number({ error: "Give your pace in feet, like 2.5, or leave it blank." })
        .min(1, "A pace under 1 ft is not plausible.")
        .max(6, "A pace over 6 ft is not plausible.")
        .nullable(),
    ),
});

/** The language the person reads Tankside in. */
const languageAction = z.object({ intent: z.literal("language"), language: z.enum(LANGUAGES, { error: "Pick English or Spanish." }) });

const deviceAction = z.discriminatedUnion("intent", [
  z.object({ intent: z.literal("end-device"), key: z.string().regex(/^[0-9a-f]{64}$/, "Pick a device from the list.") }),
  z.object({ intent: z.literal("end-others") }),
]);

export async function action({ request, context }: Route.ActionArgs) {
  const user = await requireUser({ request, context });
  const form = await readForm(request);
  const current = await currentSessionKey(request);
  if (form.get("intent") === "language") {
    const parsed = languageAction.safeParse(Object.fromEntries(form));
    if (!parsed.success) return data({ result: null, message: null, languageError: parsed.error.issues[0].message }, { status: 400 });
    await setLanguage(user, parsed.data.language);
    // A fresh request, so the whole page (and the root's language) is drawn in the new one.
    throw redirect("/account?saved=language");
  }
  if (form.get("intent") === "pace") {
    const parsed = paceAction.safeParse(Object.fromEntries(form));
    if (!parsed.success) return data({ result: null, message: null, paceError: parsed.error.issues[0].message }, { status: 400 });
    await savePace(user, parsed.data.paceFt);
    return {
      result: null,
      message:
        parsed.data.paceFt === null ? "Your pace is back to the company's." : `Saved. Strips on the load card now count paces of ${parsed.data.paceFt} ft.`,
    };
  }
  if (form.get("intent") === "end-device" || form.get("intent") === "end-others") {
    const parsed = deviceAction.safeParse(Object.fromEntries(form));
    if (!parsed.success) fail(400, parsed.error.issues[0].message);
    if (parsed.data.intent === "end-device") await endOneSession(user, parsed.data.key);
    else await endSessions(user.id, { except: current ?? undefined });
    return { result: null, message: parsed.data.intent === "end-device" ? "That device is signed out." : "Every other device is signed out." };
  }
  const submission = parseForm(form, changePasswordSchema);
  const hidden = { hideFields: ["current", "password", "confirm"] };
  if (submission.status !== "success") return data({ result: submission.reply(hidden), message: null }, { status: 400 });
  const changed = await changePassword(user, submission.value.current, submission.value.password, current);
  if (!changed.ok) return data({ result: submission.reply({ ...hidden, fieldErrors: toFieldErrors(changed.fieldErrors) }), message: null }, { status: 400 });
  return { result: submission.reply({ resetForm: true }), message: "Password changed. Any other phone or computer signed in as you has been signed out." };
}

export default function Account({ loaderData, actionData }: Route.ComponentProps) {
  const times = useTimes();
  const others = loaderData.devices.filter((d) => !d.current);
  const { t } = useTranslation();
  const languageError = actionData && "languageError" in actionData ? actionData.languageError : null;
  return (
    <>
      <PageTitle lead={t("account.lead", { email: loaderData.email, role: t(`roles.${loaderData.role}`), company: loaderData.company })}>
        {loaderData.name}
      </PageTitle>
      <DoneNote message={actionData?.message ?? (loaderData.languageSaved ? t("account.languageSaved") : null)} />
      <h2 className="text-2xl font-bold">{t("account.language")}</h2>
      {/* A whole-page load: the page (and the phone's kept words) come back in the new language. */}
      <Form method="post" reloadDocument className="mt-2 space-y-2">
        <fieldset aria-describedby="language-hint">
          <legend className="sr-only">{t("account.language")}</legend>
          <p id="language-hint" className="text-sm">
            {t("account.languageLead")}
          </p>
          <div className="mt-2 grid grid-cols-2 gap-2">
            {LANGUAGES.map((lang) => (
              <label key={lang} lang={lang} className="flex min-h-14 items-center gap-2 rounded-md border-2 border-ink bg-paper px-3 text-lg font-bold">
                <input type="radio" name="language" value={lang} defaultChecked={loaderData.language === lang} className="h-6 w-6" />
                {LANGUAGE_NAMES[lang]}
              </label>
            ))}
          </div>
        </fieldset>
        {languageError ? <p className="font-bold text-stop">{languageError}</p> : null}
        <button name="intent" value="language" className="min-h-14 w-full rounded-md border-2 border-ink bg-paper px-4 text-lg font-bold">
          {t("account.saveLanguage")}
        </button>
      </Form>
      <h2 className="mt-8 text-2xl font-bold">{t("account.changePassword")}</h2>
      <ChoosePasswordForm lastResult={actionData?.result ?? undefined} submitLabel={t("account.changePasswordButton")} askCurrent />
      <h2 className="mt-8 text-2xl font-bold">{t("account.pace")}</h2>
      <Form method="post" className="mt-2 space-y-2">
        <label htmlFor="paceFt" className="block font-bold">
          {t("account.paceLabel")}
        </label>
        <p id="pace-hint" className="text-sm">
          {loaderData.pace.own ? t("account.paceHint") : t("account.paceHintCompany", { ft: loaderData.pace.ft })}
        </p>
        <input
          id="paceFt"
          name="paceFt"
          inputMode="decimal"
          defaultValue={loaderData.pace.own ? String(loaderData.pace.ft) : ""}
          aria-describedby="pace-hint"
          aria-invalid={actionData && "paceError" in actionData ? true : undefined}
          className="block min-h-14 w-full rounded-md border-2 border-ink bg-paper px-3 text-lg"
        />
        {actionData && "paceError" in actionData ? <p className="font-bold text-stop">{actionData.paceError}</p> : null}
        <button name="intent" value="pace" className="min-h-14 w-full rounded-md border-2 border-ink bg-paper px-4 text-lg font-bold">
          {t("account.savePace")}
        </button>
      </Form>
      <h2 className="mt-8 text-2xl font-bold">{t("account.devices")}</h2>
      <ul className="mt-2 space-y-2">
        {loaderData.devices.map((d) => (
          <li key={d.key} className="rounded-md border-2 border-rule bg-paper p-3">
            <p className="font-bold">
              {d.name}
              {d.current ? t("account.thisDevice") : ""}
            </p>
            <p className="text-sm">{t("account.signedIn", { at: times.dateTime(d.createdAt), last: times.dateTime(d.lastSeenAt) })}</p>
            {d.current ? null : (
              <Form method="post" className="mt-2">
                <input type="hidden" name="key" value={d.key} />
                <button name="intent" value="end-device" className="min-h-12 rounded-md border-2 border-ink bg-paper px-4 font-bold">
                  {t("account.signOutDevice")}
                </button>
              </Form>
            )}
          </li>
        ))}
      </ul>
      {others.length > 1 ? (
        <Form method="post" className="mt-3">
          <button name="intent" value="end-others" className="min-h-12 rounded-md border-2 border-ink bg-paper px-4 font-bold">
            {t("account.signOutOthers")}
          </button>
        </Form>
      ) : null}
      <p className="mt-2 text-sm">{t("account.limits", { idle: loaderData.limits.idleDays, absolute: loaderData.limits.absoluteDays })}</p>
    </>
  );
}

export const meta: Route.MetaFunction = () => [{ title: "Your account · Tankside" }];
