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

/**
 * Repeats: the same cause on the same rig within `windowDays` of the previous time it was
 * found. Each chain of such cases is one group (a chain continues while the gaps stay short).
 */
export function findRepeats(hits: CauseHit[], windowDays = 30): RepeatGroup[] {
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
