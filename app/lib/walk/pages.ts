import { FIELD_MATH_SCREENS } from "../field-math/screens";

/** Where the service worker keeps the pages a crew member may open with no signal. */
export const PAGES_CACHE = "tankside-pages-v1";

/**
 * The walk page kept once for every walk the phone starts with no signal: its own data is a
 * placeholder, and the page fills itself from what the phone keeps for the case in the address.
 */
export const ON_PHONE_CASE = "on-phone";

/** Pages kept on the phone: home, a rig, its "start a fix" and its cards, a walk-through, field math. */
export const KEPT_PAGE = /^\/(?:|rigs\/(?!new$)[^/]+(?:\/fix|\/cards)?|cases\/[^/]+\/walk|field-math(?:\/[^/]+)?)$/;

export const isWalkPage = (pathname: string) => /^\/cases\/[^/]+\/walk$/.test(pathname);

/** Every page the phone fetches and keeps while it has signal, for these rigs. */
export function pagesToKeep(rigCodes: string[]): string[] {
  return [
    "/",
    "/field-math",
    ...FIELD_MATH_SCREENS.map((s) => `/field-math/${s.id}`),
    ...rigCodes.flatMap((code) => [`/rigs/${code}`, `/rigs/${code}/fix`, `/rigs/${code}/cards`]),
    `/cases/${ON_PHONE_CASE}/walk`,
  ];
}
