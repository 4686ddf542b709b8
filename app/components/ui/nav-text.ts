import { useTranslation } from "react-i18next";
import type { NavItem } from "~/lib/navigation";

/** A section's name and line in the reader's language (the English lives in lib/navigation). */
export function useNavText() {
  const { t } = useTranslation();
  // Section paths are the keys, so the typed keys cannot list them: English is the fallback.
  const say = t as unknown as (key: string, options: { defaultValue: string }) => string;
  return {
    label: (item: NavItem) => say(`nav.${item.to}.label`, { defaultValue: item.label }),
    about: (item: NavItem) => say(`nav.${item.to}.about`, { defaultValue: item.about }),
  };
}
