import type { Guide } from "./schema";

export interface GuideDiff {
  fields: { field: string; before: unknown; after: unknown }[];
  added: string[];
  removed: string[];
  changed: { step: string; fields: string[] }[];
}

const same = (a: unknown, b: unknown) => JSON.stringify(a) === JSON.stringify(b);

/** What changed between two versions of a guide: guide fields, and steps added, removed or changed (with which fields). */
export function diffGuides(before: Guide, after: Guide): GuideDiff {
  const fields = (["title", "summary", "symptoms", "initial"] as const)
    .filter((f) => !same(before[f], after[f]))
    .map((f) => ({ field: f, before: before[f], after: after[f] }));
  const a = before.states;
  const b = after.states;
  const added = Object.keys(b).filter((id) => !(id in a));
  const removed = Object.keys(a).filter((id) => !(id in b));
  const changed = Object.keys(b)
    .filter((id) => id in a && !same(a[id], b[id]))
    .map((id) => {
      const keys = new Set([...Object.keys(a[id].meta), ...Object.keys(b[id].meta)]);
      const metaChanges = [...keys].filter((k) => !same((a[id].meta as Record<string, unknown>)[k], (b[id].meta as Record<string, unknown>)[k]));
      const answerChanges = same(a[id].on, b[id].on) ? [] : ["answers"];
      return { step: id, fields: [...metaChanges, ...answerChanges] };
    });
  return { fields, added, removed, changed };
}
