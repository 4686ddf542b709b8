import { useEffect, useState } from "react";
import type { SearchHit } from "~/lib/guides/search";
import { guideKind } from "~/lib/guides/kinds";
import { loadKit } from "~/lib/walk/kept";

type Search = (query: string) => SearchHit[];
let phoneSearch: { madeAt: string; search: Search } | null = null;

/** Search over the guides the phone keeps (the same search the server runs), so it works with no signal. */
async function searchOnPhone(query: string, personId: number): Promise<SearchHit[] | null> {
  const kit = loadKit(window.localStorage, personId);
  if (!kit) return null;
  if (phoneSearch?.madeAt !== kit.madeAt) {
    // Loaded on the first search only: most fixes start from a tile.
    const { createGuideSearch, searchDocFor } = await import("~/lib/guides/search");
    phoneSearch = {
      madeAt: kit.madeAt,
      search: createGuideSearch(
        kit.guides.filter((g) => guideKind(g.definition) === "guide").map((g) => searchDocFor(g, kit.causeNames)),
        kit.language ?? "en",
      ),
    };
  }
  return phoneSearch.search(query);
}

async function searchOnServer(query: string): Promise<SearchHit[] | null> {
  try {
    const res = await fetch(`/api/guides/search?q=${encodeURIComponent(query)}`, { headers: { Accept: "application/json" } });
    return res.ok ? ((await res.json()) as { results: SearchHit[] }).results : null;
  } catch {
    return null;
  }
}

/** Guides matching what the crew typed: on the phone when it keeps the guides, else on the server. */
export function useGuideSearch(query: string, personId: number) {
  const [state, setState] = useState<{ for: string; hits: SearchHit[]; failed: boolean } | null>(null);
  const q = query.trim();
  useEffect(() => {
    if (q.length < 2) return;
    let cancelled = false;
    const timer = setTimeout(async () => {
      const hits = (await searchOnPhone(q, personId)) ?? (await searchOnServer(q));
      if (!cancelled) setState({ for: q, hits: hits ?? [], failed: hits === null });
    }, 150);
    return () => {
      cancelled = true;
      clearTimeout(timer);
    };
  }, [q, personId]);
  const current = q.length >= 2 && state?.for === q ? state : null;
  return { hits: current?.hits ?? [], searched: !!current, failed: !!current?.failed, searching: q.length >= 2 && !current };
}
