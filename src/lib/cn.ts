import { clsx, type ClassValue } from "clsx";
import { extendTailwindMerge } from "tailwind-merge";

// tailwind-merge knows only Tailwind's own scale: without these, `min-h-touch` and `min-h-14`
// both survive and the stylesheet's order decides, so a large button came out 44 px, not 56.
// Every custom size token in tailwind.config.ts is named here.
const twMerge = extendTailwindMerge({
  extend: {
    theme: { spacing: ["touch"], radius: ["card"], shadow: ["card"] },
    classGroups: { "min-h": [{ "min-h": ["touch"] }], "min-w": [{ "min-w": ["touch"] }] },
  },
});

/** Joins class names and lets later Tailwind classes win over earlier ones. */
export function cn(...inputs: ClassValue[]): string {
  return twMerge(clsx(inputs));
}
