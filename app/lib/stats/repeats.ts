export interface CauseHit {
  caseId: string;
  rigCode: string;
  cause: string;
  openedAt: string;
}

export interface RepeatGroup {
  rigCode: string;
  cause: string;
  cases: CauseHit[];
}

/** The repeat window unless a supervisor picks another; the board's stored rollups are kept for this one. */
export const DEFAULT_REPEAT_DAYS = 30;

/**
 * Repeats: the same cause on the same rig within `windowDays` of the previous time it was
 * found. Each chain of such cases is one group (a chain continues while the gaps stay short).
 */
export function findRepeats(hits: CauseHit[], windowDays = DEFAULT_REPEAT_DAYS): RepeatGroup[] {
  const limit = windowDays * 86_400_000;
  const byKey = new Map<string, CauseHit[]>();
  for (const h of hits) {
    const key = `${h.rigCode}\u0000${h.cause}`;
    byKey.set(key, [...(byKey.get(key) ?? []), h]);
  }
  const groups: RepeatGroup[] = [];
  for (const list of byKey.values()) {
    const sorted = [...list].sort((a, b) => Date.parse(a.openedAt) - Date.parse(b.openedAt));
    let chain: CauseHit[] = [];
    const close = () => {
      if (chain.length > 1) groups.push({ rigCode: chain[0].rigCode, cause: chain[0].cause, cases: chain });
    };
    for (const h of sorted) {
      const last = chain[chain.length - 1];
      if (last && Date.parse(h.openedAt) - Date.parse(last.openedAt) <= limit) chain.push(h);
      else {
        close();
        chain = [h];
      }
    }
    close();
  }
  return groups.sort((a, b) => Date.parse(b.cases[b.cases.length - 1].openedAt) - Date.parse(a.cases[a.cases.length - 1].openedAt));
}

/** A chain of repeats as the board shows it: how many, over what span, and the latest cases. */
export interface RepeatChain {
  rigCode: string;
  cause: string;
  count: number;
  firstAt: string;
  lastAt: string;
  latest: { caseId: string; openedAt: string }[];
}

export function summariseChain(group: RepeatGroup, latest = 3): RepeatChain {
  const cases = group.cases;
  return {
    rigCode: group.rigCode,
    cause: group.cause,
    count: cases.length,
    firstAt: cases[0].openedAt,
    lastAt: cases[cases.length - 1].openedAt,
    latest: cases
      .slice(-latest)
      .reverse()
      .map((c) => ({ caseId: c.caseId, openedAt: c.openedAt })),
  };
}

/** Longest chains first, then the most recent. */
export const byWeight = (a: RepeatChain, b: RepeatChain) =>
  b.count - a.count || Date.parse(b.lastAt) - Date.parse(a.lastAt) || a.rigCode.localeCompare(b.rigCode) || a.cause.localeCompare(b.cause);
