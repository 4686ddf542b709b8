import { startTransition, StrictMode } from "react";
import { hydrateRoot } from "react-dom/client";
import { HydratedRouter } from "react-router/dom";
import { registerLanguage } from "~/i18n";
import { isLanguage } from "~/lib/i18n/languages";

// The page says its language (<html lang>, set by the server from the person's choice): load only
// that language's words, then hydrate, so the first draw on the phone matches the server's.
async function hydrate() {
  const lang = document.documentElement.lang;
  const words = lang === "es" ? await import("./locales/es") : await import("./locales/en");
  registerLanguage(isLanguage(lang) ? lang : "en", words.default, words.messages, words.patterns);
  startTransition(() => {
    hydrateRoot(
      document,
      <StrictMode>
        <HydratedRouter />
      </StrictMode>,
    );
  });
}
void hydrate();
