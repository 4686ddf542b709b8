import routes from "~/routes";

export interface RouteEntry {
  /** The URL pattern, e.g. "/cases/:id/walk". */
  path: string;
  /** The module file under app/, e.g. "routes/cases.$id.walk.tsx". */
  file: string;
}

type ConfigEntry = { path?: string; file: string; index?: boolean; children?: ConfigEntry[] };

/** Every route in app/routes.ts with its full path (layouts contribute none). */
export function routeTable(): RouteEntry[] {
  const out: RouteEntry[] = [];
  const walk = (entries: ConfigEntry[], prefix: string) => {
    for (const e of entries) {
      const path = e.path ? `${prefix}/${e.path}`.replace(/\/+/g, "/") : prefix || "/";
      if (!e.children) out.push({ path: e.index ? prefix || "/" : path, file: e.file });
      else {
        out.push({ path: e.path ? path : prefix || "/", file: e.file });
        walk(e.children, e.path ? path : prefix);
      }
    }
  };
  walk(routes as unknown as ConfigEntry[], "");
  return out;
}

/** The route module for an entry, loaded the way the server loads it. */
export const routeModule = (e: RouteEntry) =>
  import(/* @vite-ignore */ `../../app/${e.file}`) as Promise<{ loader?: (a: unknown) => Promise<unknown>; action?: (a: unknown) => Promise<unknown> }>;
