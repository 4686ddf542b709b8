import { useTranslation } from "react-i18next";
import { sayIn } from "~/i18n";

/** Says a server's or a form's message (written in English) in the reader's language, where it has one. */
export function useSay() {
  const { i18n } = useTranslation();
  return (message: string) => sayIn(i18n, message);
}
