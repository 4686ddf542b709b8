import { gzipSync } from "node:zlib";

// The encoded answer for a report kept in memory (report-cache.server.ts), made once per kept
// report: fifty supervisors reading the same board cost one JSON encoding and one gzip, not fifty.
const encoded = new WeakMap<object, { json: string; gzip: Uint8Array<ArrayBuffer> }>();

/** A JSON answer for a value that does not change once made (a kept report), gzipped when the client takes it. */
export function keptJson(request: Request, kept: object, body: () => unknown): Response {
  let e = encoded.get(kept);
  if (!e) {
    const json = JSON.stringify(body());
    e = { json, gzip: new Uint8Array(gzipSync(json)) };
    encoded.set(kept, e);
  }
  const headers = new Headers({ "Content-Type": "application/json; charset=utf-8", Vary: "Accept-Encoding" });
  if (/\bgzip\b/.test(request.headers.get("Accept-Encoding") ?? "")) {
    headers.set("Content-Encoding", "gzip");
    return new Response(e.gzip, { headers });
  }
  return new Response(e.json, { headers });
}
