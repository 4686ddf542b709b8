import { describe, expect, it } from "vitest";
import { loadLibrary } from "~/lib/guides/files.server";
import { createGuideSearch } from "~/lib/guides/search";
import { causes, root, topThreeRate } from "../../helpers/guides";

const library = loadLibrary(root);
const causeName = new Map(causes.map((c) => [c.code, c.name]));
const search = createGuideSearch(
  library.map((g) => ({
    slug: g.id,
    title: g.title,
    summary: g.summary,
    symptoms: g.symptoms,
    causes: Object.values(g.states).flatMap((s) => (s.meta.cause ? [causeName.get(s.meta.cause)!] : [])),
  })),
);

// What a crew member might type, in their own words and spelling; the guide they need.
const PHRASES: [string, string][] = [
  ["pump wont pick up water", "lost-prime"],
  ["lost prime again", "lost-prime"],
  ["pump runs nothing comes out", "lost-prime"],
  ["its sucking air", "lost-prime"],
  ["pump quit after a few seconds", "lost-prime"],
  ["drafting from pond pump keeps dying", "lost-prime"],
  ["pump wont prime", "lost-prime"],
  ["lost suction", "lost-prime"],
  ["spray not reaching the top of the bank", "short-throw"],
  ["weak stream", "short-throw"],
  ["no pressure", "short-throw"],
  ["stream falls short", "short-throw"],
  ["cant reach far side", "short-throw"],
  ["low presure at nozzle", "short-throw"],
  ["lost my reach", "short-throw"],
  ["tank full of suds", "foaming"],
  ["foam coming out the top", "foaming"],
  ["frothy slurry", "foaming"],
  ["bubbles everywhere", "foaming"],
  ["foamin over", "foaming"],
  ["hose is clogged", "plugging"],
  ["nozzle plugged up", "plugging"],
  ["nothing coming out the hose", "plugging"],
  ["mulch balled up in pump", "plugging"],
  ["no flow at all", "plugging"],
  ["blocked hose", "plugging"],
  ["dripping under the tank", "leaks"],
  ["leaking at the camlock", "leaks"],
  ["water spraying out of a clamp", "leaks"],
  ["puddle under the rig", "leaks"],
  ["leak behind the pump", "leaks"],
  ["whole truck shaking", "vibration"],
  ["tank is jumping", "vibration"],
  ["rattling noise when agitator runs", "vibration"],
  ["bad vibraton", "vibration"],
  ["agitator stopped turning", "agitator-stall"],
  ["paddles wont turn", "agitator-stall"],
  ["hydraulics squeal", "agitator-stall"],
  ["agitater stuck", "agitator-stall"],
  ["mix like oatmeal", "slurry-too-thick"],
  ["slurry too thick to spray", "slurry-too-thick"],
  ["load sat too long", "slurry-too-thick"],
  ["thick mix", "slurry-too-thick"],
  ["valve wont open", "valve-trouble"],
  ["handle on the valve is stuck", "valve-trouble"],
  ["recirc valve jammed", "valve-trouble"],
  ["valve plugged when we loaded", "valve-trouble"],
  ["tips wearing out too fast", "excessive-wear"],
  ["impeller worn out already", "excessive-wear"],
  ["gritty fertilizer eating the pump", "excessive-wear"],
  ["clutch wont engage", "pump-not-turning"],
  ["pump wont turn", "pump-not-turning"],
  ["clutch clicks nothing happens", "pump-not-turning"],
  ["belt squeals pump not spinning", "pump-not-turning"],
  ["hydraulic hose leaking", "hydraulic-drive"],
  ["agitator weak and slow", "hydraulic-drive"],
  ["hydraulic oil getting hot", "hydraulic-drive"],
];

describe("the new fault families are found by their crew phrases", () => {
  it.each(PHRASES.filter(([, id]) => ["valve-trouble", "excessive-wear", "pump-not-turning", "hydraulic-drive"].includes(id)))(
    "%s → %s in the top 3",
    (phrase, id) => {
      expect(
        search(phrase)
          .slice(0, 3)
          .map((h) => h.slug),
      ).toContain(id);
    },
  );
});

describe("symptom search", () => {
  it(`puts the right guide in the top 3 for at least 90 % of ${PHRASES.length} crew phrases`, () => {
    const rate = topThreeRate("search", search, PHRASES);
    expect(PHRASES.length).toBeGreaterThanOrEqual(40);
    expect(rate).toBeGreaterThanOrEqual(0.9);
  });

  it("ranks best first with scores from 1 down, at most 10 results", () => {
    const hits = search("foam");
    expect(hits[0]).toMatchObject({ slug: "foaming", score: 1 });
    for (let i = 1; i < hits.length; i++) expect(hits[i].score).toBeLessThanOrEqual(hits[i - 1].score);
    expect(search("pump").length).toBeLessThanOrEqual(10);
  });

  it("finds nothing for words unrelated to the rig", () => {
    expect(search("birthday cake recipe")).toEqual([]);
  });
});
