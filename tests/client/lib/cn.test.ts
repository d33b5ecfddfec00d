import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { extendTailwindMerge } from "tailwind-merge";
import { describe, expect, it } from "vitest";
import { cn } from "@/lib/cn.ts";

const SOURCE = fileURLToPath(new URL("../../../src", import.meta.url));

/** tailwind-merge's full table with the project's size tokens: what cn's short table must agree with. */
const fullMerge = extendTailwindMerge({
  extend: {
    theme: { spacing: ["touch"], radius: ["card"], shadow: ["card"] },
    classGroups: { "min-h": [{ "min-h": ["touch"] }], "min-w": [{ "min-w": ["touch"] }] },
  },
});

/** Every word in a string literal of src/ that could be a class (cn's own table left out). */
function classesWrittenInSource(): string[] {
  const words = new Set<string>();
  const files = readdirSync(SOURCE, { recursive: true, encoding: "utf8" }).filter(
    (file) => /\.tsx?$/.test(file) && !file.endsWith(path.join("lib", "cn.ts")),
  );
  for (const file of files) {
    for (const literal of readFileSync(path.join(SOURCE, file), "utf8").matchAll(/"([^"\n]*)"|`([^`]*)`/g)) {
      for (const word of (literal[1] ?? literal[2] ?? "").split(/\s+/))
        if (/^[a-z!-][a-z0-9:\-[\]=./!()_%&>*]+$/.test(word)) words.add(word);
    }
  }
  // Words neither table knows are kept as they are by both.
  return [...words].filter((word) => fullMerge(`${word} ${word}`) === word || cn(word, word) === word);
}

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
  it("merges every pair of classes written in src/ as tailwind-merge's full table does", () => {
    const classes = classesWrittenInSource();
    expect(classes.length).toBeGreaterThan(300);
    const disagreements: string[] = [];
    for (const first of classes) {
      for (const second of classes) {
        // A class written twice styles the same whether or not one copy goes.
        if (first === second) continue;
        const pair = `${first} ${second}`;
        if (cn(pair) !== fullMerge(pair)) disagreements.push(`${pair} → ${cn(pair)}, not ${fullMerge(pair)}`);
      }
    }
    expect(disagreements).toEqual([]);
  });
});
