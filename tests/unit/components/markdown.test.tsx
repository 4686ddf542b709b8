// @vitest-environment jsdom
import { render } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { Markdown } from "~/components/ui/markdown";

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
