import { describe, expect, it } from "vitest";
import { cn } from "@/lib/cn.ts";

// The project's own size tokens (tailwind.config.ts) must merge like Tailwind's: the later wins.
describe("cn", () => {
  it("lets a large button's height replace the touch minimum", () => {
    expect(cn("min-h-touch min-w-touch px-4", "min-h-14 px-6")).toBe("min-w-touch min-h-14 px-6");
  });
  it("merges the card radius and shadow with Tailwind's", () => {
    expect(cn("rounded-card shadow-card", "rounded-lg shadow-none")).toBe("rounded-lg shadow-none");
  });
  it("keeps a font size beside a theme colour", () => {
    expect(cn("text-sm text-ink", "text-muted")).toBe("text-sm text-muted");
  });
});
