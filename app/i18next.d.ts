import "i18next";
import type { Strings } from "./locales/en";

// t("…") keys are checked against the English file.
declare module "i18next" {
  interface CustomTypeOptions {
    resources: { translation: Strings };
  }
}
