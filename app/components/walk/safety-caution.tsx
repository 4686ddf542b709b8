import { useTranslation } from "react-i18next";

/** The shut-down caution, shown on every safety stop and on every guide desk page. */
export function SafetyCaution({ compact = false }: { compact?: boolean }) {
  const { t } = useTranslation();
  return (
    <div role="note" aria-label={t("caution.label")} className="rounded-lg border-4 border-ink bg-caution p-4 text-ink">
      <p className="text-lg font-bold">{t("caution.title")}</p>
      {compact ? null : <p className="mt-1">{t("caution.body")}</p>}
    </div>
  );
}
