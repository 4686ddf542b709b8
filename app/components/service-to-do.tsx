import { Link } from "react-router";
import { useTranslation } from "react-i18next";
import { dueText, type ServiceDue } from "~/lib/rigs/service";
import { useSay } from "~/components/ui/say";

/** Routine service that needs doing now, rig by rig: the crew's home and the supervisor's board. */
export function ServiceToDo({ lines }: { lines: { ruleId: number; rigCode: string; name: string; due: ServiceDue }[] }) {
  const { t } = useTranslation();
  const say = useSay();
  if (!lines.length) return null;
  return (
    <section aria-labelledby="service-h" className="mt-6 rounded-lg border-2 border-ink bg-paper p-4">
      <h2 id="service-h" className="text-xl font-bold">
        {t("service.title")}
      </h2>
      <ul className="mt-2 space-y-2">
        {lines.map((l) => (
          <li key={l.ruleId}>
            <Link to={`/rigs/${l.rigCode}/service#service-${l.ruleId}`} className="flex min-h-12 flex-col justify-center font-bold">
              <span>
                {l.rigCode} · {l.name}: {l.due.status === "never" ? t("service.never") : t(`serviceStatus.${l.due.status}`).toLowerCase()}
              </span>
              {l.due.status === "never" ? null : <span className="text-sm font-normal">{say(dueText(l.due))}</span>}
            </Link>
          </li>
        ))}
      </ul>
    </section>
  );
}
