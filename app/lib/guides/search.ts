import Fuse from "fuse.js";
import type { Language } from "../i18n/languages";
import type { Guide } from "./schema";

export interface SearchDoc {
  slug: string;
  title: string;
  summary: string;
  symptoms: string[];
  causes: string[];
}

export interface SearchHit {
  slug: string;
  title: string;
  score: number;
}

/** A guide as search reads it (in the language it was localized to): its words, and the names of the causes it can end with. */
export function searchDocFor(guide: { slug: string; title: string; definition: Guide }, causeNames: Record<string, string>): SearchDoc {
  return {
    slug: guide.slug,
    title: guide.title,
    summary: guide.definition.summary,
    symptoms: guide.definition.symptoms,
    causes: Object.values(guide.definition.states).flatMap((s) => (s.meta.cause && causeNames[s.meta.cause] ? [causeNames[s.meta.cause]] : [])),
  };
}

/** Words crews use for the same thing; a query with one also looks for the others. */
export const SYNONYMS: Record<Language, string[][]> = { en: [], es: [] };
SYNONYMS.en = [
  ["no pressure", "low pressure", "weak stream", "weak", "short", "won't reach", "not reaching", "falls short", "no push", "no reach"],
  ["suds", "foam", "froth", "frothy", "bubbles", "bubbly", "foaming"],
  ["shaking", "vibration", "vibrating", "jumping", "rattle", "rattling", "wobble", "shudder", "knocking", "banging"],
  ["clog", "clogged", "plug", "plugged", "blocked", "stopped up", "jammed up", "no flow"],
  ["leak", "leaking", "leaks", "drip", "dripping", "weeping", "puddle", "spraying out"],
  ["prime", "suction", "sucking air", "won't pick up", "no water", "pump quit", "pump dies"],
  ["thick", "heavy", "stiff", "oatmeal", "setting up", "too thick", "sludge"],
  ["agitator", "paddles", "mixer", "stir", "stall", "stalls", "stuck", "jammed"],
];
// Spanish as crews say it on US sites (content/glossary.es.md), accents left off: the query's are too.
SYNONYMS.es = [
  ["no tira", "no avienta", "alcance corto", "no llega", "no alcanza", "poca presion", "sin presion", "chorro debil", "tira corto", "sin fuerza", "cortito"],
  ["espuma", "espumoso", "espumosa", "burbujas", "jabonoso", "espumea", "hace espuma"],
  ["vibra", "vibracion", "tiembla", "brinca", "golpetea", "cascabelea", "sacude", "zumba", "se mueve mucho"],
  ["tapado", "tapada", "tapon", "atorado", "atorada", "atascado", "obstruido", "no sale nada", "se tapo"],
  ["fuga", "gotea", "goteo", "chorrea", "escurre", "charco", "pierde agua", "se sale el agua", "tira agua por"],
  ["cebado", "descebo", "succion", "no jala", "no chupa", "no agarra agua", "jala aire", "no bombea", "puro aire"],
  ["espesa", "espeso", "muy espesa", "pesada", "atole", "se endurece", "pastosa", "grumos"],
  ["agitador", "paletas", "mezclador", "no gira", "se frena", "se traba", "no da vueltas", "se atora"],
  ["embrague", "clutch", "no engancha", "no pega"],
  ["valvula", "manija", "palanca", "trabada", "no abre", "no cierra"],
  ["hidraulico", "aceite hidraulico", "mando", "se calienta"],
  ["desgaste", "gastado", "gastada", "comida", "se come", "se acaba"],
];

const STOPWORDS: Record<Language, Set<string>> = {
  en: new Set(
    "a an the is it its my our and or but of to in on at for with from this that there be was are were has have had i we me up out just keep keeps getting get got very really".split(
      " ",
    ),
  ),
  es: new Set(
    "el la los las un una unos unas de del al en y o que se me mi mis es esta este esto con por para muy ya lo le les su sus hay pero como mucho mucha todo toda cuando donde tiene esta estan".split(
      " ",
    ),
  ),
};

/** Lower case, accents off (so "succión" and "succion" match), punctuation out. */
export const normalise = (text: string) =>
  text
    .toLowerCase()
    .normalize("NFD")
    .replace(/[\u0300-\u036f]/g, "")
    .replace(/[’']/g, "")
    .replace(/[^a-z0-9\s-]/g, " ")
    .replace(/\s+/g, " ")
    .trim();

// Below this summed match strength a hit is noise: unrelated words match loosely by chance
// (about 0.45 for "birthday cake recipe"; the weakest real phrase in the test set scores 0.84).
const MIN_TOTAL = 0.6;

const unquote = (p: string) => normalise(p);

/** Builds the search once over the guides a company can use; the returned function answers queries. */
export function createGuideSearch(docs: SearchDoc[], lang: Language = "en") {
  const fuse = new Fuse(docs, {
    includeScore: true,
    ignoreLocation: true,
    threshold: 0.34,
    minMatchCharLength: 3,
    keys: [
      { name: "symptoms", weight: 3 },
      { name: "title", weight: 2 },
      { name: "causes", weight: 1 },
      { name: "summary", weight: 0.6 },
    ],
    getFn: (doc, key) => {
      const value = (doc as unknown as Record<string, string | string[]>)[Array.isArray(key) ? key[0] : key];
      return Array.isArray(value) ? value.map(normalise) : normalise(value);
    },
  });

  return function search(query: string, limit = 10): SearchHit[] {
    const q = normalise(query);
    const tokens = q.split(" ").filter((t) => t.length > 2 && !STOPWORDS[lang].has(t));
    const terms = new Map<string, number>(); // term → weight
    terms.set(q, 2);
    for (const t of tokens) terms.set(t, Math.max(terms.get(t) ?? 0, 1));
    for (const group of SYNONYMS[lang]) {
      const words = group.map(unquote);
      if (words.some((w) => (w.includes(" ") ? q.includes(w) : tokens.includes(w) || tokens.some((t) => t.startsWith(w) && w.length > 3)))) {
        for (const w of words) if (!terms.has(w)) terms.set(w, 0.5);
      }
    }
    const totals = new Map<string, number>();
    for (const [term, weight] of terms) {
      for (const hit of fuse.search(term)) {
        const slug = hit.item.slug;
        totals.set(slug, (totals.get(slug) ?? 0) + weight * (1 - (hit.score ?? 1)));
      }
    }
    const best = Math.max(0, ...totals.values());
    return [...totals.entries()]
      .filter(([, total]) => total >= MIN_TOTAL)
      .sort((a, b) => b[1] - a[1])
      .slice(0, limit)
      .map(([slug, total]) => ({ slug, title: docs.find((d) => d.slug === slug)!.title, score: Math.round((total / best) * 1000) / 1000 }));
  };
}
