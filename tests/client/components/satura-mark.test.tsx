import { readFileSync } from "node:fs";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { SaturaMark } from "@/components/ui/satura-mark/satura-mark.tsx";

/** The shapes inside an <svg>, each element written open and closed, without the outer tag. */
function shapes(svg: string): string {
  const inner = /<svg[^>]*>([\s\S]*)<\/svg>/.exec(svg.trim())?.[1] ?? "";
  return inner.replace(/<(\w+)([^>]*?)\s*\/>/g, "<$1$2></$1>");
}

describe("SaturaMark", () => {
  // The mark is drawn in the page (SaturaMark) and is the installed app's and the tab's icon
  // (public/satura-mark.svg, which the build inlines into index.html): the two must not drift.
  it("draws the same shapes as the icon file", () => {
    const file = readFileSync(new URL("../../../public/satura-mark.svg", import.meta.url), "utf8");
    const drawn = renderToStaticMarkup(<SaturaMark />);
    expect(shapes(drawn)).not.toBe("");
    expect(shapes(drawn)).toBe(shapes(file));
    expect(drawn).toContain('viewBox="0 0 32 32"');
    expect(file).toContain('viewBox="0 0 32 32"');
  });
});
