// @vitest-environment jsdom
import { render } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { Markdown } from "~/components/ui/markdown";
import { GuideText, GuideTextProvider, treeRenderer } from "~/components/ui/guide-text";
import { loadLibrary } from "~/lib/guides/files.server";
import { guideTextSources } from "~/lib/guides/text-tree";
import { textTree } from "~/services/guide-text.server";
import { root } from "../../helpers/guides";

describe("guide markdown", () => {
  it("shows raw HTML and scripts as text, never as elements", () => {
    const { container } = render(<Markdown>{'Check the **clamp**. <script>alert("x")</script> <b onclick="x()">bold</b>'}</Markdown>);
    expect(container.querySelector("script")).toBeNull();
    expect(container.querySelector("b")).toBeNull();
    expect(container.textContent).toContain('<script>alert("x")</script>');
    expect(container.querySelector("strong")?.textContent).toBe("clamp");
  });

  it("does not load images from guide text", () => {
    const { container } = render(<Markdown>{"![x](http://example.invalid/a.png)"}</Markdown>);
    expect(container.querySelector("img")).toBeNull();
  });
});

describe("guide text drawn from trees made on the server (the walk-through's way)", () => {
  const drawn = (md: string) =>
    render(
      <GuideTextProvider value={treeRenderer({ [md]: textTree(md) })}>
        <GuideText text={md} />
      </GuideTextProvider>,
    ).container;

  it("draws every prompt and help text of every shipped guide exactly as the markdown renderer does", () => {
    const texts = loadLibrary(root).flatMap((g) => guideTextSources(g));
    expect(texts.length).toBeGreaterThan(300);
    for (const md of texts) {
      const expected = render(<Markdown>{md}</Markdown>).container.innerHTML;
      expect(drawn(md).innerHTML, md).toBe(expected);
    }
  });

  it("keeps raw HTML as text, drops pictures and script links", () => {
    const c = drawn(
      'Check the **clamp**. <script>alert("x")</script> ![x](http://example.invalid/a.png) [go](javascript:alert(1)) [manual](https://example.com/m)',
    );
    expect(c.querySelector("script, img")).toBeNull();
    expect(c.textContent).toContain('<script>alert("x")</script>');
    expect(c.querySelector("strong")?.textContent).toBe("clamp");
    const links = [...c.querySelectorAll("a")].map((a) => a.getAttribute("href"));
    expect(links).toEqual([null, "https://example.com/m"]);
  });

  it("fills the rig's own words into the drawn text", () => {
    const md = "Run the agitator **{{agitator.opposite}}** for a minute.";
    const c = render(
      <GuideTextProvider value={treeRenderer({ [md]: textTree(md) })}>
        <GuideText text={md} fill={(t) => t.replace("{{agitator.opposite}}", "in reverse")} />
      </GuideTextProvider>,
    ).container;
    expect(c.querySelector("strong")?.textContent).toBe("in reverse");
  });
});
