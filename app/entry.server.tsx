import { PassThrough } from "node:stream";
import { createReadableStreamFromReadable } from "@react-router/node";
import { isbot } from "isbot";
import type { RenderToPipeableStreamOptions } from "react-dom/server";
import { renderToPipeableStream } from "react-dom/server";
import type { EntryContext } from "react-router";
import { ServerRouter } from "react-router";
import { registerLanguage } from "~/i18n";
import * as en from "~/locales/en";
import * as es from "~/locales/es";

registerLanguage("en", en.default, en.messages, en.patterns);
registerLanguage("es", es.default, es.messages, es.patterns);

export const streamTimeout = 5_000;

/**
 * React Router's Node entry, plus the Content-Security-Policy nonce: server.js makes one per response
 * and passes it in a header it sets itself; every inline script the framework writes carries it.
 */
export default function handleRequest(request: Request, responseStatusCode: number, responseHeaders: Headers, routerContext: EntryContext) {
  if (request.method.toUpperCase() === "HEAD") return new Response(null, { status: responseStatusCode, headers: responseHeaders });
  const nonce = request.headers.get("x-tankside-nonce") ?? undefined;
  // A page answered while the database is down says when to try again.
  if (responseStatusCode === 503) responseHeaders.set("Retry-After", "30");

  return new Promise((resolve, reject) => {
    let shellRendered = false;
    const userAgent = request.headers.get("user-agent");
    const readyOption: keyof RenderToPipeableStreamOptions = (userAgent && isbot(userAgent)) || routerContext.isSpaMode ? "onAllReady" : "onShellReady";
    let timeoutId: ReturnType<typeof setTimeout> | undefined = setTimeout(() => abort(), streamTimeout + 1000);

    const { pipe, abort } = renderToPipeableStream(<ServerRouter context={routerContext} url={request.url} nonce={nonce} />, {
      nonce,
      [readyOption]() {
        shellRendered = true;
        const body = new PassThrough({
          final(callback) {
            clearTimeout(timeoutId);
            timeoutId = undefined;
            callback();
          },
        });
        responseHeaders.set("Content-Type", "text/html");
        // Pages hold company data: never kept by the browser or a proxy, so Back after signing out shows nothing.
        if (!responseHeaders.has("Cache-Control")) responseHeaders.set("Cache-Control", "private, no-store");
        pipe(body);
        resolve(new Response(createReadableStreamFromReadable(body), { headers: responseHeaders, status: responseStatusCode }));
      },
      onShellError(error: unknown) {
        reject(error);
      },
      onError(error: unknown) {
        responseStatusCode = 500;
        if (shellRendered) console.error(error);
      },
    });
  });
}
